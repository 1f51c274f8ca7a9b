package lotgate.sampling;

import java.util.Arrays;

/**
 * The Anderson-Darling test of normality with the mean and standard deviation estimated from the sample
 * (Stephens' case 3): A^2 = -n - (1/n) sum over i of (2i - 1) [ln Phi(z_(i)) + ln(1 - Phi(z_(n+1-i)))], the
 * modified statistic A* = A^2 (1 + 0.75/n + 2.25/n^2), and its p-value by the formulas of D'Agostino and
 * Stephens, Goodness-of-Fit Techniques (1986), table 4.9 (from memory). The k-method assumes normal
 * measurements; a small p-value says they are not.
 */
public final class Normality {
    /** The smallest sample the test is made on. */
    public static final int FEWEST = 8;

    private Normality() {
    }

    /** The test's result: A^2, A*, and the p-value of A*. */
    public record Result(double statistic, double modified, double pValue) {
    }

    public static Result andersonDarling(double[] values) {
        int n = values.length;
        if (n < FEWEST) {
            throw new IllegalArgumentException("the normality test needs at least " + FEWEST + " values, got " + n);
        }
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        SampleMoments moments = SampleMoments.of(sorted);
        double mean = moments.mean();
        double s = moments.deviation();
        if (!(s > 0)) {
            return new Result(Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, 0.0);
        }
        double sum = 0;
        for (int i = 0; i < n; i++) {
            double low = logPhi((sorted[i] - mean) / s);
            double high = logPhi(-(sorted[n - 1 - i] - mean) / s);
            sum += (2.0 * i + 1) * (low + high);
        }
        double a2 = -n - sum / n;
        double modified = a2 * (1 + 0.75 / n + 2.25 / ((double) n * n));
        return new Result(a2, modified, pValue(modified));
    }

    /** ln Phi(x), kept accurate far in the lower tail. */
    private static double logPhi(double x) {
        double value = NoncentralT.phi(x);
        return value > 0 ? Math.log(value) : -0.5 * x * x - Math.log(-x * Math.sqrt(2 * Math.PI));
    }

    /** The p-value of the modified statistic A* (D'Agostino and Stephens, 1986, table 4.9; from memory). */
    static double pValue(double modified) {
        double a = modified;
        double p;
        if (a >= 0.6) {
            p = Math.exp(1.2937 - 5.709 * a + 0.0186 * a * a);
        } else if (a >= 0.34) {
            p = Math.exp(0.9177 - 4.279 * a - 1.38 * a * a);
        } else if (a >= 0.2) {
            p = 1 - Math.exp(-8.318 + 42.796 * a - 59.938 * a * a);
        } else {
            p = 1 - Math.exp(-13.436 + 101.14 * a - 223.73 * a * a);
        }
        return Math.max(0, Math.min(1, p));
    }
}
