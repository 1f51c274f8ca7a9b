package lotgate.tables;

import lotgate.sampling.OcModel;
import lotgate.sampling.OperatingCharacteristic;
import lotgate.sampling.Plan;
import lotgate.sampling.SinglePlan;

/**
 * What the tables do not print about a plan, computed exactly under a model: the producer's risk at the
 * AQL, the quality accepted 10%, 5% and 50% of the time, the AOQL for the lot size, and the ASN at the AQL.
 *
 * @param aqlPoint         the quality level that stands for the AQL under the model (a fraction)
 * @param producerRisk     P(reject) at the AQL
 * @param reinstateAtAql   for a plan whose rejection number exceeds Ac + 1: P(Ac < count < Re) at the AQL,
 *                         the chance that the lot is accepted but normal inspection is reinstated; else 0
 * @param ltpd10           the quality accepted 10% of the time (the LTPD at a consumer's risk of 10%)
 * @param ltpd5            the quality accepted 5% of the time
 * @param indifference     the quality accepted half the time
 * @param aoql             the AOQL with rectifying inspection of lots of the given size (NaN without one)
 * @param aoqlAt           the incoming quality at which the AOQL occurs (NaN without a lot size)
 * @param asnAtAql         the average sample number at the AQL (n for a single plan)
 */
public record TableRisks(double aqlPoint, double producerRisk, double reinstateAtAql, double ltpd10, double ltpd5,
        double indifference, double aoql, double aoqlAt, double asnAtAql) {

    /**
     * @param aql     the AQL as a fraction (percent / 100; nonconformities per unit for the Poisson model)
     * @param lotSize the lot size for the AOQL, or 0 for the limit of a very large lot
     */
    public static TableRisks of(Plan plan, OcModel model, double aql, int lotSize) {
        OperatingCharacteristic oc = new OperatingCharacteristic(plan, model,
                model instanceof OcModel.Hypergeometric h ? h.lotSize() : lotSize);
        double aqlPoint = model.producerPoint(aql);
        double reinstate = 0;
        if (plan instanceof SinglePlan single && single.hasGap()) {
            for (int x = single.c() + 1; x < single.rejectionNumber(); x++) {
                reinstate += model.exactly(single.n(), x, aqlPoint);
            }
        }
        OperatingCharacteristic.Aoql limit = oc.aoql();
        return new TableRisks(aqlPoint, oc.rejection(aqlPoint), reinstate, oc.qualityAt(0.10), oc.qualityAt(0.05),
                oc.qualityAt(0.5), limit.limit(), limit.quality(), oc.asn(aqlPoint));
    }
}
