package lotgate.sentencing;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import lotgate.inspection.InspectionSample;
import lotgate.inspection.LotDetails;
import lotgate.plan.SavedPlan;

/**
 * Everything a lot's decision rests on, as it will be recorded: the lot, the plan and its file, the
 * sample as read from the sheet and the sheet's SHA-256, the sentence, when and by which version.
 *
 * @param notices remarks printed with the decision, such as a lot size other than the plan's (the
 *                caution for a critical nonconformity is {@link #criticalNotice()})
 * @param measured for a lot judged by a variables plan, its measurements' statistics; else null
 */
public record LotDecision(LotDetails lot, SavedPlan plan, Path planFile, InspectionSample sample, String sheetSha256,
        Sentence sentence, double confidence, Instant decidedAt, String toolVersion, List<String> notices,
        MeasuredLot measured) {
    public LotDecision {
        notices = List.copyOf(notices);
    }

    /** A lot judged by counts, with no measurements. */
    public LotDecision(LotDetails lot, SavedPlan plan, Path planFile, InspectionSample sample, String sheetSha256,
            Sentence sentence, double confidence, Instant decidedAt, String toolVersion, List<String> notices) {
        this(lot, plan, planFile, sample, sheetSha256, sentence, confidence, decidedAt, toolVersion, notices, null);
    }

    /** The caution shown with any critical nonconformity, whatever the plan says. */
    public String criticalNotice() {
        return "critical nonconformity found (sheet row " + sample.firstCriticalRow() + "): quarantine the lot and"
                + " follow the customer's requirements and local regulations for critical nonconformities, whatever"
                + " the plan's verdict";
    }

    /** Whether the sample holds a critical nonconformity, whatever the plan says. */
    public boolean criticalFound() {
        return sample.firstCriticalRow() >= 0;
    }

    /** Whether counts are of nonconforming units (true) or of nonconformities under a Poisson plan. */
    public boolean countsUnits() {
        return plan.model().countsUnits();
    }
}
