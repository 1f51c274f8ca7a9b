package lotgate.sampling;

/**
 * Finds the single plan with the least average total inspection (ATI) at a process average, under
 * rectifying inspection (rejected lots are screened 100%), among the plans that give a lot-quality
 * protection: an LTPD at a consumer's risk, or an AOQL. These are the plans Dodge and Romig tabled, here
 * computed exactly for the lot size given instead of read from lot-size bands.
 *
 * <p>Why the search is exact: ATI = N - (N - n) Pa(n) at the process average, and for a fixed acceptance
 * number c both N - n and Pa fall as n grows, so the ATI grows with n. The protection holds from a
 * smallest n on (P(accept) at the LTPD and the AOQ at every quality fall as n grows), so for each c the
 * best plan is the smallest n that protects, found by bisection. Over c, the ATI is at least n, and the
 * smallest protecting n never falls as c grows; the search over c stops once that n reaches the best ATI
 * found.
 */
public final class LeastInspectionDesigner {
    private final OcModel model;
    private final int lotSize;

    /**
     * @param model   the OC model (a hypergeometric model must be for the same lot size)
     * @param lotSize the lot size N, at least 2
     */
    public LeastInspectionDesigner(OcModel model, int lotSize) {
        if (lotSize < 2) {
            throw new IllegalArgumentException("the lot size must be at least 2, got " + lotSize);
        }
        if (model instanceof OcModel.Hypergeometric h && h.lotSize() != lotSize) {
            throw new IllegalArgumentException("the hypergeometric model is tied to lot size " + h.lotSize()
                    + ", not " + lotSize);
        }
        this.model = model;
        this.lotSize = lotSize;
    }

    /** The result: the plan (null when inspecting every unit costs no more) with its figures. */
    public record Result(SinglePlan plan, double ati, double acceptanceAtAverage, double aoql, double aoqlAt,
            double ltpd10, int plansCompared) {
        /** Whether no sampling plan inspects fewer units on average than screening every lot. */
        public boolean inspectEveryUnit() {
            return plan == null;
        }
    }

    /**
     * The least-ATI plan whose P(accept) at the LTPD is at most {@code beta}.
     *
     * @param processAverage the supplier's usual quality (a fraction), where the ATI is counted
     */
    public Result forLtpd(double ltpd, double beta, double processAverage) {
        check(processAverage);
        if (!(ltpd > 0 && ltpd <= model.maxQuality()) || !(beta > 0 && beta < 1)) {
            throw new IllegalArgumentException("the LTPD must be positive and the consumer's risk between 0 and 1");
        }
        double point = model.consumerPoint(ltpd);
        return search((n, c) -> model.atMost(n, c, point) <= beta, processAverage);
    }

    /** The least-ATI plan whose AOQL with rectifying inspection of lots of this size is at most the target. */
    public Result forAoql(double target, double processAverage) {
        check(processAverage);
        if (!(target > 0)) {
            throw new IllegalArgumentException("the AOQL must be positive, got " + target);
        }
        return search((n, c) -> aoql(new SinglePlan(n, c)).limit() <= target, processAverage);
    }

    private interface Protects {
        boolean test(int n, int c);
    }

    private Result search(Protects protects, double average) {
        double best = lotSize;
        int bestN = -1;
        int bestC = -1;
        int compared = 0;
        int low = 1;
        for (int c = 0; c < lotSize; c++) {
            // No n protects with this c (nor with any larger one) when inspecting the whole lot does not.
            if (!protects.test(lotSize, c)) {
                break;
            }
            int bad = Math.max(c, low - 1);
            int good = lotSize;
            while (good - bad > 1) {
                int mid = bad + (good - bad) / 2;
                if (protects.test(mid, c)) {
                    good = mid;
                } else {
                    bad = mid;
                }
            }
            int n = good;
            low = n;
            if (n >= best) {
                break;
            }
            compared++;
            double ati = n + (lotSize - n) * model.moreThan(n, c, average);
            if (ati < best) {
                best = ati;
                bestN = n;
                bestC = c;
            }
        }
        if (bestN < 0) {
            return new Result(null, lotSize, 0, 0, 0, 0, compared);
        }
        SinglePlan plan = new SinglePlan(bestN, bestC);
        OperatingCharacteristic oc = new OperatingCharacteristic(plan, model, lotSize);
        OperatingCharacteristic.Aoql limit = aoql(plan);
        return new Result(plan, best, model.atMost(bestN, bestC, average), limit.limit(), limit.quality(),
                oc.qualityAt(0.10), compared);
    }

    private void check(double processAverage) {
        if (!(processAverage >= 0 && processAverage < model.maxQuality())) {
            throw new IllegalArgumentException("the process average must be 0 or more and below "
                    + model.maxQuality() + ", got " + processAverage);
        }
    }

    /**
     * The AOQL of a plan with rectification of lots of this size: the largest AOQ over quality, found by a
     * golden-section search (AOQ rises from 0 to one peak and falls), over whole numbers of nonconforming
     * units for a finite lot.
     */
    OperatingCharacteristic.Aoql aoql(Plan plan) {
        OperatingCharacteristic oc = new OperatingCharacteristic(plan, model, lotSize);
        double top = oc.qualityAt(1e-12);
        if (model instanceof OcModel.Hypergeometric) {
            int lo = 0;
            int hi = (int) Math.round(top * lotSize);
            while (hi - lo > 2) {
                int m1 = lo + (hi - lo) / 3;
                int m2 = hi - (hi - lo) / 3;
                if (oc.aoq((double) m1 / lotSize) < oc.aoq((double) m2 / lotSize)) {
                    lo = m1 + 1;
                } else {
                    hi = m2;
                }
            }
            int bestD = lo;
            double best = oc.aoq((double) lo / lotSize);
            for (int d = lo + 1; d <= hi; d++) {
                double value = oc.aoq((double) d / lotSize);
                if (value > best) {
                    best = value;
                    bestD = d;
                }
            }
            return new OperatingCharacteristic.Aoql((double) bestD / lotSize, best);
        }
        double at = OperatingCharacteristic.goldenMaximum(oc::aoq, 0, top, 1e-12);
        return new OperatingCharacteristic.Aoql(at, oc.aoq(at));
    }
}
