package lotgate.sampling;

import java.util.Arrays;

/**
 * One walk over the lattice of (units inspected, count found) at one quality level, shared by plans in stages
 * ({@link Stages}) and truncated sequential plans ({@link SequentialLattice}): the probability of each count not
 * yet decided, carried from one stage (or unit) to the next, and the sums the outcome is made of. Acceptance and
 * rejection are kept as two sums of positive terms.
 */
final class LatticeWalk {
    /** The quality level walked. */
    final double quality;
    /** The lot's nonconforming units D under the hypergeometric model, else -1. */
    final int lotDefectives;
    /** The model's lot size for a finite lot, else the lot size for AOQ (0 for the limit of a very large lot). */
    final int lotSize;

    /** The probability of each count not yet decided, nonzero only from {@link #low} to {@link #high}. */
    double[] going;
    int low;
    int high;
    private double[] next;
    private int nextLow = Integer.MAX_VALUE;
    private int nextHigh = -1;

    double accept;
    double reject;
    double sample;
    double inspectedWhenAccepted;
    private double outgoing;

    /** @param top the largest count carried from one stage to the next */
    LatticeWalk(OcModel model, double quality, int lotSize, int top) {
        this.quality = quality;
        this.lotDefectives = model instanceof OcModel.Hypergeometric h ? h.defectives(quality) : -1;
        this.lotSize = model instanceof OcModel.Hypergeometric h ? h.lotSize() : lotSize;
        going = new double[top + 1];
        next = new double[top + 1];
        going[0] = 1.0;
    }

    /** Whether some count is not yet decided. */
    boolean undecided() {
        return low <= high;
    }

    /** Carries probability to the next stage with this count found. */
    void carry(int total, double mass) {
        next[total] += mass;
        nextLow = Math.min(nextLow, total);
        nextHigh = Math.max(nextHigh, total);
    }

    /** Adds the outgoing nonconforming units of a finite lot accepted with this count found: D minus the count. */
    void outgoingOfLot(double accepted, int found) {
        outgoing += accepted * (lotDefectives - found);
    }

    /**
     * Adds the outgoing quality of lots from a process accepted after this many units: the quality level over the
     * units not inspected.
     */
    void outgoingOfProcess(double accepted, int inspected) {
        outgoing += accepted * quality * (lotSize == 0 ? 1.0 : (lotSize - inspected) / (double) lotSize);
    }

    /** Moves on to the next stage (or unit): the counts carried become the counts not yet decided. */
    void nextStage() {
        // Keep the invariant that the array to be filled next holds only zeros.
        if (low <= high) {
            Arrays.fill(going, low, high + 1, 0.0);
        }
        double[] swap = going;
        going = next;
        next = swap;
        low = nextLow;
        high = nextHigh;
        nextLow = Integer.MAX_VALUE;
        nextHigh = -1;
    }

    /** The walk's OC, ASN, AOQ and ATI sums. */
    Stages.Outcome outcome() {
        return new Stages.Outcome(accept, reject, sample, lotDefectives >= 0 ? outgoing / lotSize : outgoing,
                inspectedWhenAccepted);
    }
}
