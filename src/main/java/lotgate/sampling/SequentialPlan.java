package lotgate.sampling;

/**
 * An item-by-item sequential plan with Wald's straight lines, truncated: after the m-th unit, accept the
 * lot if the count found is at most -h1 + s m, reject it if the count is at least h2 + s m, otherwise
 * inspect one more unit. At the truncation point n_t the lot is accepted with at most s n_t (rounded
 * down) and rejected otherwise (the truncation rule of ISO 8422, from memory), and from the start a count
 * that would be rejected there rejects at once.
 *
 * @param h1         the acceptance line's intercept (below zero)
 * @param h2         the rejection line's intercept
 * @param slope      the common slope s of both lines
 * @param truncation n_t, the most units inspected
 */
public record SequentialPlan(double h1, double h2, double slope, int truncation) implements LatticePlan {

    public SequentialPlan {
        if (!(h1 > 0) || !(h2 > 0) || Double.isInfinite(h1) || Double.isInfinite(h2)) {
            throw new IllegalArgumentException("both intercepts h1 and h2 must be positive, got " + h1 + " and " + h2);
        }
        if (!(slope > 0) || Double.isInfinite(slope)) {
            throw new IllegalArgumentException("the slope s must be positive, got " + slope);
        }
        if (truncation < 1) {
            throw new IllegalArgumentException("the truncation point must be at least 1 unit, got " + truncation);
        }
        if (Math.floor(slope * truncation) + 1 > Integer.MAX_VALUE / 2.0) {
            throw new IllegalArgumentException("the rejection number at the truncation point is too large");
        }
    }

    /** The plan with Wald's lines for the two risk points, truncated after the given number of units. */
    public static SequentialPlan wald(WaldSequential lines, int truncation) {
        return new SequentialPlan(lines.h1(), lines.h2(), lines.slope(), truncation);
    }

    /**
     * The largest count after m units that accepts the lot, or -1 where no count accepts yet.
     */
    public int acceptanceNumber(int m) {
        checkUnits(m);
        if (m == truncation) {
            return finalAcceptance();
        }
        return (int) Math.max(-1, Math.floor(slope * m - h1));
    }

    /** The smallest count after m units that rejects the lot. */
    public int rejectionNumber(int m) {
        checkUnits(m);
        if (m == truncation) {
            return finalAcceptance() + 1;
        }
        return (int) Math.min(finalAcceptance() + 1, Math.ceil(h2 + slope * m));
    }

    private int finalAcceptance() {
        return (int) Math.floor(slope * truncation);
    }

    private void checkUnits(int m) {
        if (m < 1 || m > truncation) {
            throw new IllegalArgumentException("units inspected must be from 1 to " + truncation + ", got " + m);
        }
    }

    /** The decision after m units with the given cumulative count. */
    public Step step(int m, long count) {
        if (count <= acceptanceNumber(m)) {
            return Step.ACCEPT;
        }
        if (count >= rejectionNumber(m)) {
            return Step.REJECT;
        }
        return Step.CONTINUE;
    }

    /** What a sequential plan says after a unit. */
    public enum Step {
        ACCEPT, REJECT, CONTINUE
    }

    @Override
    public String scheme() {
        return "sequential";
    }

    @Override
    public int maxSampleSize() {
        return truncation;
    }

    @Override
    public Stages.Outcome walk(OcModel model, double quality, int lotSize) {
        return SequentialLattice.walk(this, model, quality, lotSize);
    }
}
