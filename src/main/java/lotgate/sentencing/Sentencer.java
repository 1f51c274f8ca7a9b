package lotgate.sentencing;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntToLongFunction;
import lotgate.plan.ClassPlan;
import lotgate.plan.DefectClass;
import lotgate.plan.SavedPlan;
import lotgate.sampling.ConfidenceBounds;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.SequentialPlan;

/** Applies a saved plan to the counts found in a lot's sample and gives each class's verdict with its evidence. */
public final class Sentencer {
    private Sentencer() {
    }

    /** The counts of a sample recorded in inspection order. */
    public interface Counts {
        /** The units recorded. */
        int units();

        /** The count of a class found in the first m units, by the plan's way of counting. */
        long countAt(DefectClass defectClass, int m);
    }

    /**
     * @param lotSize    the lot's size N, or 0 if unknown (a hypergeometric plan then uses its own; the evidence
     *                   then leaves out the bound on nonconforming units in the lot)
     * @param confidence the confidence level of the bounds
     * @return the sentence, or for a multi-stage or sequential plan that has not decided, what to inspect next
     */
    public static Outcome sentence(SavedPlan saved, Counts counts, int lotSize, double confidence) {
        int lot = lotSize > 0 ? lotSize : saved.lotSize();
        OcModel model = saved.model() instanceof OcModel.Hypergeometric && lot > 0
                ? new OcModel.Hypergeometric(lot) : saved.model();
        List<ClassVerdict> verdicts = new ArrayList<>();
        for (ClassPlan criteria : saved.classes()) {
            Plan plan = criteria.plan();
            DefectClass defectClass = criteria.defectClass();
            int units = Math.min(counts.units(), plan.maxSampleSize());
            IntToLongFunction countAt = m -> counts.countAt(defectClass, m);
            Stopping.Point point = Stopping.at(plan, units, countAt);
            if (point.verdict() == Stopping.Verdict.CONTINUE) {
                int clean = plan instanceof SequentialPlan sequential
                        ? Stopping.acceptanceIfClean(sequential, point.inspected(), point.found()) : 0;
                return new Pending(plan, point, point.inspected() + point.moreUnits(), clean);
            }
            int found = (int) Math.min(Integer.MAX_VALUE, point.found());
            verdicts.add(new ClassVerdict(defectClass, plan, point.inspected(), found,
                    point.verdict() == Stopping.Verdict.ACCEPT,
                    evidence(model, plan, criteria, point.inspected(), found, lotSize, confidence),
                    point.acceptanceNumber(), point.rejectionNumber(), point.step()));
        }
        return new Sentence(verdicts.stream().allMatch(ClassVerdict::accepted), verdicts);
    }

    private static Evidence evidence(OcModel model, Plan plan, ClassPlan criteria, int inspected, int count, int lot,
            double confidence) {
        double aqlPoint = model.producerPoint(criteria.designedFor().aql());
        double ltpdPoint = model.consumerPoint(criteria.designedFor().ltpd());
        double pValue = ConfidenceBounds.pValue(model, inspected, count, aqlPoint);
        ConfidenceBounds.Interval interval = model.countsUnits()
                ? ConfidenceBounds.clopperPearson(count, inspected, confidence)
                : ConfidenceBounds.garwood(count, inspected, confidence);
        int lotBound = model.countsUnits() && lot > 0
                ? ConfidenceBounds.lotUpperBound(count, inspected, lot, confidence) : -1;
        double observed = (double) count / inspected;
        return new Evidence(pValue, confidence, interval.lower(), interval.upper(), model.countsUnits()
                ? BoundMethod.CLOPPER_PEARSON : BoundMethod.GARWOOD, lotBound, observed,
                plan.acceptance(model, observed), plan.acceptance(model, aqlPoint), plan.acceptance(model, ltpdPoint));
    }
}
