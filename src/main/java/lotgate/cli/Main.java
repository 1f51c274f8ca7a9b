package lotgate.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.lang.reflect.Constructor;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.PropertyResourceBundle;
import java.util.ResourceBundle;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** The lotgate command: acceptance sampling plans for lots, from design to lot sentencing. */
@Command(name = "lotgate",
        scope = CommandLine.ScopeType.INHERIT,
        mixinStandardHelpOptions = true,
        sortOptions = false,
        versionProvider = Version.Provider.class,
        usageHelpAutoWidth = true,
        description = {"Acceptance sampling of manufacturing lots: design exact sampling plans from the producer's"
                + " and consumer's risks, study their OC, AOQ, ATI and ASN curves, and save them under plans/ so that"
                + " every inspector applies the same plan.", ""})
public final class Main implements Runnable {
    /**
     * The exit codes, listed under the main command's help only (subcommands inherit its other attributes);
     * each line fits the help's width of 80.
     */
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
            "   9  no decision yet: inspect more units (double, multiple, sequential plans)",
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

    /**
     * The descriptions of the shared options (OptionTexts.properties), read as a file when a help text is
     * drawn: only the help shows descriptions, and reading the file opens lotgate.jar's index of 18,000
     * entries (15-20 ms), which a command whose classes all come from the class-data archive never opens
     * otherwise. A resource bundle search for locale variants, which the texts do not have, would add 10 ms.
     */
    private static final class OptionTexts {
        static final ResourceBundle BUNDLE;

        static {
            try (InputStream in = Main.class.getResourceAsStream("OptionTexts.properties")) {
                BUNDLE = new PropertyResourceBundle(in);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    static {
        // picocli registers a converter by reflection for every java.sql and java.time type, for each command
        // line it builds (15 ms of a short command); lotgate's dates have a converter of their own.
        if (System.getProperty("picocli.converters.excludes") == null) {
            System.setProperty("picocli.converters.excludes", "java\\.sql\\..*,java\\.time\\..*");
        }
        // picocli's factory looks for Groovy's closure class, which lotgate does not have: the failed search opens
        // lotgate.jar's index of 18,000 entries (15-20 ms) in a run whose classes all come from the class-data archive.
        if (System.getProperty("picocli.disable.closures") == null) {
            System.setProperty("picocli.disable.closures", "true");
        }
        // POI logs through the Log4j API; lotgate has no log, so route it to the API's silent simple logger.
        System.setProperty("log4j.provider", "org.apache.logging.log4j.simple.internal.SimpleProvider");
        System.setProperty("log4j2.simplelogLevel", "OFF");
        System.setProperty("log4j2.statusLoggerLevel", "OFF");
        // Jetty (the workbench) brings SLF4J's API, which the SQLite driver then logs through; no provider is bound.
        System.setProperty("slf4j.internal.verbosity", "ERROR");
        // Naming SLF4J's silent provider spares its search of the class path for others (a service look-up).
        if (System.getProperty("slf4j.provider") == null) {
            System.setProperty("slf4j.provider", "org.slf4j.helpers.NOP_FallbackServiceProvider");
        }
    }

    @Option(names = "--debug", scope = CommandLine.ScopeType.INHERIT,
            description = "Show the full stack trace when something fails.")
    boolean debug;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** lotgate alone: the list of commands with what each does, on standard error, and exit code 2. */
    @Override
    public void run() {
        CommandLine cli = spec.commandLine();
        PrintWriter err = cli.getErr();
        err.print("lotgate: name a command, e.g. 'lotgate design --aql 1% --ltpd 5%'. The commands:"
                + System.lineSeparator() + cli.getHelp().commandList()
                + "'lotgate COMMAND --help' tells a command's options; 'lotgate --help' also lists the exit codes."
                + System.lineSeparator());
        err.flush();
        throw new Failure(ExitCode.USAGE, null);
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
        int code;
        try {
            code = cli.execute(args);
        } catch (OutOfMemoryError e) {
            // What the run held is no longer reachable here, so there is room to say so in one line.
            cli.getErr().println("lotgate: out of memory: the Java heap of " + Runtime.getRuntime().maxMemory()
                    / (1024 * 1024) + " MB is full, and the command did not finish (a transaction it began is rolled"
                    + " back); give Java more, e.g. LOTGATE_JAVA_OPTS=-Xmx2g");
            code = ExitCode.INTERNAL;
        }
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
        String invoked = null;
        for (String arg : args) {
            if (!arg.startsWith("-")) {
                invoked = arg;
                break;
            }
        }
        boolean one = invoked != null && COMMANDS.containsKey(invoked) && !invoked.equals("help");
        if (one) {
            AnnotationsAhead.start(List.of(Main.class, COMMANDS.get(invoked)));
        }
        CommandLine cli = new CommandLine(new Main(), new Factory());
        if (one) {
            cli.addSubcommand(invoked, COMMANDS.get(invoked));
        } else {
            COMMANDS.forEach(cli::addSubcommand);
        }
        cli.setHelpFactory((spec, colors) -> {
            CommandLine root = spec.root().commandLine();
            if (root.getResourceBundle() == null) {
                root.setResourceBundle(OptionTexts.BUNDLE);
            }
            return new CommandLine.Help(spec, colors);
        });
        cli.setParameterExceptionHandler(Outcomes::usageError);
        cli.setExecutionExceptionHandler(Outcomes::failure);
        cli.setCaseInsensitiveEnumValuesAllowed(true);
        cli.getCommandSpec().usageMessage().footerHeading("%nExit codes:%n").footer(EXIT_CODES);
        HelpLayout.apply(cli);
        return cli;
    }

    /**
     * Creates lotgate's commands, option groups and converters through their declared constructors.
     * picocli's own factory first tries the public way, which fails with an exception for these
     * package-private classes before it falls back on the same call: some 30 exceptions per start.
     */
    static final class Factory implements CommandLine.IFactory {
        @Override
        public <K> K create(Class<K> type) throws Exception {
            if (!type.getName().startsWith("lotgate.") || type.isInterface()) {
                return CommandLine.defaultFactory().create(type);
            }
            Constructor<K> constructor = type.getDeclaredConstructor();
            constructor.setAccessible(true);
            return constructor.newInstance();
        }
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
