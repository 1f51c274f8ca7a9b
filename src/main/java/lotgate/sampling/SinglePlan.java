package lotgate.sampling;

/**
 * A single-sampling plan: inspect n units, accept the lot if at most c are nonconforming
 * (or, under the Poisson model, if at most c nonconformities are found).
 */
public record SinglePlan(int n, int c) implements Plan {

    public SinglePlan {
        if (n < 1) {
            throw new IllegalArgumentException("sample size n must be at least 1, got " + n);
        }
        if (c < 0 || c >= n) {
            throw new IllegalArgumentException(
                    "acceptance number c must be from 0 to n - 1 = " + (n - 1) + ", got " + c);
        }
    }

    /** The smallest count that rejects the lot, c + 1. */
    public int rejectionNumber() {
        return c + 1;
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
        return model.atMost(n, c, quality);
    }

    @Override
    public double rejection(OcModel model, double quality) {
        return model.moreThan(n, c, quality);
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
            for (int x = 0; x <= Math.min(c, d); x++) {
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
