package lotgate.sentencing;

/**
 * What a count says beyond accept or reject, all exact.
 *
 * @param pValue            P(X >= found | AQL): how surprising the count is for a lot at the AQL
 * @param confidence        the confidence level of the bounds, such as 0.95
 * @param lower             lower bound on the fraction nonconforming (or nonconformities per unit)
 * @param upper             upper bound likewise
 * @param bounds            the method of the bounds: Clopper-Pearson or Garwood for counts (two-sided); for
 *                          measurements a one-sided upper bound on the fraction beyond the limits
 * @param lotUpperBound     with a lot size, the one-sided upper bound on nonconforming units in the lot; else -1
 * @param observed          found / inspected
 * @param acceptanceAtObserved P(accept) of the plan for a lot at the observed level: where the count sits on the OC curve
 * @param acceptanceAtAql   P(accept) at the AQL
 * @param acceptanceAtLtpd  P(accept) at the LTPD
 */
public record Evidence(double pValue, double confidence, double lower, double upper, BoundMethod bounds,
        int lotUpperBound,
        double observed, double acceptanceAtObserved, double acceptanceAtAql, double acceptanceAtLtpd) {
}
