package lotgate.sampling;

import java.util.ArrayList;
import java.util.List;

/**
 * Finds the single-sampling plan with the smallest sample size that meets both risks exactly.
 *
 * <p>For a fixed acceptance number c, P(accept) falls as n grows, so the consumer's condition
 * P(accept | LTPD) <= beta holds from some smallest n_c on (found by bisection), and the producer's
 * condition P(reject | AQL) <= alpha holds up to some largest n. Since n_c grows with c, the first c
 * whose n_c also meets the producer's condition gives the smallest feasible n over all plans. When
 * several acceptance numbers meet both risks at that n, the smallest is chosen (it gives the lowest
 * consumer's risk); the others are reported as alternatives.
 */
public final class SinglePlanDesigner {
    /** The largest sample the search considers when no lot size bounds it. */
    public static final int MAX_SAMPLE_SIZE = 50_000_000;

    private final OcModel model;
    private final int lotSize;

    /**
     * @param model   the OC model
     * @param lotSize the lot size N that bounds the sample, or 0 for none
     */
    public SinglePlanDesigner(OcModel model, int lotSize) {
        if (lotSize < 0) {
            throw new IllegalArgumentException("lot size must not be negative, got " + lotSize);
        }
        this.model = model;
        this.lotSize = model instanceof OcModel.Hypergeometric h ? h.lotSize() : lotSize;
    }

    private int largestSample() {
        return lotSize > 0 ? lotSize : MAX_SAMPLE_SIZE;
    }

    /** The plan with the smallest n that meets both risks, or the reason none exists. */
    public SingleDesign design(RiskPoints points) {
        double aqlPoint = model.producerPoint(points.aql());
        double ltpdPoint = model.consumerPoint(points.ltpd());
        if (aqlPoint >= ltpdPoint) {
            return new SingleDesign.NotFound("a lot of " + lotSize + " units is too small to tell the AQL from the"
                    + " LTPD: both stand for " + Math.round(aqlPoint * lotSize) + " nonconforming units");
        }
        // n_c never falls as c grows, so each search starts where the last one ended and gallops up by
        // about the last increase; the answer is exactly the same as a search from scratch.
        int previous = 0;
        int stride = 1;
        for (int c = 0; c < largestSample(); c++) {
            int n = smallestSampleFor(c, ltpdPoint, points.beta(), Math.max(c, previous - 1), stride);
            if (n < 0) {
                break;
            }
            stride = Math.max(1, n - previous);
            previous = n;
            if (model.moreThan(n, c, aqlPoint) <= points.alpha()) {
                SinglePlan plan = new SinglePlan(n, c);
                return new SingleDesign.Found(plan, PlanRisks.of(plan, model, points),
                        otherAcceptanceNumbers(n, c, ltpdPoint, points.beta()));
            }
        }
        return new SingleDesign.NotFound(lotSize > 0
                ? "no plan with a sample of at most the lot size " + lotSize + " meets both risks"
                : "no plan with a sample of at most " + MAX_SAMPLE_SIZE + " units meets both risks");
    }

    /**
     * The smallest n with the given acceptance number that meets the consumer's point, with both
     * achieved risks (a zero-acceptance plan when c = 0). The AQL in the points is only evaluated.
     */
    public SingleDesign designForAcceptanceNumber(int c, RiskPoints points) {
        int n = smallestSampleFor(c, model.consumerPoint(points.ltpd()), points.beta(), c, c + 1);
        if (n < 0) {
            return new SingleDesign.NotFound("no plan with acceptance number " + c + " and a sample of at most "
                    + largestSample() + " units meets the consumer's risk");
        }
        SinglePlan plan = new SinglePlan(n, c);
        return new SingleDesign.Found(plan, PlanRisks.of(plan, model, points), List.of());
    }

    /**
     * The smallest n > c with P(X <= c | quality) <= beta, or -1 if none within the largest sample.
     *
     * @param infeasible a sample size known to fail (at least c)
     * @param stride     the first step of the galloping search above it
     */
    int smallestSampleFor(int c, double quality, double beta, int infeasible, int stride) {
        int limit = largestSample();
        if (c >= limit || model.atMost(limit, c, quality) > beta) {
            return -1;
        }
        int feasible = limit;
        // Gallop up from the known failure, doubling the step: the answer is usually close above it.
        long step = Math.max(1, stride);
        for (long probe = infeasible + step; probe < feasible; step *= 2, probe = infeasible + step) {
            if (model.atMost((int) probe, c, quality) <= beta) {
                feasible = (int) probe;
                break;
            }
            infeasible = (int) probe;
        }
        while (feasible - infeasible > 1) {
            int mid = infeasible + (feasible - infeasible) / 2;
            if (model.atMost(mid, c, quality) <= beta) {
                feasible = mid;
            } else {
                infeasible = mid;
            }
        }
        return feasible;
    }

    private List<Integer> otherAcceptanceNumbers(int n, int c, double ltpdPoint, double beta) {
        List<Integer> others = new ArrayList<>();
        for (int more = c + 1; more < n && model.atMost(n, more, ltpdPoint) <= beta; more++) {
            others.add(more);
        }
        return others;
    }
}
