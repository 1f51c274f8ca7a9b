package lotgate.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import lotgate.files.InputFileException;
import lotgate.files.OutputFileException;
import lotgate.jobs.JobException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** The lotgate command: acceptance sampling plans for lots, from design to lot sentencing. */
@Command(name = "lotgate", resourceBundle = "lotgate.cli.OptionTexts",
        scope = CommandLine.ScopeType.INHERIT,
        mixinStandardHelpOptions = true,
        sortOptions = false,
        versionProvider = Version.Provider.class,
        usageHelpAutoWidth = true,
        description = {"Acceptance sampling of manufacturing lots: design exact sampling plans from the producer's"
                + " and consumer's risks, study their OC, AOQ, ATI and ASN curves, and save them under plans/ so that"
                + " every inspector applies the same plan.", ""})
public final class Main implements Runnable {
    /** The exit codes, listed under the main command's help only (subcommands inherit its other attributes). */
    private static final String[] EXIT_CODES = {
            "   0  done (sentencing: lot accepted)",
            "   1  lot rejected",
            "   2  bad option or value",
            "   3  input file missing, unreadable or invalid; history store missing",
            "   4  incomplete sample",
            "   5  no sampling plan meets the request",
            "   6  an output file cannot be written",
            "   7  the history store cannot be used (unreachable, altered, or newer)",
            "   8  inspection is discontinued until a corrective action is recorded",
            "   9  no decision yet: inspect more units (double, multiple and sequential plans)",
            "  70  internal fault (rerun with --debug)"};

    /**
     * The commands by name, in the order the help lists them. Picocli builds a command's model by
     * reflection, which costs more than most commands' work, so a run builds only the command it
     * invokes; the help and an unknown command get them all.
     */
    private static final Map<String, Class<?>> COMMANDS = new LinkedHashMap<>();

    static {
        COMMANDS.put("design", DesignCommand.class);
        COMMANDS.put("lookup", LookupCommand.class);
        COMMANDS.put("least-inspection", LeastInspectionCommand.class);
        COMMANDS.put("curve", CurveCommand.class);
        COMMANDS.put("compare", CompareCommand.class);
        COMMANDS.put("show", ShowCommand.class);
        COMMANDS.put("sentence", SentenceCommand.class);
        COMMANDS.put("inspect", InspectCommand.class);
        COMMANDS.put("history", HistoryCommand.class);
        COMMANDS.put("supplier", SupplierCommand.class);
        COMMANDS.put("suppliers", SuppliersCommand.class);
        COMMANDS.put("verify", VerifyCommand.class);
        COMMANDS.put("reissue", ReissueCommand.class);
        COMMANDS.put("corrective-action", ActionCommand.class);
        COMMANDS.put("import", ImportCommand.class);
        COMMANDS.put("family", FamilyCommand.class);
        COMMANDS.put("demo", DemoCommand.class);
        COMMANDS.put("workbench", WorkbenchCommand.class);
        COMMANDS.put("help", CommandLine.HelpCommand.class);
    }

    static {
        // POI logs through the Log4j API; lotgate has no log, so route it to the API's silent simple logger.
        System.setProperty("log4j.provider", "org.apache.logging.log4j.simple.internal.SimpleProvider");
        System.setProperty("log4j2.simplelogLevel", "OFF");
        System.setProperty("log4j2.statusLoggerLevel", "OFF");
        // Jetty (the workbench) brings SLF4J's API, which the SQLite driver then logs through; no provider is bound.
        System.setProperty("slf4j.internal.verbosity", "ERROR");
    }

    @Option(names = "--debug", scope = CommandLine.ScopeType.INHERIT,
            description = "Show the full stack trace when something fails.")
    boolean debug;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(), "name a command, e.g. 'lotgate design --help'");
    }

    public static void main(String[] args) {
        System.exit(run(new PrintWriter(System.out, true), new PrintWriter(System.err, true), args));
    }

    /** Runs lotgate with the given streams and returns its exit code. */
    public static int run(PrintWriter out, PrintWriter err, String... args) {
        if (args.length == 1 && (args[0].equals("--version") || args[0].equals("-V"))) {
            // Answered before picocli loads: scripts ask for the version to pin it in their logs.
            out.println(Version.line());
            out.flush();
            return ExitCode.OK;
        }
        CommandLine cli = commandLine(args);
        cli.setOut(new PrintWriter(new EscapingWriter(out), true));
        cli.setErr(new PrintWriter(new EscapingWriter(err), true));
        int code = cli.execute(args);
        cli.getOut().flush();
        cli.getErr().flush();
        return code;
    }

    /** The names of the commands, in the order the help lists them. */
    static Map<String, Class<?>> commands() {
        return java.util.Collections.unmodifiableMap(COMMANDS);
    }

    /** The command line with every command, as the help shows it. */
    static CommandLine commandLine() {
        return commandLine(new String[0]);
    }

    /**
     * The command line for these arguments: the root and the one command they invoke (the first
     * argument that is not an option), or every command when they name none or an unknown one.
     */
    static CommandLine commandLine(String... args) {
        CommandLine cli = new CommandLine(new Main());
        String invoked = null;
        for (String arg : args) {
            if (!arg.startsWith("-")) {
                invoked = arg;
                break;
            }
        }
        if (invoked != null && COMMANDS.containsKey(invoked) && !invoked.equals("help")) {
            cli.addSubcommand(invoked, COMMANDS.get(invoked));
        } else {
            COMMANDS.forEach(cli::addSubcommand);
        }
        cli.setParameterExceptionHandler(Main::usageError);
        cli.setExecutionExceptionHandler(Main::failure);
        cli.setCaseInsensitiveEnumValuesAllowed(true);
        cli.getCommandSpec().usageMessage().footerHeading("%nExit codes:%n").footer(EXIT_CODES);
        return cli;
    }

    private static int usageError(CommandLine.ParameterException e, String[] args) {
        CommandLine cli = e.getCommandLine();
        PrintWriter err = cli.getErr();
        String message = e.getMessage();
        if (e instanceof CommandLine.UnmatchedArgumentException unmatched && !unmatched.getUnmatched().isEmpty()) {
            String first = unmatched.getUnmatched().get(0);
            message = cli.getParent() == null && !first.startsWith("-")
                    ? "unknown command '" + first + "'; the commands are "
                            + String.join(", ", cli.getSubcommands().keySet())
                    : "unknown option or extra argument '" + first + "'";
        }
        err.println("lotgate: " + lotgate.history.Identifiers.escape(lotgate.history.StoreLocation.masked(message))
                + " (see '" + cli.getCommandSpec().qualifiedName() + " --help')");
        if (debugRequested(args)) {
            e.printStackTrace(err);
        }
        err.flush();
        return ExitCode.USAGE;
    }

    private static int failure(Exception e, CommandLine cli, CommandLine.ParseResult parsed) {
        PrintWriter err = cli.getErr();
        int code;
        String message;
        if (e instanceof InputFileException) {
            code = ExitCode.BAD_INPUT;
            message = e.getMessage();
        } else if (e instanceof OutputFileException) {
            code = ExitCode.CANNOT_WRITE;
            message = e.getMessage();
        } else if (e instanceof lotgate.history.StoreException.Missing) {
            code = ExitCode.BAD_INPUT;
            message = e.getMessage();
        } else if (e instanceof lotgate.history.StoreException.DuplicateLot duplicate) {
            code = ExitCode.USAGE;
            message = e.getMessage() + "; to correct that record, sentence again with --supersedes "
                    + duplicate.existing() + " --reason TEXT";
        } else if (e instanceof lotgate.history.StoreException) {
            code = ExitCode.STORE;
            message = e.getMessage();
        } else if (e instanceof JobException refused) {
            code = exitCode(refused.kind());
            message = refused.getMessage() + (refused.kind() == JobException.Kind.INVALID_REQUEST
                    ? " (see '" + cli.getCommandSpec().qualifiedName() + " --help')" : "");
        } else if (e instanceof Failure f) {
            code = f.exitCode();
            message = f.getMessage();
        } else {
            code = ExitCode.INTERNAL;
            message = "internal fault: " + lotgate.history.StoreLocation.masked(String.valueOf(e))
                    + " (rerun with --debug and report it)";
        }
        if (message != null) {
            err.println("lotgate: " + lotgate.history.Identifiers.escape(lotgate.history.StoreLocation.masked(message)));
        }
        if (debugRequested(parsed.originalArgs().toArray(String[]::new))) {
            e.printStackTrace(err);
        }
        err.flush();
        return code;
    }

    /** The exit code that stands for a job's refusal of its request. */
    static int exitCode(JobException.Kind kind) {
        return switch (kind) {
            case INVALID_REQUEST, CONFLICT, NOT_FOUND -> ExitCode.USAGE;
            case BAD_INPUT -> ExitCode.BAD_INPUT;
            case INCOMPLETE_SAMPLE -> ExitCode.INCOMPLETE_SAMPLE;
            case DISCONTINUED -> ExitCode.DISCONTINUED;
        };
    }

    private static boolean debugRequested(String[] args) {
        for (String arg : args) {
            if (arg.equals("--debug")) {
                return true;
            }
        }
        return false;
    }

    /**
     * A failure with the exit code it stands for and a message for the user, or null when the
     * command's own output has said it already.
     */
    static final class Failure extends RuntimeException {
        private final int exitCode;

        Failure(int exitCode, String message) {
            super(message);
            this.exitCode = exitCode;
        }

        int exitCode() {
            return exitCode;
        }
    }
}
