package lotgate.jobs;

/**
 * A request a job refuses, with the field (request component, option or sheet cell) it is about;
 * each face turns the kind into its own message and exit code.
 */
public final class JobException extends RuntimeException {
    /** Why a job refused its request. */
    public enum Kind {
        /** A value or combination of values in the request is not allowed. */
        INVALID_REQUEST,
        /** The request clashes with what is already recorded (a lot recorded twice, a record to correct). */
        CONFLICT,
        /** The request names something the store does not hold (a supplier without lots). */
        NOT_FOUND,
        /** An input file's content does not fit the request (a plan family without the plan asked for). */
        BAD_INPUT,
        /** The sample on the sheet holds fewer or more units than the plan inspects. */
        INCOMPLETE_SAMPLE,
        /** Inspection of the supplier's part is discontinued until a corrective action is recorded. */
        DISCONTINUED,
        /** No sampling plan meets the request, or none could be proved to before a search reached its limit. */
        NO_PLAN
    }

    private final Kind kind;
    private final String field;

    /** A refusal of the given kind about the given field, with a message that names it. */
    public JobException(Kind kind, String field, String message) {
        super(message);
        this.kind = kind;
        this.field = field;
    }

    /** A bad value or combination of values in the request. */
    static JobException invalid(String field, String message) {
        return new JobException(Kind.INVALID_REQUEST, field, message);
    }

    /** Why the request was refused. */
    public Kind kind() {
        return kind;
    }

    /** The request field, option or sheet cell the refusal is about (never null; "" when it is about the whole). */
    public String field() {
        return field;
    }
}
