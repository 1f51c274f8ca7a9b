package lotgate.cli;

/** The exit codes lotgate documents, so that scripts can branch on them. */
public final class ExitCode {
    /** Done; for sentencing: the lot is accepted. */
    public static final int OK = 0;
    /** Sentencing: the lot is rejected. */
    public static final int REJECTED = 1;
    /** A bad option, value or combination of options. */
    public static final int USAGE = 2;
    /** An input file is missing, unreadable or invalid (a plan file, an inspection sheet). */
    public static final int BAD_INPUT = 3;
    /** Sentencing: the sample holds fewer or more units than the plan asks for. */
    public static final int INCOMPLETE_SAMPLE = 4;
    /** No sampling plan meets the request; the output says what to do instead. */
    public static final int NO_PLAN = 5;
    /** An output file could not be written; nothing was left half-written. */
    public static final int CANNOT_WRITE = 6;
    /** The history store cannot be opened or written, was altered, or is of a newer schema. */
    public static final int STORE = 7;
    /** Inspection of this supplier's part is discontinued until a corrective action is recorded. */
    public static final int DISCONTINUED = 8;
    /** Sentencing: a double, multiple or sequential plan has not decided yet; inspect more units. */
    public static final int NOT_DECIDED = 9;
    /** A fault in lotgate itself; rerun with --debug and report it. */
    public static final int INTERNAL = 70;

    private ExitCode() {
    }
}
