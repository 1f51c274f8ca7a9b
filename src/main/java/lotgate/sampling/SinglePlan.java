package lotgate.sampling;

/**
 * A single-sampling plan: inspect n units, accept the lot if at most c are nonconforming
 * (or, under the Poisson model, if at most c nonconformities are found), reject it at the rejection
 * number or more.
 *
 * <p>The rejection number is c + 1 except in some reduced-inspection plans of the attribute sampling
 * tables, where it is larger: a count strictly between c and the rejection number still accepts the
 * lot, but ends reduced inspection (normal inspection is reinstated). The OC curve is therefore
 * P(X < rejection number), the probability that the lot is accepted.
 */
public record SinglePlan(int n, int c, int rejectionNumber) implements Plan {

    public SinglePlan {
        if (n < 1) {
            throw new IllegalArgumentException("sample size n must be at least 1, got " + n);
        }
        if (c < 0) {
            throw new IllegalArgumentException("acceptance number c must be 0 or more, got " + c);
        }
        if (rejectionNumber < c + 1) {
            throw new IllegalArgumentException("rejection number must be at least c + 1 = " + (c + 1) + ", got "
                    + rejectionNumber);
        }
    }

    /** The usual plan: accept with at most c found, reject at c + 1; c from 0 to n - 1. */
    public SinglePlan(int n, int c) {
        this(n, c, c + 1);
        if (c >= n) {
            throw new IllegalArgumentException(
                    "acceptance number c must be from 0 to n - 1 = " + (n - 1) + ", got " + c);
        }
    }

    /** Whether a count above c can still accept the lot (Re > c + 1, as in some reduced plans). */
    public boolean hasGap() {
        return rejectionNumber > c + 1;
    }

    /** The largest count that accepts the lot: c, or Re - 1 for a plan with a gap. */
    public int acceptsUpTo() {
        return rejectionNumber - 1;
    }

    @Override
    public String scheme() {
        return "single";
    }

    @Override
    public int maxSampleSize() {
        return n;
    }

    @Override
    public double acceptance(OcModel model, double quality) {
        return model.atMost(n, acceptsUpTo(), quality);
    }

    @Override
    public double rejection(OcModel model, double quality) {
        return model.moreThan(n, acceptsUpTo(), quality);
    }

    @Override
    public double averageSampleNumber(OcModel model, double quality) {
        return n;
    }

    @Override
    public double averageOutgoingQuality(OcModel model, double quality, int lotSize) {
        if (model instanceof OcModel.Hypergeometric h) {
            // Exact for a finite lot: the D - x nonconforming units an accepted sample did not find stay.
            int d = h.defectives(quality);
            double outgoing = 0;
            for (int x = 0; x <= Math.min(acceptsUpTo(), d); x++) {
                outgoing += model.exactly(n, x, quality) * (d - x);
            }
            return outgoing / h.lotSize();
        }
        double uninspected = lotSize == 0 ? 1.0 : (lotSize - n) / (double) lotSize;
        return acceptance(model, quality) * quality * uninspected;
    }

    @Override
    public double averageTotalInspection(OcModel model, double quality, int lotSize) {
        return n + rejection(model, quality) * (lotSize - n);
    }
}
