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
}
