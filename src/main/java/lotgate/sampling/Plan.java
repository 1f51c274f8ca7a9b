package lotgate.sampling;

/**
 * An acceptance sampling plan: the rule that turns what a sample shows into accept or reject.
 *
 * <p>Each kind is a record that implements the operating characteristics itself, so that a new kind
 * cannot compile until it answers every question below (Java 17 has no pattern switch); a kind walked over a
 * lattice of (units, count) answers them all through its {@code walk} ({@link LatticePlan}).
 */
public sealed interface Plan permits SinglePlan, DoublePlan, LatticePlan,
        VariablesPlan {

    /** The plan kind's name as written in plan files and in JSON output. */
    String scheme();

    /** The largest number of units the plan can ask to inspect. */
    int maxSampleSize();

    /** P(accept) at a quality level. */
    double acceptance(OcModel model, double quality);

    /** P(reject) at a quality level, computed as its own tail and not as 1 - P(accept). */
    double rejection(OcModel model, double quality);

    /**
     * The expected outgoing quality under rectifying inspection of a lot of the given size (0: the
     * limit for a very large lot).
     */
    double averageOutgoingQuality(OcModel model, double quality, int lotSize);

    /** The average sample number (ASN): the expected number of units inspected to reach a decision. */
    double averageSampleNumber(OcModel model, double quality);

    /** The expected number of units inspected per lot of the given size under rectifying inspection. */
    double averageTotalInspection(OcModel model, double quality, int lotSize);
}
