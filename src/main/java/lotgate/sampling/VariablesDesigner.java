package lotgate.sampling;

/**
 * Designs a one-limit variables plan (k-method) from the two risks. With sigma known the classical closed
 * form n = ((z_alpha + z_beta) / (z_p1 - z_p2))^2 and k = (z_alpha z_p2 + z_beta z_p1) / (z_alpha + z_beta)
 * holds exactly before n is rounded up (common practice). With sigma unknown both risks are held exactly with
 * the noncentral t: for each n the k that keep the producer's risk within alpha run up to the alpha-quantile
 * of T'(n - 1, sqrt(n) z_p1) over sqrt(n), and those that keep the consumer's risk within beta start at the
 * (1 - beta)-quantile of T'(n - 1, sqrt(n) z_p2) over sqrt(n); the smallest n where these meet is the answer.
 * No plan with an unknown sigma can need fewer units than the known-sigma plan (the known-sigma test is the
 * most powerful, Neyman-Pearson), so the search starts there. In both cases k is the middle of the range that
 * meets both risks at the chosen n, and the range is reported.
 */
public final class VariablesDesigner {
    /** The largest sample the search considers. */
    public static final int MOST_UNITS = 100_000;

    /**
     * @param exactSize the known-sigma sample size before rounding, n_sigma
     * @param wallis    Wallis's approximation for an unknown sigma, n_sigma (1 + k^2 / 2) with the closed-form k
     * @param lowestK   the smallest k that meets the consumer's risk at n
     * @param highestK  the largest k that meets the producer's risk at n
     */
    public record Design(VariablesPlan plan, PlanRisks risks, double lowestK, double highestK, double exactSize,
            double closedFormK, double wallis) {
    }

    private VariablesDesigner() {
    }

    /** A plan already in use, with its risks and the designs it can be set beside (its k range is NaN). */
    public static Design evaluate(RiskPoints points, VariablesPlan plan) {
        Normal normal = Normal.of(points);
        return new Design(plan, PlanRisks.of(plan, new OcModel.Binomial(), points), Double.NaN, Double.NaN,
                normal.size(), normal.k(), normal.wallis());
    }

    /**
     * The known-sigma design of the normal approximation: its real-valued n and its k, with Wallis's n for an
     * unknown sigma, where the search for an exact plan starts and against which it is shown.
     */
    private record Normal(double size, double k, double wallis) {
        static Normal of(RiskPoints points) {
            double z1 = VariablesPlan.standardDistance(points.aql());
            double z2 = VariablesPlan.standardDistance(points.ltpd());
            double za = VariablesPlan.standardDistance(points.alpha());
            double zb = VariablesPlan.standardDistance(points.beta());
            double size = Math.pow((za + zb) / (z1 - z2), 2);
            double k = (za * z2 + zb * z1) / (za + zb);
            return new Normal(size, k, size * (1 + k * k / 2));
        }
    }

    /**
     * The range of k that meets both risks with n units: its lowest k meets the consumer's risk exactly, its
     * highest the producer's; empty (lowest above highest) where n is too small.
     */
    public static double[] kRange(RiskPoints points, int n, boolean sigmaKnown) {
        double z1 = VariablesPlan.standardDistance(points.aql());
        double z2 = VariablesPlan.standardDistance(points.ltpd());
        double root = Math.sqrt(n);
        if (sigmaKnown) {
            return new double[] {z2 + VariablesPlan.standardDistance(points.beta()) / root,
                    z1 - VariablesPlan.standardDistance(points.alpha()) / root};
        }
        return new double[] {NoncentralT.quantile(1 - points.beta(), n - 1, root * z2) / root,
                NoncentralT.quantile(points.alpha(), n - 1, root * z1) / root};
    }

    /** The plan with the smallest n that meets both risks, or null if none up to {@link #MOST_UNITS}. */
    public static Design design(RiskPoints points, boolean sigmaKnown) {
        return design(points, sigmaKnown, 0);
    }

    /**
     * The plan with the smallest n, at least {@code fewest}, that meets both risks (a common n for limits of
     * separate designs), or null if none up to {@link #MOST_UNITS}.
     */
    public static Design design(RiskPoints points, boolean sigmaKnown, int fewest) {
        if (points.ltpd() >= 1) {
            throw new IllegalArgumentException("a variables plan's LTPD is a fraction beyond the limit, below 100%");
        }
        Normal normal = Normal.of(points);
        double exact = normal.size();
        OcModel model = new OcModel.Binomial();
        int n = Math.max(fewest, Math.max(sigmaKnown ? 1 : 2, (int) Math.ceil(exact * (1 - 1e-12))));
        for (; n <= MOST_UNITS; n++) {
            double[] range = kRange(points, n, sigmaKnown);
            if (range[0] <= range[1]) {
                VariablesPlan plan = new VariablesPlan(n, 0.5 * (range[0] + range[1]), sigmaKnown);
                return new Design(plan, PlanRisks.of(plan, model, points), range[0], range[1], exact, normal.k(),
                        normal.wallis());
            }
        }
        return null;
    }
}
