package lotgate.sampling;

import java.util.Comparator;
import java.util.List;

/**
 * A double-sampling plan: inspect n1 units and accept with at most c1 found, reject with r1 or more;
 * otherwise inspect n2 more and accept if the count over both samples is at most c2.
 */
public record DoublePlan(int n1, int c1, int r1, int n2, int c2) implements Plan {
    /**
     * How a search chooses between two plans that do equally well: the smaller largest sample, then the
     * smaller first sample, then the smaller acceptance numbers.
     */
    static final Comparator<DoublePlan> SMALLER_FIRST = Comparator.comparingInt(DoublePlan::maxSampleSize)
            .thenComparingInt(DoublePlan::n1).thenComparingInt(DoublePlan::c1).thenComparingInt(DoublePlan::c2);

    public DoublePlan {
        if (n1 < 1 || n2 < 1) {
            throw new IllegalArgumentException("both sample sizes must be at least 1, got n1 = " + n1 + " and n2 = "
                    + n2);
        }
        if (c1 < 0) {
            throw new IllegalArgumentException("the first acceptance number c1 must be 0 or more, got " + c1);
        }
        if (r1 < c1 + 2) {
            throw new IllegalArgumentException("the first rejection number r1 must be at least c1 + 2 = " + (c1 + 2)
                    + " (otherwise the second sample is never taken), got " + r1);
        }
        if (c2 < r1 - 1) {
            throw new IllegalArgumentException("the second acceptance number c2 must be at least r1 - 1 = " + (r1 - 1)
                    + ", got " + c2);
        }
        if ((long) n1 + n2 > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("n1 + n2 exceeds " + Integer.MAX_VALUE);
        }
    }

    /** The usual double plan, whose first rejection number is c2 + 1. */
    public static DoublePlan of(int n1, int c1, int n2, int c2) {
        return new DoublePlan(n1, c1, c2 + 1, n2, c2);
    }

    /** The plan as its two stages. */
    public List<Stage> stages() {
        return List.of(new Stage(n1, c1, r1), new Stage(n2, c2, c2 + 1));
    }

    @Override
    public String scheme() {
        return "double";
    }

    @Override
    public int maxSampleSize() {
        return n1 + n2;
    }

    @Override
    public double acceptance(OcModel model, double quality) {
        // P(d1 <= c1) + sum over c1 < d1 < r1 of P(d1) P(d2 <= c2 - d1)
        double accept = model.atMost(n1, c1, quality);
        double[] second = model instanceof OcModel.Hypergeometric ? null : secondTails(model, quality, true);
        for (int d1 = c1 + 1; d1 < r1; d1++) {
            accept += model.exactly(n1, d1, quality) * (second != null ? second[c2 - d1 - (c2 - r1 + 1)]
                    : model.atMostAfter(n1, d1, n2, c2 - d1, quality));
        }
        return accept;
    }

    @Override
    public double rejection(OcModel model, double quality) {
        // P(d1 >= r1) + sum over c1 < d1 < r1 of P(d1) P(d2 > c2 - d1)
        double reject = model.moreThan(n1, r1 - 1, quality);
        double[] second = model instanceof OcModel.Hypergeometric ? null : secondTails(model, quality, false);
        for (int d1 = c1 + 1; d1 < r1; d1++) {
            reject += model.exactly(n1, d1, quality) * (second != null ? second[c2 - d1 - (c2 - r1 + 1)]
                    : model.moreThanAfter(n1, d1, n2, c2 - d1, quality));
        }
        return reject;
    }

    /**
     * For a second sample independent of the first (a process, not a finite lot), its tails P(d2 <= j), or
     * P(d2 > j), for every j a continuing first count can need (c2 - r1 + 1 to c2 - c1 - 1): one tail computed
     * directly at the far end, the others by adding point probabilities, so that each stays a sum of positive
     * terms and the design search need not call the incomplete beta function once per count.
     */
    private double[] secondTails(OcModel model, double quality, boolean lower) {
        int low = c2 - r1 + 1;
        int high = c2 - c1 - 1;
        double[] tails = new double[high - low + 1];
        if (lower) {
            double sum = model.atMost(n2, low, quality);
            tails[0] = sum;
            for (int j = low + 1; j <= high; j++) {
                sum += model.exactly(n2, j, quality);
                tails[j - low] = sum;
            }
        } else {
            double sum = model.moreThan(n2, high, quality);
            tails[high - low] = sum;
            for (int j = high; j > low; j--) {
                sum += model.exactly(n2, j, quality);
                tails[j - 1 - low] = sum;
            }
        }
        return tails;
    }

    /** P(c1 < d1 < r1): the chance that the second sample is needed. */
    public double secondSampleChance(OcModel model, double quality) {
        double chance = 0;
        for (int d1 = c1 + 1; d1 < r1; d1++) {
            chance += model.exactly(n1, d1, quality);
        }
        return chance;
    }

    /** ASN = n1 + n2 P(c1 < d1 < r1), with the second sample inspected in full. */
    @Override
    public double averageSampleNumber(OcModel model, double quality) {
        return n1 + n2 * secondSampleChance(model, quality);
    }

    /**
     * The ASN when inspection of the second sample stops as soon as the cumulative count reaches the
     * rejection number c2 + 1 (curtailment on rejection only, as in Montgomery's Introduction to Statistical
     * Quality Control, double sampling; from memory). For the binomial model it uses the closed form
     * E[min(n2, T_k)] = n2 P(Bin(n2, p) < k) + (k / p) P(Bin(n2 + 1, p) > k), where T_k is the position of the
     * k-th nonconforming unit; for the others the sum over j < n2 of P(fewer than k in the first j units).
     */
    public double curtailedAverageSampleNumber(OcModel model, double quality) {
        double expected = n1;
        for (int d1 = c1 + 1; d1 < r1; d1++) {
            double weight = model.exactly(n1, d1, quality);
            if (weight == 0) {
                continue;
            }
            int k = c2 + 1 - d1;
            expected += weight * secondSampleUnits(model, quality, d1, k);
        }
        return expected;
    }

    /** The expected units inspected in the second sample, stopping at the k-th one counted. */
    double secondSampleUnits(OcModel model, double quality, int d1, int k) {
        if (quality <= 0) {
            return n2;
        }
        if (model instanceof OcModel.Binomial) {
            if (quality >= 1) {
                return Math.min(n2, k);
            }
            return n2 * model.atMost(n2, k - 1, quality) + k / quality * model.moreThan(n2 + 1, k, quality);
        }
        return secondSampleUnitsBySum(model, quality, d1, k);
    }

    /** The same expectation as a plain sum over the second sample's units, for every model. */
    double secondSampleUnitsBySum(OcModel model, double quality, int d1, int k) {
        double units = 1.0;
        for (int j = 1; j < n2; j++) {
            units += model.atMostAfter(n1, d1, j, k - 1, quality);
        }
        return units;
    }

    @Override
    public double averageOutgoingQuality(OcModel model, double quality, int lotSize) {
        return Stages.walk(stages(), model, quality, lotSize).outgoing();
    }

    @Override
    public double averageTotalInspection(OcModel model, double quality, int lotSize) {
        return Stages.totalInspection(Stages.walk(stages(), model, quality, lotSize), lotSize);
    }
}
