package lotgate.sampling;

/** A sample's mean and standard deviation (divisor n - 1), summed in the order the values are given. */
public record SampleMoments(double mean, double deviation) {

    /** The moments of the values; the deviation of a single value is 0. */
    public static SampleMoments of(double[] values) {
        int n = values.length;
        double mean = 0;
        for (double v : values) {
            mean += v;
        }
        mean /= n;
        double squares = 0;
        for (double v : values) {
            squares += (v - mean) * (v - mean);
        }
        return new SampleMoments(mean, n > 1 ? Math.sqrt(squares / (n - 1)) : 0.0);
    }
}
