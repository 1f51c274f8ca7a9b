package lotgate.jobs;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import lotgate.plan.DefectClass;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.Percent;
import lotgate.sampling.OcModel;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SingleDesign;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.SinglePlanDesigner;

/** Designing a single-sampling plan (n, c) from the two risks, for the lot or per defect class, or evaluating one. */
public final class DesignSinglePlan {

    /**
     * What one defect class asks for: its risk points and, optionally, a fixed acceptance number c or a given
     * plan (n with c); {@code source} is the text the criteria were written as, or null for plain options.
     */
    public record Criteria(DefectClass defectClass, String source, double aql, double alpha, double ltpd, double beta,
            Integer acceptance, Integer sampleSize) {
    }

    /** The model, lot size (0: none), the criteria (one of class ANY, or one per class) and where to save. */
    public record Request(OcModel model, int lotSize, List<Criteria> classes, SaveTarget save) {
        public Request {
            classes = List.copyOf(classes);
        }
    }

    /** One class's design with its risk points and how it was obtained ({@link SavedPlan} method names). */
    public record ClassOutcome(DefectClass defectClass, RiskPoints points, SingleDesign design, String method) {
        /** The plan found; only for a result without a {@code noPlanReason}. */
        public SingleDesign.Found found() {
            return (SingleDesign.Found) design;
        }
    }

    /** The outcome per class, the plan as saved (or null), and why no plan meets the request (or null). */
    public record Result(OcModel model, int lotSize, List<ClassOutcome> classes, SavedPlan saved, SaveTarget save,
            String noPlanReason) {
        /** Whether the criteria are per defect class rather than for the lot as a whole. */
        public boolean classed() {
            return classes.get(0).defectClass() != DefectClass.ANY;
        }

        /** The sample the lot needs: the largest n of the classes. */
        public int sampleSize() {
            return classes.stream().mapToInt(o -> o.found().plan().n()).max().orElseThrow();
        }
    }

    private DesignSinglePlan() {
    }

    /** Checks the request, designs each class's plan, and saves the plan when asked and every class has one. */
    public static Result run(Request request) {
        OcModel model = request.model();
        int lotSize = request.lotSize();
        List<ClassOutcome> outcomes = new ArrayList<>();
        List<RiskPoints> points = new ArrayList<>();
        for (Criteria criteria : request.classes()) {
            points.add(check(criteria, model, lotSize));
        }
        for (DefectClass defectClass : DefectClass.values()) {
            if (request.classes().stream().filter(r -> r.defectClass() == defectClass).count() > 1) {
                throw JobException.invalid("classes", "--class " + defectClass.label() + " is given twice");
            }
        }
        if (request.save() != null) {
            request.save().check();
        }
        SinglePlanDesigner designer = new SinglePlanDesigner(model, lotSize);
        for (int i = 0; i < request.classes().size(); i++) {
            outcomes.add(design(designer, model, request.classes().get(i), points.get(i)));
        }
        outcomes.sort(Comparator.comparing(ClassOutcome::defectClass));
        for (ClassOutcome outcome : outcomes) {
            if (outcome.design() instanceof SingleDesign.NotFound none) {
                String reason = (outcomes.size() > 1 ? "class " + outcome.defectClass().label() + ": " : "")
                        + none.reason();
                return new Result(model, lotSize, outcomes, null, request.save(), reason);
            }
        }
        SavedPlan saved = null;
        if (request.save() != null) {
            List<PlanFormat.ClassDraft> drafts = outcomes.stream().map(o -> new PlanFormat.ClassDraft(
                    o.defectClass(), o.found().plan(), o.points(), o.method())).toList();
            saved = request.save().save((name, now) -> PlanFormat.seal(name, request.save().description(), now, model,
                    lotSize, drafts));
        }
        return new Result(model, lotSize, outcomes, saved, request.save(), null);
    }

    private static RiskPoints check(Criteria criteria, OcModel model, int lotSize) {
        boolean plain = criteria.source() == null;
        String where = plain ? "" : "--class " + criteria.source() + ": ";
        String field = plain ? "" : "classes";
        String aqlName = plain ? "--aql" : "aql";
        String ltpdName = plain ? "--ltpd" : "ltpd";
        Checks.level(model, where + aqlName, criteria.aql());
        Checks.level(model, where + ltpdName, criteria.ltpd());
        if (criteria.aql() >= criteria.ltpd()) {
            throw JobException.invalid(plain ? "aql" : field, where + aqlName + " " + Percent.level(criteria.aql())
                    + " must be below " + ltpdName + " " + Percent.level(criteria.ltpd()));
        }
        if (criteria.alpha() + criteria.beta() >= 1) {
            throw JobException.invalid(plain ? "alpha" : field, where + (plain ? "--alpha plus --beta"
                    : "alpha plus beta") + " must be below 100%");
        }
        String sizeName = plain ? "--sample-size" : "n";
        String acceptanceName = plain ? "--acceptance" : "c";
        Integer n = criteria.sampleSize();
        Integer c = criteria.acceptance();
        if (n != null && c == null) {
            throw JobException.invalid(plain ? "sampleSize" : field, where + sizeName + " needs " + acceptanceName
                    + " to evaluate a plan");
        }
        if (n != null && lotSize > 0 && n > lotSize) {
            throw JobException.invalid(plain ? "sampleSize" : field, where + sizeName + " " + n
                    + " exceeds --lot-size " + lotSize);
        }
        if (n != null && c >= n) {
            throw JobException.invalid(plain ? "acceptance" : field, where + acceptanceName + " must be below "
                    + sizeName + " " + n + ", got " + c);
        }
        return new RiskPoints(criteria.aql(), criteria.alpha(), criteria.ltpd(), criteria.beta());
    }

    private static ClassOutcome design(SinglePlanDesigner designer, OcModel model, Criteria criteria,
            RiskPoints points) {
        if (criteria.sampleSize() != null) {
            SinglePlan plan = new SinglePlan(criteria.sampleSize(), criteria.acceptance());
            return new ClassOutcome(criteria.defectClass(), points, new SingleDesign.Found(plan,
                    PlanRisks.of(plan, model, points), List.of()), SavedPlan.GIVEN);
        }
        if (criteria.acceptance() != null) {
            return new ClassOutcome(criteria.defectClass(), points,
                    designer.designForAcceptanceNumber(criteria.acceptance(), points), SavedPlan.FIXED_ACCEPTANCE);
        }
        return new ClassOutcome(criteria.defectClass(), points, designer.design(points), SavedPlan.SMALLEST_SAMPLE);
    }
}
