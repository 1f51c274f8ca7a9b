package lotgate.sampling;

import java.util.function.LongConsumer;

/**
 * Finds the double plan with the least average total inspection (ATI) at a process average, under rectifying
 * inspection, among the plans whose P(accept) at the LTPD is at most the consumer's risk: the Dodge-Romig
 * double plans, computed exactly for the lot size. The family is theirs: n1 and n2 free (n1 + n2 at most the lot
 * size), c1 < c2, and the first sample rejects only when it finds more than c2 (r1 = c2 + 1).
 *
 * <p>ATI = n1 Pa1 + (n1 + n2) Pa2 + N (1 - Pa): lots accepted on the first sample cost n1, on the second n1 + n2,
 * and rejected lots are screened. Why the search is exact:
 * <ul>
 * <li>A lot is accepted when d1 <= c1 or d1 + d2 <= c2, a set closed downwards, so P(accept) falls as n1 or n2
 * grows, at the LTPD as at the process average: for (c1, c2, n1) the plans that protect are those with n2 from a
 * smallest one on, and that smallest n2 never grows with n1.</li>
 * <li>Writing ATI = N - (N - n1 - n2) Pa - n2 Pa1 = N - (N - n1) Pa1 - (N - n1 - n2) Pa2, the ATI grows with n2
 * (Pa2 falls, Pa1 does not move) and with n1 (Pa and Pa1 both fall): for each n1 only the smallest protecting n2
 * counts, and once that n2 is 1 no larger n1 can do better.</li>
 * <li>Every lot costs at least n1, and one whose first count exceeds c2 costs N, so ATI >= n1 + (N - n1)
 * P(d1 > c2), which grows with n1: n1 stops there.</li>
 * <li>P(accept) is at least P(d1 <= c1) and at least P(d1 + d2 <= c2), so n1 is at least the smallest single
 * sample s(c1) that protects with acceptance number c1 and n1 + n2 at least s(c2); s grows with c. Every lot
 * whose first count exceeds c1 costs at least n1 + n2, so ATI >= n1 + (s(c2) - n1) P(d1 > c1), which is least at
 * n1 = s(c1): that bound ends the loop over c2, and s(c1) reaching the best ATI ends the loop over c1.</li>
 * </ul>
 * The exact figures of the plan found come from the plan's own operating characteristic ({@link DoublePlan}).
 */
public final class LeastInspectionDoubleSearch {
    /**
     * The most work the search does before it gives up, counted as (c2 - c1) (c2 + 1) per plan whose risk it
     * evaluates (each first count c1 < d1 <= c2 with a tail of up to c2 terms): about ten seconds on 2 cores. A
     * process average of a quarter of the LTPD needs well under a hundredth of it for lots of up to 1,000,000
     * units; a process average close to the LTPD in a large lot drives both acceptance numbers high and may need
     * more.
     */
    public static final long BUDGET = 2_000_000_000L;

    private final OcModel model;
    private final int lotSize;
    private final long budget;
    private long evaluated;
    private long work;
    private LongConsumer plansEvaluated = count -> { };

    /**
     * @param model   the OC model (a hypergeometric model must be for the same lot size)
     * @param lotSize the lot size N, at least 2
     */
    public LeastInspectionDoubleSearch(OcModel model, int lotSize) {
        this(model, lotSize, BUDGET);
    }

    LeastInspectionDoubleSearch(OcModel model, int lotSize, long budget) {
        new LeastInspectionDesigner(model, lotSize); // the same checks of the lot size and model
        this.model = model;
        this.lotSize = lotSize;
        this.budget = budget;
    }

    /**
     * The result: the plan (null when no double plan inspects less on average than screening every unit) with its
     * figures at the process average, and the number of plans whose risk was evaluated.
     *
     * @param firstAcceptance P(accept on the first sample) at the process average
     * @param asn             the ASN at the process average (second sample inspected in full)
     */
    public record Result(DoublePlan plan, double ati, double acceptanceAtAverage, double firstAcceptance, double asn,
            double aoql, double aoqlAt, double ltpd10, long plansCompared) {
        /** Whether no double plan inspects fewer units on average than screening every lot. */
        public boolean inspectEveryUnit() {
            return plan == null;
        }
    }

    /** The search ran out of its budget before it could prove a plan the best. */
    public static final class OverBudget extends RuntimeException {
        OverBudget(long plans) {
            super("the search stopped after evaluating " + plans + " plans without proving one the least (a process"
                    + " average this close to the LTPD in a lot this large needs high acceptance numbers)", null, false,
                    false);
        }
    }

    /**
     * The least-ATI double plan whose P(accept) at the LTPD is at most {@code beta}.
     *
     * @throws OverBudget when the search would need more than its budget of work
     */
    public Result forLtpd(double ltpd, double beta, double processAverage) {
        return forLtpd(ltpd, beta, processAverage, count -> { });
    }

    /**
     * As {@link #forLtpd(double, double, double)}, telling {@code plansEvaluated} the number of plans whose risk
     * has been evaluated so far after each one (for a progress line: a large lot may take seconds).
     */
    public Result forLtpd(double ltpd, double beta, double processAverage, LongConsumer plansEvaluated) {
        this.plansEvaluated = plansEvaluated;
        if (!(processAverage >= 0 && processAverage < model.maxQuality())) {
            throw new IllegalArgumentException("the process average must be 0 or more and below "
                    + model.maxQuality() + ", got " + processAverage);
        }
        if (!(ltpd > 0 && ltpd <= model.maxQuality()) || !(beta > 0 && beta < 1)) {
            throw new IllegalArgumentException("the LTPD must be positive and the consumer's risk between 0 and 1");
        }
        evaluated = 0;
        work = 0;
        double point = model.consumerPoint(ltpd);
        Best best = new Best(lotSize);
        SinglePlanDesigner single = new SinglePlanDesigner(model, lotSize);
        seed(single, ltpd, point, beta, processAverage, best);
        for (int c1 = 0; ; c1++) {
            int firstLeast = single.smallestSampleFor(c1, point, beta, c1, 1);
            if (firstLeast < 0 || !best.open(firstLeast)) {
                break;
            }
            double goOn = model.moreThan(firstLeast, c1, processAverage);
            for (int c2 = c1 + 1; ; c2++) {
                int totalLeast = single.smallestSampleFor(c2, point, beta, c2, 1);
                if (totalLeast < 0 || !best.open(firstLeast + Math.max(0, totalLeast - firstLeast) * goOn)) {
                    break;
                }
                staircase(c1, c2, firstLeast, totalLeast, point, beta, processAverage, best);
            }
        }
        if (best.plan == null) {
            return new Result(null, lotSize, 0, 0, 0, 0, 0, 0, evaluated);
        }
        DoublePlan plan = best.plan;
        OperatingCharacteristic oc = new OperatingCharacteristic(plan, model, lotSize);
        OperatingCharacteristic.Aoql limit = new LeastInspectionDesigner(model, lotSize).aoql(plan);
        return new Result(plan, plan.averageTotalInspection(model, processAverage, lotSize),
                plan.acceptance(model, processAverage), model.atMost(plan.n1(), plan.c1(), processAverage),
                plan.averageSampleNumber(model, processAverage), limit.limit(), limit.quality(), oc.qualityAt(0.10),
                evaluated);
    }

    /**
     * Searches a few (c1, c2) around the single least-inspection plan's acceptance number c first: a good plan
     * found early lets the bounds leave out more of the search. Only the order changes, not the answer.
     */
    private void seed(SinglePlanDesigner single, double ltpd, double point, double beta, double average, Best best) {
        SinglePlan plain = new LeastInspectionDesigner(model, lotSize).forLtpd(ltpd, beta, average).plan();
        if (plain == null || plain.c() < 2) {
            return;
        }
        int c = plain.c();
        for (int c1 : new int[] {c / 4, c / 2}) {
            for (int c2 : new int[] {c + 1, 3 * c / 2, 2 * c, 3 * c}) {
                int firstLeast = single.smallestSampleFor(c1, point, beta, c1, 1);
                int totalLeast = single.smallestSampleFor(c2, point, beta, c2, 1);
                if (c1 < c2 && firstLeast >= 0 && totalLeast >= 0) {
                    staircase(c1, c2, firstLeast, totalLeast, point, beta, average, best);
                }
            }
        }
    }

    /**
     * Searches the staircase of (c1, c2): each n1 from its least value with the smallest n2 that protects (which
     * never grows with n1). Over a run of n1 from a to b, every plan has n1 >= a and n2 >= n2(b), so its ATI is at
     * least that of (a, n2(b)); runs whose bound cannot beat the best so far are left out whole, the others are
     * halved.
     */
    private void staircase(int c1, int c2, int firstLeast, int totalLeast, double point, double beta, double average,
            Best best) {
        Step step = new Step(c1, c2, totalLeast, point, beta, average);
        int low = firstLeast;
        // Lots whose first count exceeds c2 are screened, and n2 is at least s(c2) - n1 with n1 below the best ATI.
        if (!best.open(low + (lotSize - low) * model.moreThan(low, c2, average))
                || !best.open(step.ati(low, Math.max(1, Math.min(lotSize - low, totalLeast - (int) best.ati))))) {
            return;
        }
        int lowSecond = step.second(low, -1);
        if (lowSecond < 0) {
            // Even the rest of the lot as second sample does not protect: n1 must grow (with n1 + n2 = N, a larger
            // n1 only lowers P(accept)).
            int bad = low;
            int good = lotSize - 1;
            if (good <= bad || !protects(good, c1, 1, c2, point, beta)) {
                return;
            }
            low = DoublePlanDesigner.boundary(bad, good, n1 -> protects(n1, c1, lotSize - n1, c2, point, beta));
            lowSecond = step.second(low, lotSize - low);
        }
        // Past the least n1 whose second sample can be a single unit, every plan is worse than that one.
        int high = Math.min(lotSize - 1, (int) Math.min(Integer.MAX_VALUE - 1L, (long) Math.floor(best.ati)));
        if (high < low) {
            return;
        }
        if (protects(low, c1, 1, c2, point, beta)) {
            high = low;
        } else if (protects(high, c1, 1, c2, point, beta)) {
            high = DoublePlanDesigner.boundary(low, high, n1 -> protects(n1, c1, 1, c2, point, beta));
        }
        step.offer(low, lowSecond, best);
        if (high == low) {
            return;
        }
        int highSecond = step.second(high, lowSecond);
        if (highSecond < 0) {
            return;
        }
        step.offer(high, highSecond, best);
        step.run(low, lowSecond, high, highSecond, best);
    }

    /** The staircase of one (c1, c2). */
    private final class Step {
        private final int c1;
        private final int c2;
        private final int totalLeast;
        private final double point;
        private final double beta;
        private final double average;

        Step(int c1, int c2, int totalLeast, double point, double beta, double average) {
            this.c1 = c1;
            this.c2 = c2;
            this.totalLeast = totalLeast;
            this.point = point;
            this.beta = beta;
            this.average = average;
        }

        /** The smallest protecting n2 for this n1 (at most {@code upper} when that is known), or -1. */
        int second(int n1, int upper) {
            return smallestSecond(n1, c1, c2, point, beta, Math.max(1, totalLeast - n1), upper);
        }

        double ati(int n1, int n2) {
            double first = model.atMost(n1, c1, average);
            double accept = DoublePlan.of(n1, c1, n2, c2).acceptance(model, average);
            return lotSize - (lotSize - n1) * first - (double) (lotSize - n1 - n2) * (accept - first);
        }

        void offer(int n1, int n2, Best best) {
            best.offer(DoublePlan.of(n1, c1, n2, c2), ati(n1, n2));
        }

        /** The n1 strictly between a and b, whose smallest n2 lie between those of b and a. */
        void run(int a, int secondA, int b, int secondB, Best best) {
            if (b - a < 2) {
                return;
            }
            // A lot whose first count exceeds c2 is screened: (N - a) P(d1 > c2) is a cost every n1 >= a bears.
            double floor = a + 1 + (lotSize - a - 1) * model.moreThan(a + 1, c2, average);
            if (!best.open(floor) || !best.open(ati(a + 1, secondB))) {
                return;
            }
            int m = a + (b - a) / 2;
            int secondM = smallestSecond(m, c1, c2, point, beta, Math.max(secondB, totalLeast - m), secondA);
            offer(m, secondM, best);
            run(a, secondA, m, secondM, best);
            run(m, secondM, b, secondB, best);
        }
    }

    /**
     * The smallest n2 of at least {@code least} that protects with this n1, or -1 when none fits in the lot.
     *
     * @param upper an n2 known to protect with a smaller n1, or -1
     */
    private int smallestSecond(int n1, int c1, int c2, double point, double beta, int least, int upper) {
        int top = lotSize - n1;
        if (top < least) {
            return -1;
        }
        int bad = least - 1;
        int good;
        if (upper > 0 && upper <= top) {
            good = upper;
        } else {
            // Gallop up from the least n2: the answer usually lies within a few times the least second sample.
            good = -1;
            for (long step = 1; good < 0; step *= 2) {
                int probe = (int) Math.min(top, bad + step);
                if (protects(n1, c1, probe, c2, point, beta)) {
                    good = probe;
                } else if (probe == top) {
                    return -1;
                } else {
                    bad = probe;
                }
            }
        }
        return DoublePlanDesigner.boundary(bad, good, n2 -> protects(n1, c1, n2, c2, point, beta));
    }

    private boolean protects(int n1, int c1, int n2, int c2, double point, double beta) {
        evaluated++;
        plansEvaluated.accept(evaluated);
        work += (long) (c2 - c1) * (c2 + 1);
        if (work > budget) {
            throw new OverBudget(evaluated - 1);
        }
        return DoublePlan.of(n1, c1, n2, c2).acceptance(model, point) <= beta;
    }

    /** The best plan so far, by ATI, then the smaller n1 + n2, then n1, c1 and c2. */
    private static final class Best {
        DoublePlan plan;
        double ati;

        Best(int lotSize) {
            ati = lotSize;
        }

        void offer(DoublePlan candidate, double value) {
            if (value < ati * (1 - 1e-12) || (plan != null && value <= ati * (1 + 1e-12)
                    && DoublePlan.SMALLER_FIRST.compare(candidate, plan) < 0)) {
                plan = candidate;
                ati = Math.min(ati, value);
            }
        }

        /** Whether a plan whose ATI is at least this bound could still win. */
        boolean open(double bound) {
            return bound <= ati * (1 + 1e-12);
        }
    }
}
