package lotgate.plan;

import java.util.Objects;
import lotgate.sampling.Plan;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;

/**
 * The acceptance criteria for one defect class within a saved plan: its sampling plan, what it was
 * designed for, how it was obtained and what it achieves.
 *
 * @param method {@link SavedPlan#SMALLEST_SAMPLE}, {@link SavedPlan#FIXED_ACCEPTANCE} or {@link SavedPlan#GIVEN}
 */
public record ClassPlan(DefectClass defectClass, Plan plan, RiskPoints designedFor, String method,
        PlanRisks achieved) {
    public ClassPlan {
        Objects.requireNonNull(defectClass, "defectClass");
        Objects.requireNonNull(plan, "plan");
        Objects.requireNonNull(designedFor, "designedFor");
        Objects.requireNonNull(method, "method");
        Objects.requireNonNull(achieved, "achieved");
    }
}
