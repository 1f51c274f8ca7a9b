package lotgate.sampling;

/**
 * What a plan achieves at the two design points: the producer's risk P(reject | AQL) and the
 * consumer's risk P(accept | LTPD), with the quality levels the model used for them.
 */
public record PlanRisks(double producerRisk, double consumerRisk, double aqlPoint, double ltpdPoint) {

    /** Whether both risks are within the limits asked for. */
    public boolean meets(RiskPoints points) {
        return producerRisk <= points.alpha() && consumerRisk <= points.beta();
    }

    /** The achieved risks of a plan at the design points, each computed as its own tail. */
    public static PlanRisks of(Plan plan, OcModel model, RiskPoints points) {
        double aqlPoint = model.producerPoint(points.aql());
        double ltpdPoint = model.consumerPoint(points.ltpd());
        return new PlanRisks(
                OperatingCharacteristic.rejection(plan, model, aqlPoint),
                OperatingCharacteristic.acceptance(plan, model, ltpdPoint),
                aqlPoint, ltpdPoint);
    }
}
