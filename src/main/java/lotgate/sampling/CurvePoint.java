package lotgate.sampling;

/**
 * One point of a plan's curves.
 *
 * @param defectives for a finite lot (type A), the whole number of nonconforming units D the quality
 *                   stands for; otherwise -1
 * @param ati        average total inspection, or NaN without a lot size
 * @param asn        average sample number: the units inspected on average to reach a decision
 */
public record CurvePoint(double quality, int defectives, double acceptance, double aoq, double ati, double asn) {
}
