package lotgate.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import lotgate.files.InputFileException;
import lotgate.files.OutputFileException;
import lotgate.history.NameMatch;
import lotgate.jobs.JobException;
import picocli.CommandLine;

/**
 * How a command that did not end well is told to the user: one line, {@code lotgate: ...}, the stack trace only
 * with --debug, and the documented exit code of what went wrong.
 */
final class Outcomes {
    private Outcomes() {
    }

    static int usageError(CommandLine.ParameterException e, String[] args) {
        CommandLine cli = e.getCommandLine();
        PrintWriter err = cli.getErr();
        String message = e.getMessage();
        if (e instanceof CommandLine.UnmatchedArgumentException unmatched && !unmatched.getUnmatched().isEmpty()) {
            String first = unmatched.getUnmatched().get(0);
            message = cli.getParent() == null && !first.startsWith("-")
                    ? "unknown command '" + first + "'; the commands are "
                            + String.join(", ", cli.getSubcommands().keySet())
                    : "unknown option or extra argument '" + first + "'" + suggestion(cli.getCommandSpec(), first);
        } else if (e instanceof CommandLine.MissingParameterException missing) {
            message = missing(cli.getCommandSpec(), missing.getMissing());
        }
        err.println("lotgate: " + lotgate.history.Identifiers.escape(lotgate.history.StoreLocation.masked(message))
                + " (see '" + cli.getCommandSpec().qualifiedName() + " --help')");
        if (debugRequested(args)) {
            e.printStackTrace(err);
        }
        err.flush();
        return ExitCode.USAGE;
    }

    /**
     * "missing SHEET; write 'lotgate sentence PLAN SHEET'" for arguments left out, "missing option --aql" for options:
     * picocli's own wording quotes its labels with their syntax, which a reader need not parse.
     */
    static String missing(CommandLine.Model.CommandSpec spec, List<CommandLine.Model.ArgSpec> args) {
        List<String> names = new ArrayList<>();
        boolean positional = false;
        for (CommandLine.Model.ArgSpec arg : args) {
            if (arg instanceof CommandLine.Model.OptionSpec option) {
                names.add("option " + option.longestName());
            } else if (!positional) {
                // picocli names the first argument missing; those after it are missing too.
                int first = ((CommandLine.Model.PositionalParamSpec) arg).index().min();
                for (CommandLine.Model.PositionalParamSpec parameter : spec.positionalParameters()) {
                    if (parameter.required() && parameter.index().min() >= first) {
                        names.add(parameter.paramLabel());
                    }
                }
                positional = true;
            }
        }
        String list = names.size() == 1 ? names.get(0)
                : String.join(", ", names.subList(0, names.size() - 1)) + " and " + names.get(names.size() - 1);
        if (!positional) {
            return "missing " + list;
        }
        StringBuilder synopsis = new StringBuilder(spec.qualifiedName());
        for (CommandLine.Model.PositionalParamSpec parameter : spec.positionalParameters()) {
            if (!parameter.hidden()) {
                String label = parameter.paramLabel() + (parameter.arity().max() > 1 ? "..." : "");
                synopsis.append(' ').append(parameter.required() ? label : "[" + label + "]");
            }
        }
        return "missing " + list + "; write '" + synopsis + "'";
    }

    /**
     * "; did you mean '--lot-size'?" when the unknown option is one of the command's long options written with
     * other capitals or hyphens, or two typing slips away from exactly one of them; otherwise nothing.
     */
    static String suggestion(CommandLine.Model.CommandSpec spec, String typed) {
        if (!typed.startsWith("--")) {
            return "";
        }
        String written = typed.contains("=") ? typed.substring(0, typed.indexOf('=')) : typed;
        String bare = written.substring(2).toLowerCase(java.util.Locale.ROOT);
        String best = null;
        int bestDistance = 3;
        boolean tie = false;
        for (CommandLine.Model.OptionSpec option : spec.options()) {
            if (option.hidden()) {
                continue;
            }
            for (String name : option.names()) {
                if (!name.startsWith("--")) {
                    continue;
                }
                String candidate = name.substring(2);
                int distance = candidate.replace("-", "").equals(bare.replace("-", "")) ? 0
                        : NameMatch.distance(candidate, bare);
                if (distance < bestDistance) {
                    best = name;
                    bestDistance = distance;
                    tie = false;
                } else if (distance == bestDistance && !name.equals(best)) {
                    tie = true;
                }
            }
        }
        return best == null || tie ? "" : "; did you mean '" + best + "'?";
    }

    static int failure(Exception e, CommandLine cli, CommandLine.ParseResult parsed) {
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
        } else if (e instanceof Main.Failure f) {
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
            case NO_PLAN -> ExitCode.NO_PLAN;
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
}
