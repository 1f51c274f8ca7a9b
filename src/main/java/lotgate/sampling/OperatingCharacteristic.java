package lotgate.sampling;

import java.util.ArrayList;
import java.util.List;

/**
 * The operating characteristics of a plan under a model: probability of acceptance (the OC curve,
 * one minus the power of the test), average outgoing quality (AOQ) and average total inspection
 * (ATI) under rectifying inspection, where rejected lots are inspected 100% and nonconforming units
 * found are replaced by good ones.
 *
 * @param lotSize the lot size N, or 0 when unknown (AOQ is then the limit for a very large lot and
 *                ATI cannot be computed)
 */
public record OperatingCharacteristic(Plan plan, OcModel model, int lotSize) {

    public OperatingCharacteristic {
        if (lotSize < 0) {
            throw new IllegalArgumentException("lot size must not be negative, got " + lotSize);
        }
        if (model instanceof OcModel.Hypergeometric h && h.lotSize() != lotSize) {
            throw new IllegalArgumentException("the hypergeometric model is tied to lot size " + h.lotSize()
                    + ", not " + lotSize);
        }
        if (lotSize > 0 && plan.maxSampleSize() > lotSize) {
            throw new IllegalArgumentException("the plan may inspect " + plan.maxSampleSize()
                    + " units, more than the lot size " + lotSize);
        }
    }

    /** The characteristics for the model's own lot size (type A), or for none (type B). */
    public static OperatingCharacteristic of(Plan plan, OcModel model) {
        return new OperatingCharacteristic(plan, model, model.lotSize());
    }

    /** P(accept) at a quality level. */
    public static double acceptance(Plan plan, OcModel model, double quality) {
        return plan.acceptance(model, quality);
    }

    /** P(reject) at a quality level, computed as its own tail and not as 1 - P(accept). */
    public static double rejection(Plan plan, OcModel model, double quality) {
        return plan.rejection(model, quality);
    }

    public double acceptance(double quality) {
        return acceptance(plan, model, quality);
    }

    /**
     * Average outgoing quality: the expected fraction nonconforming (or nonconformities per unit)
     * that leaves inspection. Accepted lots keep what was not inspected; rejected lots leave clean.
     */
    public double aoq(double quality) {
        return plan.averageOutgoingQuality(model, quality, lotSize);
    }

    /** Average total inspection per lot: n + (1 - Pa)(N - n); needs a lot size. */
    public double ati(double quality) {
        if (lotSize == 0) {
            throw new IllegalStateException("ATI needs a lot size");
        }
        return plan.averageTotalInspection(model, quality, lotSize);
    }

    /** The average sample number at a quality level. */
    public double asn(double quality) {
        return plan.averageSampleNumber(model, quality);
    }

    public double rejection(double quality) {
        return rejection(plan, model, quality);
    }

    /**
     * The quality level at which P(accept) falls to the target. For a finite lot the curve is a
     * staircase over whole numbers D, and the result is the largest D/N whose P(accept) is still at
     * least the target.
     */
    public double qualityAt(double targetAcceptance) {
        if (!(targetAcceptance > 0 && targetAcceptance < 1)) {
            throw new IllegalArgumentException("target probability must lie strictly between 0 and 1");
        }
        if (model instanceof OcModel.Hypergeometric h) {
            int good = 0;
            int bad = h.lotSize();
            if (acceptance(1.0) >= targetAcceptance) {
                return 1.0;
            }
            while (bad - good > 1) {
                int mid = good + (bad - good) / 2;
                if (acceptance((double) mid / h.lotSize()) >= targetAcceptance) {
                    good = mid;
                } else {
                    bad = mid;
                }
            }
            return (double) good / h.lotSize();
        }
        double low = 0;
        double high = Math.min(1.0, model.maxQuality());
        while (acceptance(high) >= targetAcceptance) {
            low = high;
            high *= 2;
        }
        for (int i = 0; i < 200 && high - low > 1e-15 * high; i++) {
            double mid = 0.5 * (low + high);
            if (acceptance(mid) >= targetAcceptance) {
                low = mid;
            } else {
                high = mid;
            }
        }
        return 0.5 * (low + high);
    }

    /** The average outgoing quality limit: the largest AOQ over all incoming quality levels. */
    public Aoql aoql() {
        double top = qualityAt(1e-9);
        if (model instanceof OcModel.Hypergeometric h) {
            return integerAoql(h, (int) Math.round(top * h.lotSize()));
        }
        int steps = 400;
        double best = 0;
        int bestIndex = 0;
        for (int i = 1; i <= steps; i++) {
            double value = aoq(top * i / steps);
            if (value > best) {
                best = value;
                bestIndex = i;
            }
        }
        // Golden-section refinement in the bracket around the best grid point (AOQ is unimodal there).
        double at = goldenMaximum(this::aoq, top * Math.max(0, bestIndex - 1) / steps,
                top * Math.min(steps, bestIndex + 1) / steps, 1e-13);
        return new Aoql(at, aoq(at));
    }

    /** Where a function with one peak in [low, high] is largest, by golden-section search to a relative tolerance. */
    static double goldenMaximum(java.util.function.DoubleUnaryOperator f, double low, double high, double tolerance) {
        double ratio = (Math.sqrt(5) - 1) / 2;
        double x1 = high - ratio * (high - low);
        double x2 = low + ratio * (high - low);
        double f1 = f.applyAsDouble(x1);
        double f2 = f.applyAsDouble(x2);
        while (high - low > tolerance * high) {
            if (f1 < f2) {
                low = x1;
                x1 = x2;
                f1 = f2;
                x2 = low + ratio * (high - low);
                f2 = f.applyAsDouble(x2);
            } else {
                high = x2;
                x2 = x1;
                f2 = f1;
                x1 = high - ratio * (high - low);
                f1 = f.applyAsDouble(x1);
            }
        }
        return 0.5 * (low + high);
    }

    private Aoql integerAoql(OcModel.Hypergeometric h, int topDefectives) {
        int n = h.lotSize();
        int stride = Math.max(1, topDefectives / 2000);
        int bestD = 0;
        double best = 0;
        for (int d = 0; d <= topDefectives; d += stride) {
            double value = aoq((double) d / n);
            if (value > best) {
                best = value;
                bestD = d;
            }
        }
        for (int d = Math.max(0, bestD - stride); d <= Math.min(n, bestD + stride); d++) {
            double value = aoq((double) d / n);
            if (value > best) {
                best = value;
                bestD = d;
            }
        }
        return new Aoql((double) bestD / n, best);
    }

    /**
     * The curves at evenly spaced quality levels from 0 to the given level. For a finite lot each level
     * is moved to the nearest whole number of nonconforming units, and repeated levels are dropped.
     */
    public List<CurvePoint> curve(double upTo, int intervals) {
        if (!(upTo > 0) || intervals < 1) {
            throw new IllegalArgumentException("a curve needs a positive range and at least one interval");
        }
        List<CurvePoint> points = new ArrayList<>();
        int lastDefectives = -1;
        for (int i = 0; i <= intervals; i++) {
            double quality = upTo * i / intervals;
            int defectives = -1;
            if (model instanceof OcModel.Hypergeometric h) {
                defectives = h.defectives(quality);
                if (defectives == lastDefectives) {
                    continue;
                }
                lastDefectives = defectives;
                quality = (double) defectives / h.lotSize();
            }
            points.add(new CurvePoint(quality, defectives, acceptance(quality), aoq(quality),
                    lotSize > 0 ? ati(quality) : Double.NaN, asn(quality)));
        }
        return points;
    }

    private static final double[] ROUND_STEPS = {1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10};

    /**
     * A range for the curves that shows where P(accept) falls to 1%, and the LTPD if given (0 for none),
     * rounded up to the next of 1, 1.2, 1.5, 2, 2.5, 3, 4, 5, 6 or 8 times a power of ten, and never past
     * the largest level the model allows (100% for a fraction nonconforming).
     */
    public double suggestedRange(double ltpd) {
        double top = Math.max(qualityAt(0.01), 1.25 * ltpd);
        double power = Math.pow(10, Math.floor(Math.log10(top)));
        double rounded = 10 * power;
        for (double step : ROUND_STEPS) {
            if (step * power >= top * (1 - 1e-12)) {
                rounded = step * power;
                break;
            }
        }
        return Math.min(rounded, model.maxQuality());
    }

    /** The AOQL and the incoming quality level at which it occurs. */
    public record Aoql(double quality, double limit) {
    }
}
