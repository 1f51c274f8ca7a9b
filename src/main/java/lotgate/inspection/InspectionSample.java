package lotgate.inspection;

import java.nio.file.Path;
import java.util.BitSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import lotgate.plan.DefectClass;

/**
 * What an inspection sheet says about a lot's sample: how many units, and what was found in them.
 *
 * @param classColumns     the defect classes the sheet has count columns for (empty for pass/fail)
 * @param tallies          counts over the first k units, for each k asked for, and for all units
 * @param nonconforming    the first nonconforming units, for reports (at most {@link SampleReader#KEPT_UNITS})
 * @param defectTypes      nonconforming units per defect type named in the defect column
 * @param firstCriticalRow the first row with a critical nonconformity, or -1
 * @param nonconformingRows the sheet rows of all nonconforming units
 * @param sequence         each unit's nonconformities in sheet order, when the reader was asked to keep them;
 *                         else null
 */
public record InspectionSample(Path file, String sheet, int headerRow, List<String> headers, boolean passFail,
        Set<DefectClass> classColumns, int units, int firstRow, int lastRow, Map<Integer, Tally> tallies,
        Tally all, List<InspectedUnit> nonconforming, int nonconformingTotal, Map<String, Integer> defectTypes,
        int firstCriticalRow, BitSet nonconformingRows, int[] sequence) {

    public InspectionSample {
        nonconformingRows = (BitSet) nonconformingRows.clone();
    }

    /** Whether the unit on a sheet row is nonconforming. */
    public boolean nonconformingAt(int row) {
        return nonconformingRows.get(row);
    }
}
