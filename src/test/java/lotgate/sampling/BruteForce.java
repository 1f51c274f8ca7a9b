package lotgate.sampling;

/** The test oracle for single-plan design: every n from 1 upward, and at each n the acceptance numbers upward. */
public final class BruteForce {
    private BruteForce() {
    }

    /** The smallest n that meets both risks with some c, or -1 if none up to the limit. */
    public static int smallestSample(OcModel model, RiskPoints points, int limit) {
        double aqlPoint = model.producerPoint(points.aql());
        double ltpdPoint = model.consumerPoint(points.ltpd());
        for (int n = 1; n <= limit; n++) {
            for (int c = 0; c < n; c++) {
                if (model.moreThan(n, c, aqlPoint) <= points.alpha()) {
                    // Larger c only raises the consumer's risk: this c decides n.
                    if (model.atMost(n, c, ltpdPoint) <= points.beta()) {
                        return n;
                    }
                    break;
                }
            }
        }
        return -1;
    }
}
