package lotgate.sentencing;

/** The published method behind the bounds on a lot's quality, so that every output names the one it used. */
public enum BoundMethod {
    /** Exact binomial interval for a fraction nonconforming (Clopper and Pearson, 1934). */
    CLOPPER_PEARSON("Clopper-Pearson", true),
    /** Exact Poisson interval for nonconformities per unit (Garwood, 1936). */
    GARWOOD("Garwood", true),
    /** Upper bound on the fraction beyond a limit from the normal distribution, sigma known. */
    NORMAL_KNOWN_SIGMA("normal, known sigma", false),
    /** Upper bound on the fraction beyond a limit from the noncentral t distribution, sigma estimated. */
    NONCENTRAL_T("noncentral t", false);

    private final String label;
    private final boolean twoSided;

    BoundMethod(String label, boolean twoSided) {
        this.label = label;
        this.twoSided = twoSided;
    }

    /** The method's usual name, as printed. */
    public String label() {
        return label;
    }

    /** Whether the bounds form a two-sided interval; otherwise only the upper bound means anything. */
    public boolean twoSided() {
        return twoSided;
    }

    /** The method for a lot judged on measurements. */
    public static BoundMethod measured(boolean sigmaKnown) {
        return sigmaKnown ? NORMAL_KNOWN_SIGMA : NONCENTRAL_T;
    }
}
