package lotgate.sampling;

/**
 * The exact OC, ASN, AOQ and ATI of a truncated sequential plan, by dynamic programming over the lattice of
 * (units inspected, count found): only the counts between the two lines carry on to the next unit, so each
 * unit costs a few operations and no simulation is involved.
 */
final class SequentialLattice {
    private SequentialLattice() {
    }

    static Stages.Outcome walk(SequentialPlan plan, OcModel model, double quality, int lotSize) {
        int top = plan.rejectionNumber(plan.truncation());
        LatticeWalk walk = new LatticeWalk(model, quality, lotSize, top);
        int lotDefectives = walk.lotDefectives;
        UnitCounts counts = UnitCounts.of(model, quality, top);
        for (int m = 0; m < plan.truncation() && walk.undecided(); m++) {
            int unit = m + 1;
            int acceptUpTo = plan.acceptanceNumber(unit);
            int rejectFrom = plan.rejectionNumber(unit);
            for (int d = walk.low; d <= walk.high; d++) {
                double weight = walk.going[d];
                if (weight == 0) {
                    continue;
                }
                walk.sample += weight;
                // Counts reaching the rejection number go straight to the rejection tail.
                int room = rejectFrom - 1 - d;
                walk.reject += weight * counts.moreThan(room, m, d, lotDefectives, walk.lotSize);
                for (int x = 0; x <= room; x++) {
                    double p = counts.exactly(x, m, d, lotDefectives, walk.lotSize);
                    if (p == 0) {
                        continue;
                    }
                    int total = d + x;
                    double mass = weight * p;
                    if (total <= acceptUpTo) {
                        walk.accept += mass;
                        walk.inspectedWhenAccepted += mass * unit;
                        if (lotDefectives >= 0) {
                            walk.outgoingOfLot(mass, total);
                        } else {
                            walk.outgoingOfProcess(mass, unit);
                        }
                    } else {
                        walk.carry(total, mass);
                    }
                }
            }
            walk.nextStage();
        }
        return walk.outcome();
    }

    /** The count one more unit adds, under each model. */
    private abstract static class UnitCounts {

        /** P(the unit adds x), after m units with d counted. */
        abstract double exactly(int x, int m, int d, int lotDefectives, int lotSize);

        /** P(the unit adds more than x), after m units with d counted; 1 when x < 0. */
        abstract double moreThan(int x, int m, int d, int lotDefectives, int lotSize);

        static UnitCounts of(OcModel model, double quality, int top) {
            if (model instanceof OcModel.Poisson) {
                return new PerUnit(quality, top);
            }
            if (model instanceof OcModel.Hypergeometric) {
                return new Drawn();
            }
            return new Bernoulli(quality);
        }
    }

    /** One unit of a steady process: nonconforming with probability p. */
    private static final class Bernoulli extends UnitCounts {
        private final double p;

        Bernoulli(double p) {
            this.p = Math.min(1.0, Math.max(0.0, p));
        }


        @Override
        double exactly(int x, int m, int d, int lotDefectives, int lotSize) {
            return x == 0 ? 1 - p : x == 1 ? p : 0.0;
        }

        @Override
        double moreThan(int x, int m, int d, int lotDefectives, int lotSize) {
            return x < 0 ? 1.0 : x == 0 ? p : 0.0;
        }
    }

    /** One unit drawn from what is left of a finite lot: D - d nonconforming among N - m. */
    private static final class Drawn extends UnitCounts {

        private static double chance(int m, int d, int lotDefectives, int lotSize) {
            int left = lotSize - m;
            int bad = lotDefectives - d;
            return left <= 0 || bad <= 0 ? 0.0 : Math.min(1.0, (double) bad / left);
        }

        @Override
        double exactly(int x, int m, int d, int lotDefectives, int lotSize) {
            double p = chance(m, d, lotDefectives, lotSize);
            if (x == 0) {
                // (N - m - (D - d)) / (N - m), kept exact rather than 1 - p
                int left = lotSize - m;
                return left <= 0 ? 0.0 : (double) (left - Math.max(0, lotDefectives - d)) / left;
            }
            return x == 1 ? p : 0.0;
        }

        @Override
        double moreThan(int x, int m, int d, int lotDefectives, int lotSize) {
            return x < 0 ? 1.0 : x == 0 ? chance(m, d, lotDefectives, lotSize) : 0.0;
        }
    }

    /** Nonconformities in one unit: Poisson with the quality level as its mean. */
    private static final class PerUnit extends UnitCounts {
        private final double[] exactly;
        private final double[] moreThan;

        PerUnit(double mean, int top) {
            exactly = new double[top + 1];
            moreThan = new double[top + 1];
            for (int x = 0; x <= top; x++) {
                exactly[x] = Tails.poissonExactly(x, mean);
                moreThan[x] = mean <= 0 ? 0.0 : Tails.poissonMoreThan(x, mean);
            }
        }


        @Override
        double exactly(int x, int m, int d, int lotDefectives, int lotSize) {
            return x < exactly.length ? exactly[x] : 0.0;
        }

        @Override
        double moreThan(int x, int m, int d, int lotDefectives, int lotSize) {
            return x < 0 ? 1.0 : x < moreThan.length ? moreThan[x] : 0.0;
        }
    }
}
