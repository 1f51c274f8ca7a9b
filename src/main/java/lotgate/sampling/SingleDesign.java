package lotgate.sampling;

import java.util.List;

/** The outcome of a single-plan design: a plan that meets the request, or the reason there is none. */
public sealed interface SingleDesign {

    /**
     * @param otherAcceptanceNumbers further acceptance numbers that also meet both risks at the same n
     */
    record Found(SinglePlan plan, PlanRisks risks, List<Integer> otherAcceptanceNumbers) implements SingleDesign {
        public Found {
            otherAcceptanceNumbers = List.copyOf(otherAcceptanceNumbers);
        }
    }

    record NotFound(String reason) implements SingleDesign {
    }
}
