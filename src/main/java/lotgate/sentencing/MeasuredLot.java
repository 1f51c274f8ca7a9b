package lotgate.sentencing;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import lotgate.plan.Measurement;
import lotgate.sampling.NoncentralT;
import lotgate.sampling.Normality;
import lotgate.sampling.OcModel;
import lotgate.sampling.SampleMoments;
import lotgate.sampling.VariablesPlan;

/**
 * A lot judged on measurements by a variables plan: the sample's mean and standard deviation, the quality
 * statistic at each limit, the estimated fraction beyond the limits with an exact upper confidence bound,
 * the verdict, the measurements outside the limits, and the checks of the method's assumptions (a normality
 * test and the measurements' resolution).
 *
 * @param deviation      the standard deviation the statistics use: the known sigma, or the sample's s
 * @param sampleDeviation the sample's s, also where sigma is known (for the supplier's charts)
 * @param statisticLower (mean - L) / s (or sigma), or NaN without a lower limit
 * @param statisticUpper (U - mean) / s (or sigma), or NaN without an upper limit
 * @param estimate       the estimated fraction beyond the limits (the M-method's estimate; for one limit the same
 *                       estimate at that limit)
 * @param maxEstimate    M for limits held combined, else NaN
 * @param upperBound     a one-sided upper confidence bound on the fraction beyond the limits (for two limits the
 *                       sum of the bounds at each, which is conservative)
 * @param outside        indexes (in sample order) of the measurements outside the limits
 * @param normality      the Anderson-Darling test, or null for fewer than {@link Normality#FEWEST} values
 * @param distinct       the number of distinct values measured
 * @param warnings       plain-language warnings about the assumptions
 */
public record MeasuredLot(boolean accepted, int n, double mean, double deviation, double sampleDeviation,
        boolean sigmaKnown,
        double statisticLower, double statisticUpper, double k, double estimate, double maxEstimate,
        double upperBound, double confidence, double acceptanceAtEstimate, List<Integer> outside,
        Normality.Result normality, int distinct, List<String> warnings) {

    public MeasuredLot {
        outside = List.copyOf(outside);
        warnings = List.copyOf(warnings);
    }

    /** A normality p-value below this is reported as a failed test (common practice). */
    public static final double NORMALITY_LEVEL = 0.05;
    /** Fewer distinct values than this say the gauge is too coarse for the k-method (common practice). */
    public static final int FEWEST_DISTINCT = 5;

    /** Judges the measurements of a lot's sample. */
    public static MeasuredLot judge(VariablesPlan plan, Measurement spec, double[] values, double confidence) {
        int n = values.length;
        if (n != plan.n()) {
            throw new IllegalArgumentException("the plan measures " + plan.n() + " units, the sample has " + n);
        }
        SampleMoments moments = SampleMoments.of(values);
        double mean = moments.mean();
        double sampleDeviation = moments.deviation();
        double deviation = spec.sigmaKnown() ? spec.sigma() : sampleDeviation;
        List<String> warnings = new ArrayList<>();
        double lower = spec.lower() == null ? Double.NaN : (mean - spec.lower()) / deviation;
        double upper = spec.upper() == null ? Double.NaN : (spec.upper() - mean) / deviation;
        if (!(deviation > 0)) {
            // Every value alike: the statistic is infinite on the side the mean lies within.
            lower = spec.lower() == null ? Double.NaN : mean >= spec.lower() ? Double.POSITIVE_INFINITY
                    : Double.NEGATIVE_INFINITY;
            upper = spec.upper() == null ? Double.NaN : mean <= spec.upper() ? Double.POSITIVE_INFINITY
                    : Double.NEGATIVE_INFINITY;
            warnings.add("every measurement is the same: the standard deviation is 0, so the gauge cannot resolve"
                    + " the variation; use the attribute plan or a finer gauge");
        }
        double estimate = estimate(plan, lower) + estimate(plan, upper);
        boolean accepted;
        double max = Double.NaN;
        switch (spec.limits()) {
            case Measurement.COMBINED -> {
                max = plan.maxEstimate();
                accepted = estimate <= max;
            }
            default -> accepted = (Double.isNaN(lower) || lower >= spec.lowerK(plan.k()))
                    && (Double.isNaN(upper) || upper >= plan.k());
        }
        double bound = Math.min(1.0, plan.upperBoundBeyond(lower, confidence) + plan.upperBoundBeyond(upper, confidence));
        List<Integer> outside = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if ((spec.lower() != null && values[i] < spec.lower()) || (spec.upper() != null && values[i] > spec.upper())) {
                outside.add(i);
            }
        }
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        int distinct = n == 0 ? 0 : 1;
        for (int i = 1; i < n; i++) {
            if (sorted[i] != sorted[i - 1]) {
                distinct++;
            }
        }
        Normality.Result normality = null;
        if (n >= Normality.FEWEST && deviation > 0 && distinct > 1) {
            normality = Normality.andersonDarling(values);
            if (normality.pValue() < NORMALITY_LEVEL) {
                warnings.add(String.format(java.util.Locale.ROOT, "the measurements do not look normal (Anderson-Darling"
                        + " A* = %.3f, p = %.3g): the k-method's risks rest on normality, so judge this lot with the"
                        + " attribute plan (count the units outside the limits) and look into the process", normality
                        .modified(), normality.pValue()));
            }
        } else if (n < Normality.FEWEST) {
            warnings.add("with fewer than " + Normality.FEWEST + " measurements normality cannot be tested; the plan's"
                    + " risks rest on it");
        }
        if (distinct < FEWEST_DISTINCT && deviation > 0) {
            warnings.add("only " + distinct + " distinct values among " + n + " measurements: the gauge's resolution is"
                    + " coarse for the k-method (common practice asks for at least " + FEWEST_DISTINCT + ")");
        }
        double observed = Math.min(1.0, Math.max(0.0, estimate));
        double atEstimate = plan.acceptance(new OcModel.Binomial(), observed);
        return new MeasuredLot(accepted, n, mean, deviation, sampleDeviation, spec.sigmaKnown(), lower, upper, plan.k(), estimate, max,
                bound, confidence, atEstimate, outside, normality, distinct, warnings);
    }

    private static double estimate(VariablesPlan plan, double statistic) {
        if (Double.isNaN(statistic)) {
            return 0.0;
        }
        if (Double.isInfinite(statistic)) {
            return statistic > 0 ? 0.0 : 1.0;
        }
        if (plan.n() < (plan.sigmaKnown() ? 2 : 3)) {
            return NoncentralT.phi(-statistic);
        }
        return plan.estimateBeyond(statistic);
    }
}
