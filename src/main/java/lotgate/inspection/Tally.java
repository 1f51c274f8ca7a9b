package lotgate.inspection;

import lotgate.plan.DefectClass;

/**
 * Counts over the first units of a sample: nonconforming units and nonconformities per defect class,
 * with ANY for units with any nonconformity (or failed units of a pass/fail sheet) and all
 * nonconformities together.
 */
public final class Tally {
    private final int inspected;
    private final int[] units;
    private final long[] nonconformities;

    Tally(int inspected, int[] units, long[] nonconformities) {
        this.inspected = inspected;
        this.units = units.clone();
        this.nonconformities = nonconformities.clone();
    }

    /** The number of units these counts cover. */
    public int inspected() {
        return inspected;
    }

    /** Units with at least one nonconformity of the class. */
    public int nonconformingUnits(DefectClass defectClass) {
        return units[defectClass.ordinal()];
    }

    /** Nonconformities of the class, summed over units. */
    public long nonconformities(DefectClass defectClass) {
        return nonconformities[defectClass.ordinal()];
    }
}
