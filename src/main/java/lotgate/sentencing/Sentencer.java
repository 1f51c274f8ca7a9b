package lotgate.sentencing;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import lotgate.plan.ClassPlan;
import lotgate.plan.DefectClass;
import lotgate.plan.SavedPlan;
import lotgate.sampling.ConfidenceBounds;
import lotgate.sampling.OcModel;
import lotgate.sampling.SinglePlan;

/** Applies a saved plan to the counts found in a lot's sample and gives each class's verdict with its evidence. */
public final class Sentencer {
    private Sentencer() {
    }

    /**
     * @param found      per defect class of the plan, the count found in its first n units
     * @param lotSize    the lot's size N, or 0 if unknown (a hypergeometric plan then uses its own)
     * @param confidence the confidence level of the bounds
     */
    public static Sentence sentence(SavedPlan saved, Map<DefectClass, Integer> found, int lotSize, double confidence) {
        int lot = lotSize > 0 ? lotSize : saved.lotSize();
        OcModel model = saved.model() instanceof OcModel.Hypergeometric && lot > 0
                ? new OcModel.Hypergeometric(lot) : saved.model();
        List<ClassVerdict> verdicts = new ArrayList<>();
        for (ClassPlan criteria : saved.classes()) {
            Integer count = found.get(criteria.defectClass());
            if (count == null) {
                throw new IllegalArgumentException("no count for class " + criteria.defectClass().label());
            }
            SinglePlan plan = (SinglePlan) criteria.plan();
            verdicts.add(new ClassVerdict(criteria.defectClass(), plan, plan.n(), count, count <= plan.c(),
                    evidence(model, plan, criteria, count, lot, confidence)));
        }
        return new Sentence(verdicts.stream().allMatch(ClassVerdict::accepted), verdicts);
    }

    private static Evidence evidence(OcModel model, SinglePlan plan, ClassPlan criteria, int count, int lot,
            double confidence) {
        int n = plan.n();
        double aqlPoint = model.producerPoint(criteria.designedFor().aql());
        double ltpdPoint = model.consumerPoint(criteria.designedFor().ltpd());
        double pValue = ConfidenceBounds.pValue(model, n, count, aqlPoint);
        ConfidenceBounds.Interval interval = model.countsUnits()
                ? ConfidenceBounds.clopperPearson(count, n, confidence)
                : ConfidenceBounds.garwood(count, n, confidence);
        int lotBound = model.countsUnits() && lot > 0 ? ConfidenceBounds.lotUpperBound(count, n, lot, confidence) : -1;
        double observed = (double) count / n;
        return new Evidence(pValue, confidence, interval.lower(), interval.upper(), lotBound, observed,
                plan.acceptance(model, observed), plan.acceptance(model, aqlPoint), plan.acceptance(model, ltpdPoint));
    }
}
