package lotgate.sampling;

import org.apache.commons.math3.special.Beta;
import org.apache.commons.math3.special.Erf;
import org.apache.commons.math3.special.Gamma;

/**
 * The noncentral t distribution's CDF, which Commons Math lacks, by the algorithm of Benton and
 * Krishnamoorthy (Computing discrete mixtures of continuous distributions: noncentral chisquare, noncentral
 * t and the distribution of the square of the sample multiple correlation coefficient, Computational
 * Statistics and Data Analysis 43 (2003) 249-267): for t >= 0,
 * F(t; nu, delta) = Phi(-delta) + 1/2 sum over i of [P_i I_x(i + 1/2, nu/2) + delta/sqrt(2) Q_i I_x(i + 1, nu/2)]
 * with x = t^2/(t^2 + nu), P_i = e^(-l) l^i / i!, Q_i = e^(-l) l^i / Gamma(i + 3/2), l = delta^2/2, summed
 * from the largest Poisson weight outwards with the recurrences of the incomplete beta function, so that
 * large noncentralities neither underflow nor lose terms; and F(t; nu, delta) = 1 - F(-t; nu, -delta).
 */
public final class NoncentralT {
    private static final double EPSILON = 1e-16;
    private static final int MOST_TERMS = 100_000;

    private NoncentralT() {
    }

    /** P(T <= t) for T noncentral t with nu degrees of freedom and noncentrality delta. */
    public static double cdf(double t, double nu, double delta) {
        check(nu, delta);
        if (Double.isNaN(t)) {
            throw new IllegalArgumentException("t must be a number");
        }
        if (t < 0) {
            return 1.0 - nonNegative(-t, nu, -delta);
        }
        return nonNegative(t, nu, delta);
    }

    /** P(T > t), computed as P(-T < -t), the CDF of the mirrored distribution. */
    public static double survival(double t, double nu, double delta) {
        check(nu, delta);
        if (t > 0) {
            return 1.0 - nonNegative(t, nu, delta);
        }
        return nonNegative(-t, nu, -delta);
    }

    /** The p-quantile: the t with P(T <= t) = p, by bisection on the CDF. */
    public static double quantile(double p, double nu, double delta) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException("the probability must lie strictly between 0 and 1, got " + p);
        }
        double low = delta - 1;
        double high = delta + 1;
        double step = 1;
        while (cdf(low, nu, delta) > p) {
            step *= 2;
            low = delta - step;
        }
        step = 1;
        while (cdf(high, nu, delta) < p) {
            step *= 2;
            high = delta + step;
        }
        for (int i = 0; i < 200 && high - low > 1e-14 * Math.max(1, Math.abs(high)); i++) {
            double mid = 0.5 * (low + high);
            if (cdf(mid, nu, delta) < p) {
                low = mid;
            } else {
                high = mid;
            }
        }
        return 0.5 * (low + high);
    }

    private static void check(double nu, double delta) {
        if (!(nu > 0) || Double.isInfinite(nu)) {
            throw new IllegalArgumentException("the degrees of freedom must be positive, got " + nu);
        }
        if (!Double.isFinite(delta)) {
            throw new IllegalArgumentException("the noncentrality must be finite, got " + delta);
        }
    }

    /** Phi(x), the standard normal CDF, without cancellation in the lower tail. */
    public static double phi(double x) {
        return 0.5 * Erf.erfc(-x / Math.sqrt(2));
    }

    private static double nonNegative(double t, double nu, double delta) {
        double lower = phi(-delta);
        if (t == 0) {
            return lower;
        }
        double x = t * t / (t * t + nu);
        double b = nu / 2;
        double lambda = delta * delta / 2;
        int mode = (int) Math.floor(lambda);
        double logLambda = lambda > 0 ? Math.log(lambda) : Double.NEGATIVE_INFINITY;
        double logX = Math.log(x);
        double log1mX = Math.log1p(-x);
        // The Poisson-type weights and the two incomplete beta functions at the mode.
        double p = lambda > 0 ? Math.exp(-lambda + mode * logLambda - Gamma.logGamma(mode + 1.0))
                : (mode == 0 ? 1.0 : 0.0);
        double q = lambda > 0 ? Math.exp(-lambda + mode * logLambda - Gamma.logGamma(mode + 1.5)) : 1.0
                / Math.exp(Gamma.logGamma(1.5));
        double aP = mode + 0.5;
        double aQ = mode + 1.0;
        double betaP = Beta.regularizedBeta(x, aP, b, EPSILON, Integer.MAX_VALUE);
        double betaQ = Beta.regularizedBeta(x, aQ, b, EPSILON, Integer.MAX_VALUE);
        // g(a) = Gamma(a + b) / (Gamma(a + 1) Gamma(b)) x^a (1 - x)^b, the step between I_x(a, b) and I_x(a + 1, b).
        double gP = Math.exp(Gamma.logGamma(aP + b) - Gamma.logGamma(aP + 1) - Gamma.logGamma(b) + aP * logX
                + b * log1mX);
        double gQ = Math.exp(Gamma.logGamma(aQ + b) - Gamma.logGamma(aQ + 1) - Gamma.logGamma(b) + aQ * logX
                + b * log1mX);
        double scale = delta / Math.sqrt(2);
        double sum = p * betaP + scale * q * betaQ;
        // Forward from the mode.
        Series fP = new Series(p, betaP, gP);
        Series fQ = new Series(q, betaQ, gQ);
        for (int i = mode + 1; i < mode + MOST_TERMS; i++) {
            fP.beta -= fP.step;
            fQ.beta -= fQ.step;
            double aPrev = i - 1 + 0.5;
            fP.step *= x * (aPrev + b) / (aPrev + 1);
            fQ.step *= x * (i + b) / (i + 1);
            fP.weight *= lambda / i;
            fQ.weight *= lambda / (i + 0.5);
            double term = fP.weight * Math.max(0, fP.beta) + scale * fQ.weight * Math.max(0, fQ.beta);
            sum += term;
            // Past the mode the weights fall at least geometrically, by lambda / (i + 1), and I_x falls as a
            // grows: what is left is at most the next weights' geometric sum times I_x here.
            double ratio = lambda / (i + 1);
            if (ratio < 1) {
                double left = (fP.weight + Math.abs(scale) * fQ.weight) / (1 - ratio) * Math.max(fP.beta, fQ.beta);
                if (left <= EPSILON * Math.abs(sum) || left < 1e-300) {
                    break;
                }
            }
            if (fP.weight == 0 && fQ.weight == 0) {
                break;
            }
        }
        // Backward from the mode down to 0.
        Series bP = new Series(p, betaP, gP);
        Series bQ = new Series(q, betaQ, gQ);
        for (int i = mode - 1; i >= 0; i--) {
            double aP1 = i + 0.5;
            double aQ1 = i + 1.0;
            // g(a - 1) = g(a) (a) / (x (a - 1 + b))
            bP.step *= (aP1 + 1) / (x * (aP1 + b));
            bQ.step *= (aQ1 + 1) / (x * (aQ1 + b));
            bP.beta += bP.step;
            bQ.beta += bQ.step;
            bP.weight *= (i + 1) / lambda;
            bQ.weight *= (i + 1.5) / lambda;
            double term = bP.weight * Math.min(1, bP.beta) + scale * bQ.weight * Math.min(1, bQ.beta);
            sum += term;
            if (Math.abs(term) < EPSILON * Math.abs(sum) && bP.weight < EPSILON) {
                break;
            }
        }
        double result = lower + 0.5 * sum;
        return Math.min(1.0, Math.max(0.0, result));
    }

    /**
     * One of the two series of the sum, walked away from the mode: its Poisson-type weight, I_x(a, b), and the
     * step g(a) between I_x(a, b) and I_x(a + 1, b).
     */
    private static final class Series {
        double weight;
        double beta;
        double step;

        Series(double weight, double beta, double step) {
            this.weight = weight;
            this.beta = beta;
            this.step = step;
        }
    }
}
