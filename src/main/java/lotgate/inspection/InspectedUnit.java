package lotgate.inspection;

/**
 * A nonconforming unit as recorded in the sheet, kept for reports.
 *
 * @param row      the sheet row it stands on
 * @param unit     its identifier, or "" when the sheet has none
 * @param failed   for a pass/fail sheet, whether it failed; for class counts, whether any count is above 0
 */
public record InspectedUnit(int row, String unit, boolean failed, int critical, int major, int minor, String defect,
        String note) {
}
