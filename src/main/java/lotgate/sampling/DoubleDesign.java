package lotgate.sampling;

/** The outcome of a double-plan design: the plan with the smallest ASN that meets both risks, or why none does. */
public sealed interface DoubleDesign {

    /**
     * @param asn        the plan's ASN at the quality level it was designed to minimise it at
     * @param candidates the plans whose risks were computed on the way, for the record of the search's effort
     */
    record Found(DoublePlan plan, PlanRisks risks, double asn, long candidates) implements DoubleDesign {
    }

    record NotFound(String reason) implements DoubleDesign {
    }
}
