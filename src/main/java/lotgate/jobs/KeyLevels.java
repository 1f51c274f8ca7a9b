package lotgate.jobs;

import lotgate.sampling.OperatingCharacteristic;

/** The quality levels at which a plan accepts 95%, 50% and 10% of lots, and its AOQL. */
public record KeyLevels(double at95, double at50, double at10, OperatingCharacteristic.Aoql aoql) {
    /** The key levels of a plan's operating characteristic. */
    public static KeyLevels of(OperatingCharacteristic oc) {
        return new KeyLevels(oc.qualityAt(0.95), oc.qualityAt(0.50), oc.qualityAt(0.10), oc.aoql());
    }
}
