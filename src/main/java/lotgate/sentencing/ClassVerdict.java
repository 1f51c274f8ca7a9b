package lotgate.sentencing;

import lotgate.plan.DefectClass;
import lotgate.sampling.Plan;

/**
 * The verdict for one defect class.
 *
 * @param inspected        the units this class was judged on: the first units of the sample, up to where the plan
 *                         stopped
 * @param found            nonconforming units among them, or nonconformities under a Poisson plan
 * @param acceptanceNumber the largest count that accepts where the plan stopped (-1 where none does)
 * @param rejectionNumber  the smallest count that rejects there
 * @param step             where the plan stopped: "the sample", "second sample", "stage 2 of 4", "unit 61"
 */
public record ClassVerdict(DefectClass defectClass, Plan plan, int inspected, int found, boolean accepted,
        Evidence evidence, int acceptanceNumber, int rejectionNumber, String step) {

    /**
     * Whether the class accepted the lot with a count above its acceptance number, as a reduced plan of the
     * attribute tables allows below its rejection number: the lot is accepted, and normal inspection reinstated.
     */
    public boolean reinstatesNormal() {
        return accepted && acceptanceNumber >= 0 && found > acceptanceNumber;
    }
}
