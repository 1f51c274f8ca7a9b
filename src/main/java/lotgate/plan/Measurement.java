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
 */
public record Measurement(String characteristic, Double lower, Double upper, String unit, Double sigma,
        String limits) {
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
        if (sigma != null && !(sigma > 0 && Double.isFinite(sigma))) {
            throw new IllegalArgumentException("the known sigma must be positive, got " + sigma);
        }
    }

    public boolean sigmaKnown() {
        return sigma != null;
    }

    public boolean twoLimits() {
        return lower != null && upper != null;
    }
}
