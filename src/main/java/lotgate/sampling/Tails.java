package lotgate.sampling;

import org.apache.commons.math3.distribution.BinomialDistribution;
import org.apache.commons.math3.distribution.HypergeometricDistribution;
import org.apache.commons.math3.distribution.PoissonDistribution;
import org.apache.commons.math3.special.Beta;
import org.apache.commons.math3.special.Gamma;

/**
 * Lower and upper tails of the binomial, Poisson and hypergeometric counts, each computed on its own
 * side so that a tail of 1e-12 keeps its digits.
 */
final class Tails {
    /** A term this much smaller than the running sum no longer changes it. */
    private static final double NEGLIGIBLE = 1e-17;

    private Tails() {
    }

    static void checkSample(int n, int c) {
        if (n < 1) {
            throw new IllegalArgumentException("sample size must be at least 1, got " + n);
        }
        if (c < 0) {
            throw new IllegalArgumentException("acceptance number must be 0 or more, got " + c);
        }
    }

    /** P(X <= c), X ~ Binomial(n, p), 0 < p < 1, c < n: I_{1-p}(n - c, c + 1) below the mean's side. */
    static double binomialAtMost(int n, int c, double p) {
        if (p < (c + 1.0) / (n + 1.0)) {
            return 1.0 - Beta.regularizedBeta(p, c + 1.0, (double) n - c);
        }
        return Beta.regularizedBeta(1.0 - p, (double) n - c, c + 1.0);
    }

    /** P(X > c), X ~ Binomial(n, p), 0 < p < 1, c < n: I_p(c + 1, n - c). */
    static double binomialMoreThan(int n, int c, double p) {
        if (p < (c + 1.0) / (n + 1.0)) {
            return Beta.regularizedBeta(p, c + 1.0, (double) n - c);
        }
        return 1.0 - Beta.regularizedBeta(1.0 - p, (double) n - c, c + 1.0);
    }

    static double binomialExactly(int n, int x, double p) {
        return new BinomialDistribution(null, n, p).probability(x);
    }

    /** P(X <= c), X ~ Poisson(mean): Q(c + 1, mean). */
    static double poissonAtMost(int c, double mean) {
        return Gamma.regularizedGammaQ(c + 1.0, mean);
    }

    /** P(X > c), X ~ Poisson(mean): P(c + 1, mean). */
    static double poissonMoreThan(int c, double mean) {
        return Gamma.regularizedGammaP(c + 1.0, mean);
    }

    static double poissonExactly(int x, double mean) {
        if (mean <= 0) {
            return x == 0 ? 1.0 : 0.0;
        }
        return new PoissonDistribution(null, mean, PoissonDistribution.DEFAULT_EPSILON,
                PoissonDistribution.DEFAULT_MAX_ITERATIONS).probability(x);
    }

    static double hypergeometricExactly(int lotSize, int defectives, int n, int x) {
        // Commons Math answers NaN when the lot holds no nonconforming unit (or only such units).
        if (defectives == 0 || defectives == lotSize || n == lotSize) {
            int certain = defectives == 0 ? 0 : defectives == lotSize ? n : defectives;
            return x == certain ? 1.0 : 0.0;
        }
        return new HypergeometricDistribution(null, lotSize, defectives, n).probability(x);
    }

    /** P(X <= c) for n drawn without replacement from N units of which D are nonconforming. */
    static double hypergeometricAtMost(int lotSize, int defectives, int n, int c) {
        int lowest = Math.max(0, n - (lotSize - defectives));
        int highest = Math.min(n, defectives);
        if (c < lowest) {
            return 0.0;
        }
        if (c >= highest) {
            return 1.0;
        }
        if (c <= hypergeometricMode(lotSize, defectives, n)) {
            return sumDownwards(lotSize, defectives, n, c, lowest);
        }
        return 1.0 - sumUpwards(lotSize, defectives, n, c + 1, highest);
    }

    /** P(X > c) for n drawn without replacement from N units of which D are nonconforming. */
    static double hypergeometricMoreThan(int lotSize, int defectives, int n, int c) {
        int lowest = Math.max(0, n - (lotSize - defectives));
        int highest = Math.min(n, defectives);
        if (c < lowest) {
            return 1.0;
        }
        if (c >= highest) {
            return 0.0;
        }
        if (c + 1 > hypergeometricMode(lotSize, defectives, n)) {
            return sumUpwards(lotSize, defectives, n, c + 1, highest);
        }
        return 1.0 - sumDownwards(lotSize, defectives, n, c, lowest);
    }

    private static int hypergeometricMode(int lotSize, int defectives, int n) {
        return (int) Math.floor((n + 1.0) * (defectives + 1.0) / (lotSize + 2.0));
    }

    /** Sum of P(X = x) for x from 'from' down to 'lowest', by the ratio of successive terms. */
    private static double sumDownwards(int lotSize, int defectives, int n, int from, int lowest) {
        double term = hypergeometricExactly(lotSize, defectives, n, from);
        double sum = term;
        for (int x = from; x > lowest && term > NEGLIGIBLE * sum; x--) {
            // P(x-1)/P(x) = x (N - D - n + x) / ((D - x + 1)(n - x + 1))
            term *= (double) x * ((double) lotSize - defectives - n + x)
                    / (((double) defectives - x + 1) * ((double) n - x + 1));
            sum += term;
        }
        return sum;
    }

    /** Sum of P(X = x) for x from 'from' up to 'highest', by the ratio of successive terms. */
    private static double sumUpwards(int lotSize, int defectives, int n, int from, int highest) {
        double term = hypergeometricExactly(lotSize, defectives, n, from);
        double sum = term;
        for (int x = from; x < highest && term > NEGLIGIBLE * sum; x++) {
            // P(x+1)/P(x) = (D - x)(n - x) / ((x + 1)(N - D - n + x + 1))
            term *= ((double) defectives - x) * ((double) n - x)
                    / ((x + 1.0) * ((double) lotSize - defectives - n + x + 1));
            sum += term;
        }
        return sum;
    }
}
