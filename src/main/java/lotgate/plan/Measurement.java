package lotgate.plan;

import java.util.Objects;

/**
 * What a variables plan measures: the specification limit or limits with their unit, the known process
 * standard deviation (or none), and how two limits are held: by the M-method on the estimated fraction
 * beyond both ({@link #COMBINED}) or by the k-method at each ({@link #SEPARATE}).
 *
 * @param lower the lower specification limit, or null
 * @param upper the upper specification limit, or null
 * @param sigma the known process standard deviation, or null when the sample's s is used
 * @param lowerDesign with limits held separately, the lower limit's own design points and k when they differ
 *                    from the plan's (which then hold for the upper limit); else null
 */
public record Measurement(String characteristic, Double lower, Double upper, String unit, Double sigma,
        String limits, LimitDesign lowerDesign) {

    /** A limit's own design points and acceptability constant. */
    public record LimitDesign(lotgate.sampling.RiskPoints designedFor, double k) {
        public LimitDesign {
            Objects.requireNonNull(designedFor, "designedFor");
            if (!Double.isFinite(k)) {
                throw new IllegalArgumentException("the lower limit's k must be a number, got " + k);
            }
        }
    }
    public static final String ONE = "one";
    public static final String COMBINED = "combined";
    public static final String SEPARATE = "separate";

    public Measurement {
        Objects.requireNonNull(characteristic, "characteristic");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(limits, "limits");
        if (lower == null && upper == null) {
            throw new IllegalArgumentException("a measured characteristic needs a lower or an upper limit");
        }
        if (lower != null && upper != null && !(lower < upper)) {
            throw new IllegalArgumentException("the lower limit " + lower + " must be below the upper limit " + upper);
        }
        if (!java.util.Set.of(ONE, COMBINED, SEPARATE).contains(limits)) {
            throw new IllegalArgumentException("limits must be one, combined or separate, got " + limits);
        }
        boolean two = lower != null && upper != null;
        if (two ? limits.equals(ONE) : !limits.equals(ONE)) {
            throw new IllegalArgumentException(two ? "two limits are held combined or separate"
                    : "one limit is held by the k-method alone");
        }
        if (lowerDesign != null && !limits.equals(SEPARATE)) {
            throw new IllegalArgumentException("a lower limit of its own design needs the limits held separately");
        }
        if (sigma != null && !(sigma > 0 && Double.isFinite(sigma))) {
            throw new IllegalArgumentException("the known sigma must be positive, got " + sigma);
        }
    }

    /** What is measured, with one design for every limit. */
    public Measurement(String characteristic, Double lower, Double upper, String unit, Double sigma, String limits) {
        this(characteristic, lower, upper, unit, sigma, limits, null);
    }

    /** The k that the lower limit is held to: its own, or the plan's. */
    public double lowerK(double planK) {
        return lowerDesign == null ? planK : lowerDesign.k();
    }

    public boolean sigmaKnown() {
        return sigma != null;
    }

    public boolean twoLimits() {
        return lower != null && upper != null;
    }
}
