package lotgate.sampling;

/**
 * A probability model for the count found in a sample: the basis of every operating characteristic.
 *
 * <p>Quality is a fraction: the fraction nonconforming for {@link Binomial} and {@link Hypergeometric},
 * nonconformities per unit for {@link Poisson}. Each model answers the two tails directly, so that a
 * small risk is never computed as one minus a number close to one.
 */
public sealed interface OcModel permits OcModel.Binomial, OcModel.Hypergeometric, OcModel.Poisson {

    /** P(X <= c) for a sample of n at the given quality: the probability of acceptance of a single plan. */
    double atMost(int n, int c, double quality);

    /** P(X > c) for a sample of n at the given quality, computed as an upper tail. */
    double moreThan(int n, int c, double quality);

    /** P(X = x) for a sample of n at the given quality. */
    double exactly(int n, int x, double quality);

    /** The model's name as written in plan files and on the command line. */
    String name();

    /**
     * P(X = x) for the next n units, after {@code drawn} units with {@code found} counted: a later stage of
     * a multi-stage or sequential plan. Only a finite lot remembers what was drawn before.
     */
    default double exactlyAfter(int drawn, int found, int n, int x, double quality) {
        return exactly(n, x, quality);
    }

    /** P(X <= c) for the next n units, after {@code drawn} units with {@code found} counted; 0 when c < 0. */
    default double atMostAfter(int drawn, int found, int n, int c, double quality) {
        return c < 0 ? 0.0 : atMost(n, c, quality);
    }

    /** P(X > c) for the next n units, after {@code drawn} units with {@code found} counted; 1 when c < 0. */
    default double moreThanAfter(int drawn, int found, int n, int c, double quality) {
        return c < 0 ? 1.0 : moreThan(n, c, quality);
    }

    /** The lot size this model is tied to, or 0 when it describes a process (type B). */
    default int lotSize() {
        return 0;
    }

    /** Whether a quality level is measured in nonconforming units (true) or nonconformities per unit. */
    default boolean countsUnits() {
        return true;
    }

    /** The largest quality level the model allows. */
    default double maxQuality() {
        return 1.0;
    }

    /**
     * The quality level that stands for a lot "at the AQL" in a design: for a finite lot, the largest
     * whole number of nonconforming units D with D/N at most the AQL, as a fraction of N.
     */
    default double producerPoint(double aql) {
        return aql;
    }

    /**
     * The quality level that stands for a lot "at the LTPD" in a design: for a finite lot, the smallest
     * whole number of nonconforming units D with D/N at least the LTPD, as a fraction of N.
     */
    default double consumerPoint(double ltpd) {
        return ltpd;
    }

    static OcModel of(String name, int lotSize) {
        return switch (name) {
            case "binomial" -> new Binomial();
            case "poisson" -> new Poisson();
            case "hypergeometric" -> new Hypergeometric(lotSize);
            default -> throw new IllegalArgumentException(
                    "unknown model '" + name + "'; use binomial, hypergeometric or poisson");
        };
    }

    /** Type B: units drawn from a process, or from a lot much larger than the sample. */
    record Binomial() implements OcModel {
        @Override
        public double atMost(int n, int c, double p) {
            Tails.checkSample(n, c);
            if (c >= n || p <= 0) {
                return 1.0;
            }
            if (p >= 1) {
                return 0.0;
            }
            return Tails.binomialAtMost(n, c, p);
        }

        @Override
        public double moreThan(int n, int c, double p) {
            Tails.checkSample(n, c);
            if (c >= n || p <= 0) {
                return 0.0;
            }
            if (p >= 1) {
                return 1.0;
            }
            return Tails.binomialMoreThan(n, c, p);
        }

        @Override
        public double exactly(int n, int x, double p) {
            return Tails.binomialExactly(n, x, p);
        }

        @Override
        public String name() {
            return "binomial";
        }
    }

    /** Nonconformities (defects) counted per unit inspected; also the usual approximation to the binomial. */
    record Poisson() implements OcModel {
        @Override
        public double atMost(int n, int c, double defectsPerUnit) {
            Tails.checkSample(n, c);
            return defectsPerUnit <= 0 ? 1.0 : Tails.poissonAtMost(c, n * defectsPerUnit);
        }

        @Override
        public double moreThan(int n, int c, double defectsPerUnit) {
            Tails.checkSample(n, c);
            return defectsPerUnit <= 0 ? 0.0 : Tails.poissonMoreThan(c, n * defectsPerUnit);
        }

        @Override
        public double exactly(int n, int x, double defectsPerUnit) {
            return Tails.poissonExactly(x, n * defectsPerUnit);
        }

        @Override
        public String name() {
            return "poisson";
        }

        @Override
        public boolean countsUnits() {
            return false;
        }

        @Override
        public double maxQuality() {
            return Double.POSITIVE_INFINITY;
        }
    }

    /**
     * Type A: a sample drawn without replacement from an isolated lot of N units.
     *
     * <p>A quality level p stands for D = round(p N) nonconforming units in the lot, except at the two
     * design points, where D is rounded towards the side that keeps each risk guaranteed (see
     * {@link #producerPoint} and {@link #consumerPoint}).
     */
    record Hypergeometric(int lotSize) implements OcModel {
        /** Absorbs binary rounding in p N, so that 29% of 100 is 29 units and not 28. */
        private static final double ROUNDING_SLACK = 1e-9;

        public Hypergeometric {
            if (lotSize < 1) {
                throw new IllegalArgumentException("the hypergeometric model needs a lot size of at least 1, got " + lotSize);
            }
        }

        /** The whole number of nonconforming units that a quality level stands for on a curve. */
        public int defectives(double p) {
            return (int) Math.min(lotSize, Math.max(0, Math.round(p * lotSize)));
        }

        @Override
        public double producerPoint(double aql) {
            return Math.floor(aql * lotSize + ROUNDING_SLACK) / lotSize;
        }

        @Override
        public double consumerPoint(double ltpd) {
            return Math.min(lotSize, Math.ceil(ltpd * lotSize - ROUNDING_SLACK)) / lotSize;
        }

        @Override
        public double atMost(int n, int c, double p) {
            checkDraw(n, c);
            return Tails.hypergeometricAtMost(lotSize, defectives(p), n, c);
        }

        @Override
        public double moreThan(int n, int c, double p) {
            checkDraw(n, c);
            return Tails.hypergeometricMoreThan(lotSize, defectives(p), n, c);
        }

        @Override
        public double exactly(int n, int x, double p) {
            checkDraw(n, 0);
            return Tails.hypergeometricExactly(lotSize, defectives(p), n, x);
        }

        @Override
        public String name() {
            return "hypergeometric";
        }

        @Override
        public double exactlyAfter(int drawn, int found, int n, int x, double p) {
            int left = lotSize - drawn;
            int bad = defectives(p) - found;
            if (n > left || bad < 0 || x < 0 || x > n || x > bad || n - x > left - bad) {
                return 0.0;
            }
            return Tails.hypergeometricExactly(left, bad, n, x);
        }

        @Override
        public double atMostAfter(int drawn, int found, int n, int c, double p) {
            if (c < 0) {
                return 0.0;
            }
            int bad = Math.max(0, defectives(p) - found);
            return Tails.hypergeometricAtMost(lotSize - drawn, Math.min(bad, lotSize - drawn), n, c);
        }

        @Override
        public double moreThanAfter(int drawn, int found, int n, int c, double p) {
            if (c < 0) {
                return 1.0;
            }
            int bad = Math.max(0, defectives(p) - found);
            return Tails.hypergeometricMoreThan(lotSize - drawn, Math.min(bad, lotSize - drawn), n, c);
        }

        private void checkDraw(int n, int c) {
            Tails.checkSample(n, c);
            if (n > lotSize) {
                throw new IllegalArgumentException("sample size " + n + " exceeds the lot size " + lotSize);
            }
        }
    }
}
