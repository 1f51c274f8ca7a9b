package lotgate.sampling;

/**
 * Exact confidence bounds from a sample count, found by bisection on the same tails the OC curves
 * use: Clopper-Pearson for a fraction nonconforming, Garwood for nonconformities per unit, and the
 * exact upper bound on the nonconforming units in a finite lot.
 */
public final class ConfidenceBounds {
    private ConfidenceBounds() {
    }

    /** A two-sided interval [lower, upper]. */
    public record Interval(double lower, double upper) {
    }

    private static void check(int found, int n, double confidence) {
        if (n < 1 || found < 0) {
            throw new IllegalArgumentException("need a sample of at least 1 and a count of 0 or more");
        }
        if (!(confidence > 0 && confidence < 1)) {
            throw new IllegalArgumentException("confidence must lie strictly between 0 and 1, got " + confidence);
        }
    }

    /**
     * The Clopper-Pearson interval for a fraction nonconforming: the lower bound solves
     * P(X >= x | p) = (1 - confidence)/2 and the upper bound P(X <= x | p) = (1 - confidence)/2.
     */
    public static Interval clopperPearson(int found, int n, double confidence) {
        check(found, n, confidence);
        if (found > n) {
            throw new IllegalArgumentException("found " + found + " in a sample of " + n);
        }
        double tail = (1 - confidence) / 2;
        OcModel binomial = new OcModel.Binomial();
        double lower = found == 0 ? 0 : solve(p -> binomial.moreThan(n, found - 1, p), tail, 1.0, true);
        double upper = found == n ? 1 : solve(p -> binomial.atMost(n, found, p), tail, 1.0, false);
        return new Interval(lower, upper);
    }

    /**
     * The Garwood interval for nonconformities per unit from a total count in n units: the rate whose
     * Poisson tails P(X >= x) and P(X <= x) equal (1 - confidence)/2.
     */
    public static Interval garwood(int found, int n, double confidence) {
        check(found, n, confidence);
        double tail = (1 - confidence) / 2;
        OcModel poisson = new OcModel.Poisson();
        double top = Math.max(1.0, 4.0 * (found + 10) / n);
        double lower = found == 0 ? 0 : solve(r -> poisson.moreThan(n, found - 1, r), tail, top, true);
        double upper = solve(r -> poisson.atMost(n, found, r), tail, top, false);
        return new Interval(lower, upper);
    }

    /**
     * The exact one-sided upper confidence bound on the nonconforming units D in a lot of N from which
     * a sample of n showed x: the largest D for which P(X <= x | N, D, n) is still above 1 - confidence.
     */
    public static int lotUpperBound(int found, int n, int lotSize, double confidence) {
        check(found, n, confidence);
        if (n > lotSize || found > n) {
            throw new IllegalArgumentException("a sample of " + n + " with " + found + " found does not fit a lot of "
                    + lotSize);
        }
        double alpha = 1 - confidence;
        int good = found;
        int bad = lotSize - (n - found) + 1;
        while (bad - good > 1) {
            int mid = good + (bad - good) / 2;
            if (Tails.hypergeometricAtMost(lotSize, mid, n, found) > alpha) {
                good = mid;
            } else {
                bad = mid;
            }
        }
        return good;
    }

    /** The one-sided p-value of a count against a quality level: P(X >= x | level). */
    public static double pValue(OcModel model, int n, int found, double level) {
        return found == 0 ? 1.0 : model.moreThan(n, found - 1, level);
    }

    private interface Tail {
        double at(double level);
    }

    /** The level where a monotone tail crosses the target, to the last bit that bisection can resolve. */
    private static double solve(Tail tail, double target, double top, boolean rising) {
        double low = 0;
        double high = top;
        if (!rising) {
            while (tail.at(high) > target) {
                high *= 2;
            }
        }
        for (int i = 0; i < 2000; i++) {
            double mid = 0.5 * (low + high);
            if (mid <= low || mid >= high) {
                break;
            }
            boolean below = rising ? tail.at(mid) < target : tail.at(mid) > target;
            if (below) {
                low = mid;
            } else {
                high = mid;
            }
        }
        return 0.5 * (low + high);
    }
}
