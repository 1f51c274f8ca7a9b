package lotgate.sampling;

/**
 * One stage of a double or multiple plan: inspect n more units, then accept the lot if the cumulative count
 * is at most c, reject it if the count is at least r, and otherwise go on to the next stage.
 *
 * @param c the acceptance number on the cumulative count, or {@link #NO_ACCEPTANCE} where the stage cannot
 *          accept (common practice in the first stages of multiple plans)
 * @param r the rejection number on the cumulative count; the last stage of a plan has r = c + 1
 */
public record Stage(int n, int c, int r) {
    /** The acceptance number of a stage that cannot accept the lot. */
    public static final int NO_ACCEPTANCE = -1;

    public Stage {
        if (n < 1) {
            throw new IllegalArgumentException("a stage's sample size must be at least 1, got " + n);
        }
        if (c < NO_ACCEPTANCE) {
            throw new IllegalArgumentException("a stage's acceptance number must be 0 or more (or none), got " + c);
        }
        if (r <= c) {
            throw new IllegalArgumentException("a stage's rejection number must exceed its acceptance number " + c
                    + ", got " + r);
        }
    }

    /** Whether the stage decides every lot that reaches it (as the last stage of a plan must). */
    public boolean decisive() {
        return r == c + 1;
    }
}
