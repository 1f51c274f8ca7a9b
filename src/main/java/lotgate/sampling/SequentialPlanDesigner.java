package lotgate.sampling;

/**
 * Designs a truncated sequential plan that meets both risks exactly. Wald's lines for the risks asked for
 * only approximate them, and truncation moves them further; so, when the exact risks of the truncated plan
 * exceed what was asked, the lines are redrawn for smaller nominal risks (each scaled by how far its exact
 * risk overshoots, a little more each round) until both exact risks are met. The slope, which depends only on
 * the two quality levels, never changes.
 */
public final class SequentialPlanDesigner {
    private static final int ROUNDS = 80;

    private final OcModel model;

    public SequentialPlanDesigner(OcModel model) {
        this.model = model;
    }

    /** A designed plan with the nominal risks its lines were drawn for. */
    public record Design(SequentialPlan plan, WaldSequential lines, PlanRisks risks, boolean met) {
    }

    public Design design(RiskPoints points, int truncation) {
        WaldSequential lines = WaldSequential.of(points, model);
        double alpha = points.alpha();
        double beta = points.beta();
        for (int round = 0; ; round++) {
            SequentialPlan plan = SequentialPlan.wald(lines, truncation);
            PlanRisks risks = PlanRisks.of(plan, model, points);
            boolean met = risks.meets(points);
            if (met || round == ROUNDS) {
                return new Design(plan, lines, risks, met);
            }
            double shrink = 0.97 - 0.005 * round;
            if (risks.producerRisk() > points.alpha()) {
                alpha *= Math.max(0.5, points.alpha() / risks.producerRisk() * shrink);
            }
            if (risks.consumerRisk() > points.beta()) {
                beta *= Math.max(0.5, points.beta() / risks.consumerRisk() * shrink);
            }
            lines = new WaldSequential(points.aql(), alpha, points.ltpd(), beta, !model.countsUnits());
        }
    }

    /**
     * The least consumer's risk that any test on {@code units} units can have while its producer's risk stays
     * at most alpha: the Neyman-Pearson test on the count (the count is sufficient for every model here),
     * randomised at its boundary. A sequential plan truncated there is one such test, so it cannot do better.
     */
    public double leastConsumerRisk(RiskPoints points, int units) {
        double aqlPoint = model.producerPoint(points.aql());
        double ltpdPoint = model.consumerPoint(points.ltpd());
        int k = 0;
        while (model.moreThan(units, k, aqlPoint) > points.alpha()) {
            k++;
        }
        double atBoundary = model.exactly(units, k, aqlPoint);
        double spare = points.alpha() - model.moreThan(units, k, aqlPoint);
        double rejectAtBoundary = atBoundary > 0 ? Math.min(1, spare / atBoundary) : 0;
        return Math.max(0, model.atMost(units, k, ltpdPoint) - rejectAtBoundary * model.exactly(units, k, ltpdPoint));
    }

    /**
     * The smallest truncation point, at most {@code limit}, at which {@link #design} meets both risks, or -1:
     * every point below the Neyman-Pearson bound is skipped, every one from there on is tried in turn.
     */
    public int smallestTruncation(RiskPoints points, int limit) {
        if (limit < 1 || leastConsumerRisk(points, limit) > points.beta()) {
            return -1;
        }
        int bad = 0;
        int good = limit;
        while (good - bad > 1) {
            int mid = bad + (good - bad) / 2;
            if (leastConsumerRisk(points, mid) <= points.beta()) {
                good = mid;
            } else {
                bad = mid;
            }
        }
        for (int truncation = good; truncation <= limit; truncation++) {
            if (design(points, truncation).met()) {
                return truncation;
            }
        }
        return -1;
    }
}
