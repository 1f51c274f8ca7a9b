package lotgate.sentencing;

import lotgate.plan.DefectClass;
import lotgate.sampling.SinglePlan;

/**
 * The verdict for one defect class.
 *
 * @param inspected the units this class was judged on (the first n of the sample)
 * @param found     nonconforming units among them, or nonconformities under a Poisson plan
 */
public record ClassVerdict(DefectClass defectClass, SinglePlan plan, int inspected, int found, boolean accepted,
        Evidence evidence) {

    public int acceptanceNumber() {
        return plan.c();
    }

    public int rejectionNumber() {
        return plan.rejectionNumber();
    }
}
