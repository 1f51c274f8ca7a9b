package lotgate.sampling;

/**
 * A plan whose every operating characteristic comes out of one walk over its lattice of (units inspected,
 * count found): P(accept) and P(reject) as two sums of positive terms, the ASN, the AOQ and the ATI.
 */
sealed interface LatticePlan extends Plan permits MultiplePlan, SequentialPlan {

    /** The walk at one quality level; lotSize 0 stands for a very large lot. */
    Stages.Outcome walk(OcModel model, double quality, int lotSize);

    @Override
    default double acceptance(OcModel model, double quality) {
        return walk(model, quality, 0).acceptance();
    }

    @Override
    default double rejection(OcModel model, double quality) {
        return walk(model, quality, 0).rejection();
    }

    @Override
    default double averageSampleNumber(OcModel model, double quality) {
        return walk(model, quality, 0).averageSample();
    }

    @Override
    default double averageOutgoingQuality(OcModel model, double quality, int lotSize) {
        return walk(model, quality, lotSize).outgoing();
    }

    @Override
    default double averageTotalInspection(OcModel model, double quality, int lotSize) {
        return Stages.totalInspection(walk(model, quality, lotSize), lotSize);
    }
}
