package lotgate.sampling;

/**
 * Finds the double-sampling plan that meets both risks exactly and has the smallest average sample number
 * (ASN) at a chosen quality level, within a stated search space: the second sample is k times the first
 * (n2 = k n1 rounded, at least 1) or free, and the first rejection number is c2 + 1 unless fixed.
 *
 * <p>The search is exact within that space and prunes only with facts that hold for every model here: the
 * plan accepts on a set of counts closed downwards, so P(accept) falls as n1 or n2 grows and rises with c1
 * and c2, while P(reject) does the opposite. Hence, for each (c1, c2), the n1 that meet the consumer's risk
 * start at a smallest one (found by bisection) and, with n2 = k n1, those that also meet the producer's risk
 * end at the first failure; the ASN is at least n1, so n1 stops at the best ASN so far, and so do c2 and c1
 * once their smallest feasible n1 reaches it. With n2 free, the ASN n1 + n2 P(second sample) grows with n2,
 * so each n1 takes the smallest n2 that meets the consumer's risk; n1 is at least the single plan's smallest
 * n for acceptance number c1, n1 + n2 at least the single plan's for c2 (accepting needs at most c2 over both
 * samples), which bounds the ASN from below and ends the loops over n1, c2 and c1.
 */
public final class DoublePlanDesigner {
    /**
     * The most work the search does before it gives up, in point probabilities and tails computed (about half a
     * minute on 2 cores): only AQL and LTPD so close that acceptance numbers run high need more.
     */
    public static final long BUDGET = 250_000_000;

    private final OcModel model;
    private final int largest;
    private final long budget;
    private long candidates;
    private long work;
    private int highestC1;
    private int highestC2;

    /**
     * @param lotSize the lot size N that bounds n1 + n2, or 0 for none
     */
    public DoublePlanDesigner(OcModel model, int lotSize) {
        this(model, lotSize, BUDGET);
    }

    /** A search with its own budget of work (for tests of the stop). */
    DoublePlanDesigner(OcModel model, int lotSize, long budget) {
        this.budget = budget;
        this.model = model;
        int bound = model instanceof OcModel.Hypergeometric h ? h.lotSize() : lotSize;
        this.largest = bound > 0 ? bound : SinglePlanDesigner.MAX_SAMPLE_SIZE;
    }

    /** What the search covers. */
    public record Space(Double ratio, Integer firstRejection) {
        public Space {
            if (ratio != null && !(ratio > 0 && ratio <= 100)) {
                throw new IllegalArgumentException("the second sample's ratio k must lie above 0 and at most 100, got "
                        + ratio);
            }
            if (firstRejection != null && firstRejection < 2) {
                throw new IllegalArgumentException("the first rejection number must be at least 2, got "
                        + firstRejection);
            }
        }

        /** n2 for a given n1 under the ratio. */
        int secondSample(int n1) {
            return (int) Math.max(1, Math.round(ratio * n1));
        }
    }

    /**
     * The plan with the smallest ASN at {@code asnLevel} that meets both risks.
     *
     * @param asnLevel the quality level the ASN is minimised at (the AQL point for the usual design)
     */
    public DoubleDesign design(RiskPoints points, Space space, double asnLevel) {
        candidates = 0;
        work = 0;
        highestC1 = 0;
        highestC2 = 0;
        double aqlPoint = model.producerPoint(points.aql());
        double ltpdPoint = model.consumerPoint(points.ltpd());
        if (aqlPoint >= ltpdPoint) {
            return new DoubleDesign.NotFound("the lot is too small to tell the AQL from the LTPD: both stand for "
                    + Math.round(aqlPoint * largest) + " nonconforming units");
        }
        Space equal = space.ratio() != null ? space : new Space(1.0, space.firstRejection());
        int firstMost = largestFirst(equal);
        if (space.firstRejection() != null) {
            firstMost = firstSampleBound(space.firstRejection(), aqlPoint, points.alpha(), firstMost);
            String none = fixedRejectionBound(points, equal, ltpdPoint, firstMost);
            if (none != null && space.ratio() != null) {
                return new DoubleDesign.NotFound(none);
            }
        }
        Best best = new Best();
        try {
            if (space.ratio() != null) {
                searchWithRatio(points, space, aqlPoint, ltpdPoint, asnLevel, best, firstMost);
            } else {
                // The plans with n2 = n1 are in the free space too: their best is a first bound to prune with.
                searchWithRatio(points, equal, aqlPoint, ltpdPoint, asnLevel, best, firstMost);
                if (best.plan != null) {
                    searchFree(points, space, aqlPoint, ltpdPoint, asnLevel, best);
                }
            }
        } catch (OverBudget e) {
            return new DoubleDesign.NotFound("the search stopped after " + candidates + " plans without proving one"
                    + " the smallest: it reached its work limit having tried first-sample acceptance numbers 0 to "
                    + highestC1 + " and second-sample ones up to " + highestC2 + ", and "
                    + (best.plan == null ? "had found no plan that meets both risks"
                            : "the best plan it had found may not be the smallest")
                    + "; larger acceptance numbers were not tried. Widen the gap between the AQL and the LTPD"
                    + (space.ratio() == null ? ", search with a fixed second-sample ratio," : "")
                    + " or use the single plan");
        }
        if (best.plan == null && space.firstRejection() != null && firstMost < largestFirst(equal)) {
            return new DoubleDesign.NotFound(noPlanWith(equal) + ": " + producerSide(points, space.firstRejection(),
                    firstMost) + ", and none with n1 up to " + firstMost + " meets both risks"
                    + (space.ratio() == null ? "; the search with a free second sample starts from such a plan" : ""));
        }
        if (best.plan == null) {
            String bound = largest < SinglePlanDesigner.MAX_SAMPLE_SIZE ? "at most the lot size " + largest
                    : "at most " + largest + " units";
            return new DoubleDesign.NotFound(space.ratio() != null
                    ? "no double plan with n1 + n2 " + bound + " meets both risks"
                    : "no double plan with n2 = n1 and n1 + n2 " + bound + " meets both risks, and the search with"
                            + " a free second sample starts from such a plan: try a fixed second-sample ratio");
        }
        return new DoubleDesign.Found(best.plan, PlanRisks.of(best.plan, model, points), best.asn, candidates);
    }

    /**
     * With the first rejection number fixed at r1, the first sample alone rejects when it finds r1 or more, and
     * that chance grows with n1: the largest n1 whose first sample alone keeps P(reject | AQL) within alpha
     * bounds every plan of the space.
     */
    private int firstSampleBound(int r1, double aqlPoint, double alpha, int top) {
        if (top < 1 || model.moreThan(1, r1 - 1, aqlPoint) > alpha) {
            return 0;
        }
        if (model.moreThan(top, r1 - 1, aqlPoint) <= alpha) {
            return top;
        }
        return boundary(top, 1, n1 -> model.moreThan(n1, r1 - 1, aqlPoint) <= alpha);
    }

    /**
     * Why no plan with a fixed first rejection number and ratio exists, or null when one may. Within the
     * producer's bound on n1, the plan strictest at the LTPD has the largest samples and the smallest acceptance
     * numbers (c1 = 0, c2 = r1 - 1): if even it accepts more than beta of lots at the LTPD, none meets both risks.
     */
    private String fixedRejectionBound(RiskPoints points, Space space, double ltpdPoint, int firstMost) {
        int r1 = space.firstRejection();
        String producerSide = producerSide(points, r1, firstMost);
        if (firstMost < 1) {
            return noPlanWith(space) + ": " + producerSide;
        }
        DoublePlan strictest = new DoublePlan(firstMost, 0, r1, space.secondSample(firstMost), r1 - 1);
        double accepted = strictest.acceptance(model, ltpdPoint);
        if (accepted <= points.beta()) {
            return null;
        }
        return noPlanWith(space) + ": " + producerSide + ", and every plan with n1 up to " + firstMost
                + " accepts more than " + percent(points.beta()) + " of lots at the LTPD (the strictest, n1 = "
                + strictest.n1() + ", c1 = 0, r1 = " + r1 + ", n2 = " + strictest.n2() + ", c2 = " + strictest.c2()
                + ", accepts " + percent(accepted) + ")";
    }

    private static String noPlanWith(Space space) {
        return "no double plan with r1 = " + space.firstRejection() + " and n2 = "
                + new java.math.BigDecimal(Double.toString(space.ratio())).stripTrailingZeros().toPlainString()
                + " x n1 meets both risks";
    }

    /** Why n1 cannot exceed its bound when the first rejection number is fixed. */
    private String producerSide(RiskPoints points, int r1, int firstMost) {
        return "a first sample larger than " + firstMost + " alone rejects more than " + percent(points.alpha())
                + " of lots at the AQL (P(reject) = " + percent(model.moreThan(firstMost + 1, r1 - 1,
                        model.producerPoint(points.aql()))) + " at n1 = " + (firstMost + 1) + ")";
    }

    /** A probability as percent with four significant digits, for the reasons given when no plan is found. */
    private static String percent(double fraction) {
        return new java.math.BigDecimal(fraction * 100).round(new java.math.MathContext(4)).stripTrailingZeros()
                .toPlainString() + "%";
    }

    /** The best plan so far, compared by ASN, then the largest sample, then n1, c1 and c2. */
    private static final class Best {
        DoublePlan plan;
        double asn = Double.POSITIVE_INFINITY;

        void offer(DoublePlan candidate, double value) {
            if (plan == null || value < asn * (1 - 1e-12) || (value <= asn * (1 + 1e-12)
                    && DoublePlan.SMALLER_FIRST.compare(candidate, plan) < 0)) {
                plan = candidate;
                asn = Math.min(asn, value);
            }
        }

        /** Whether a plan whose ASN is at least this bound could still win. */
        boolean open(double bound) {
            return bound <= asn * (1 + 1e-12);
        }
    }

    private void searchWithRatio(RiskPoints points, Space space, double aqlPoint, double ltpdPoint, double asnLevel,
            Best best, int firstMost) {
        for (int c1 = 0; ; c1++) {
            int c2First = firstC2(space, c1);
            if (c2First < 0) {
                return;
            }
            int floor = 1;
            boolean any = false;
            for (int c2 = c2First; ; c2++) {
                highestC2 = Math.max(highestC2, c2);
                if ((long) c2 > (long) firstMost + space.secondSample(firstMost)) {
                    break; // past the whole sample, c2 accepts every second sample: nothing new beyond
                }
                int r1 = space.firstRejection() != null ? space.firstRejection() : c2 + 1;
                int n1 = smallestFirstSample(c1, r1, c2, space, ltpdPoint, points.beta(), floor);
                // A larger c2 needs a larger n1 still, so past the producer's bound on n1 nothing is left.
                if (n1 < 0 || n1 > firstMost || !best.open(n1)) {
                    break;
                }
                any = true;
                floor = n1;
                for (; best.open(n1) && n1 + space.secondSample(n1) <= largest; n1++) {
                    DoublePlan plan = new DoublePlan(n1, c1, r1, space.secondSample(n1), c2);
                    count(c1, r1);
                    if (plan.rejection(model, aqlPoint) > points.alpha()) {
                        break;
                    }
                    best.offer(plan, plan.averageSampleNumber(model, asnLevel));
                }
            }
            if (!any) {
                return;
            }
        }
    }

    /** The first c2 for an acceptance number c1, or -1 when c1 is too large for a fixed r1. */
    private static int firstC2(Space space, int c1) {
        if (space.firstRejection() == null) {
            return c1 + 1;
        }
        if (c1 > space.firstRejection() - 2) {
            return -1;
        }
        return Math.max(c1 + 1, space.firstRejection() - 1);
    }

    /** The smallest n1 (n2 = k n1) whose P(accept | LTPD) is at most beta, or -1 if none fits. */
    private int smallestFirstSample(int c1, int r1, int c2, Space space, double ltpdPoint, double beta, int floor) {
        int top = largestFirst(space);
        if (top < 1 || !meetsConsumer(top, c1, r1, space.secondSample(top), c2, ltpdPoint, beta)) {
            return -1;
        }
        int bad = floor - 1;
        int good = top;
        long step = 1;
        for (long probe = bad + step; probe < good; step *= 2, probe = bad + step) {
            if (meetsConsumer((int) probe, c1, r1, space.secondSample((int) probe), c2, ltpdPoint, beta)) {
                good = (int) probe;
                break;
            }
            bad = (int) probe;
        }
        return boundary(bad, good, n -> meetsConsumer(n, c1, r1, space.secondSample(n), c2, ltpdPoint, beta));
    }

    private int largestFirst(Space space) {
        return boundary(largest, 0, n1 -> (long) n1 + space.secondSample(n1) <= largest);
    }

    /**
     * Bisection between a value that fails and one that passes a test that holds from some value on (or, with
     * bad above good, up to some value): the passing value next to the failing ones.
     */
    static int boundary(int bad, int good, java.util.function.IntPredicate passes) {
        while (Math.abs(good - bad) > 1) {
            int mid = bad + (good - bad) / 2;
            if (passes.test(mid)) {
                good = mid;
            } else {
                bad = mid;
            }
        }
        return good;
    }

    /** Counts one plan evaluated with its first-sample counts c1 < d1 < r1, and stops once the budget is spent. */
    private void count(int c1, int r1) {
        candidates++;
        highestC1 = Math.max(highestC1, c1);
        work += r1 - c1 + 2L;
        if (work > budget) {
            throw new OverBudget();
        }
    }

    /** The search ran out of its budget before it could prove a plan the best. */
    private static final class OverBudget extends RuntimeException {
        OverBudget() {
            super(null, null, false, false);
        }
    }

    private boolean meetsConsumer(int n1, int c1, int r1, int n2, int c2, double ltpdPoint, double beta) {
        count(c1, r1);
        return new DoublePlan(n1, c1, r1, n2, c2).acceptance(model, ltpdPoint) <= beta;
    }

    private void searchFree(RiskPoints points, Space space, double aqlPoint, double ltpdPoint, double asnLevel,
            Best best) {
        SinglePlanDesigner single = new SinglePlanDesigner(model, largest == SinglePlanDesigner.MAX_SAMPLE_SIZE ? 0
                : largest);
        for (int c1 = 0; ; c1++) {
            int c2First = firstC2(space, c1);
            if (c2First < 0) {
                return;
            }
            // Accepting at the first sample alone must already be rare enough at the LTPD.
            int firstLeast = single.smallestSampleFor(c1, ltpdPoint, points.beta(), c1, 1);
            if (firstLeast < 0 || !best.open(firstLeast)) {
                return;
            }
            for (int c2 = c2First; ; c2++) {
                highestC2 = Math.max(highestC2, c2);
                int r1 = space.firstRejection() != null ? space.firstRejection() : c2 + 1;
                int totalLeast = single.smallestSampleFor(Math.min(c2, r1 - 1), ltpdPoint, points.beta(), c1, 1);
                if (totalLeast < 0) {
                    break;
                }
                boolean any = false;
                int secondUpper = -1;
                for (int n1 = firstLeast; best.open(n1) && n1 < largest; n1++) {
                    DoublePlan probe = new DoublePlan(n1, c1, r1, 1, c2);
                    work += r1 - c1;
                    double second = probe.secondSampleChance(model, asnLevel);
                    if (!best.open(n1 + Math.max(0, totalLeast - n1) * second)) {
                        continue;
                    }
                    any = true;
                    int n2 = smallestSecondSample(n1, c1, r1, c2, ltpdPoint, points.beta(), secondUpper);
                    if (n2 < 0) {
                        continue;
                    }
                    secondUpper = n2;
                    DoublePlan plan = new DoublePlan(n1, c1, r1, n2, c2);
                    count(c1, r1);
                    if (plan.rejection(model, aqlPoint) > points.alpha()) {
                        continue;
                    }
                    best.offer(plan, plan.averageSampleNumber(model, asnLevel));
                }
                if (!any) {
                    break;
                }
            }
        }
    }

    /**
     * The smallest n2 whose plan meets the consumer's risk, or -1 if none fits in the lot.
     *
     * @param upper an n2 known to meet it (from a smaller n1), or -1
     */
    private int smallestSecondSample(int n1, int c1, int r1, int c2, double ltpdPoint, double beta, int upper) {
        int top = largest - n1;
        if (top < 1) {
            return -1;
        }
        int good;
        int bad = 0;
        if (upper > 0 && upper <= top) {
            good = upper;
            // Gallop down from the last answer: it rarely moves far.
            long step = 1;
            for (long probe = good - step; probe > bad; step *= 2, probe = good - step) {
                if (meetsConsumer(n1, c1, r1, (int) probe, c2, ltpdPoint, beta)) {
                    good = (int) probe;
                } else {
                    bad = (int) probe;
                    break;
                }
            }
        } else {
            if (!meetsConsumer(n1, c1, r1, top, c2, ltpdPoint, beta)) {
                return -1;
            }
            good = top;
            long step = 1;
            for (long probe = bad + step; probe < good; step *= 2, probe = bad + step) {
                if (meetsConsumer(n1, c1, r1, (int) probe, c2, ltpdPoint, beta)) {
                    good = (int) probe;
                    break;
                }
                bad = (int) probe;
            }
        }
        return boundary(bad, good, n2 -> meetsConsumer(n1, c1, r1, n2, c2, ltpdPoint, beta));
    }
}
