package lotgate.jobs;

import java.util.function.LongConsumer;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.Percent;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.LeastInspectionDesigner;
import lotgate.sampling.LeastInspectionDoubleSearch;
import lotgate.sampling.OcModel;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SingleDesign;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.SinglePlanDesigner;

/**
 * Designing the plan with the least average total inspection at the supplier's process average, for rectifying
 * inspection (rejected lots screened 100%), under an LTPD or an AOQL protection (Dodge-Romig), beside the plan
 * {@code design} gives for the same protection.
 */
public final class DesignLeastInspection {
    /** The producer's risk at the process average of the plan {@code design} gives for comparison. */
    public static final double COMPARISON_ALPHA = 0.05;

    /**
     * The lot size (null: not given), the LTPD with the consumer's risk, or the AOQL target (exactly one of the
     * two levels), the process average, the model's name (null: hypergeometric for the lot), where to save, and
     * the scheme: single (or null) or double (LTPD protection only).
     */
    public record Request(Integer lotSize, Double ltpd, double beta, Double aoql, Double processAverage, String model,
            SaveTarget save, String scheme) {
        /** A request for the single plan. */
        public Request(Integer lotSize, Double ltpd, double beta, Double aoql, Double processAverage, String model,
                SaveTarget save) {
            this(lotSize, ltpd, beta, aoql, processAverage, model, save, null);
        }

        /** Whether the double plan is asked for. */
        public boolean isDouble() {
            return "double".equals(scheme);
        }
    }

    /**
     * The double plan found (no plan: screening every unit costs no more) with its figures, and its LTPD at a
     * consumer's risk of 5%.
     */
    public record DoubleFound(LeastInspectionDoubleSearch.Result found, double ltpd5) {
    }

    /**
     * The plan {@code design} gives for the same protection: the smallest sample with a producer's risk of at
     * most 5% at the process average and the same LTPD point (the chosen plan's own LTPD under an AOQL
     * protection), with its ATI at the process average and its AOQL; null fields where none exists.
     */
    public record Comparison(SinglePlan plan, double ltpd, double ati, double aoql) {
    }

    /**
     * The model, the single plan found with its figures (no plan: screening every unit costs no more), its LTPD at
     * a consumer's risk of 5%, the plan {@code design} gives for comparison (or null), the plan as saved (or null),
     * and, for the double scheme, the double plan found (else null), which is then the plan saved; the single plan
     * is its comparison.
     */
    public record Result(Request request, OcModel model, LeastInspectionDesigner.Result found, double ltpd5,
            Comparison comparison, SavedPlan saved, DoubleFound doubleFound) {
        public int lotSize() {
            return request.lotSize();
        }

        /** Whether the protection is an LTPD (else an AOQL). */
        public boolean byLtpd() {
            return request.ltpd() != null;
        }
    }

    private DesignLeastInspection() {
    }

    /** Checks the request, finds the least-inspection plan, compares it, and saves it when asked. */
    public static Result run(Request request) {
        return run(request, count -> { });
    }

    /**
     * As {@link #run(Request)}, telling {@code plansEvaluated} how many double plans the double search has
     * evaluated so far (it may take seconds for a large lot; the single search takes milliseconds and tells nothing).
     */
    public static Result run(Request request, LongConsumer plansEvaluated) {
        int lotSize = Checks.requiredLotSize(request.lotSize(), "the least inspection", "a lot needs at least 2 units");
        if (lotSize > 1_000_000) {
            throw JobException.invalid("lotSize", "--lot-size " + lotSize + ": least-inspection plans are computed"
                    + " for lots of up to 1,000,000 units");
        }
        if ((request.ltpd() == null) == (request.aoql() == null)) {
            throw JobException.invalid("ltpd", "give either --ltpd (lot quality protection) or --aoql (average"
                    + " outgoing quality protection)");
        }
        if (request.scheme() != null && !request.scheme().equals("single") && !request.isDouble()) {
            throw JobException.invalid("scheme", "--scheme " + request.scheme() + ": least-inspection plans are"
                    + " single or double");
        }
        if (request.isDouble() && request.aoql() != null) {
            throw JobException.invalid("scheme", "--scheme double: the double least-inspection plan is designed for"
                    + " LTPD protection; give --ltpd instead of --aoql");
        }
        if (request.processAverage() == null) {
            throw JobException.invalid("processAverage", "give the supplier's --process-average: the plan"
                    + " inspects least at that quality");
        }
        OcModel model = Checks.model(request.model() == null ? "hypergeometric" : request.model(), lotSize);
        double average = request.processAverage();
        Checks.level(model, "--process-average", average);
        if (!(average > 0)) {
            throw JobException.invalid("processAverage", "--process-average must be above 0%, got "
                    + Percent.level(average));
        }
        if (request.ltpd() != null) {
            Checks.level(model, "--ltpd", request.ltpd());
            if (average >= request.ltpd()) {
                throw JobException.invalid("processAverage", "--process-average " + Percent.level(average)
                        + " must be below --ltpd " + Percent.level(request.ltpd()));
            }
            if (!(request.beta() > 0 && request.beta() < 1)) {
                throw JobException.invalid("beta", "--beta must lie between 0% and 100%");
            }
        } else {
            Checks.level(model, "--aoql", request.aoql());
            if (average >= request.aoql()) {
                throw JobException.invalid("processAverage", "--process-average " + Percent.level(average)
                        + " must be below --aoql " + Percent.level(request.aoql()));
            }
        }
        if (request.save() != null) {
            request.save().check();
        }
        LeastInspectionDesigner designer = new LeastInspectionDesigner(model, lotSize);
        LeastInspectionDesigner.Result found = request.ltpd() != null
                ? designer.forLtpd(request.ltpd(), request.beta(), average)
                : designer.forAoql(request.aoql(), average);
        if (request.isDouble()) {
            return runDouble(request, model, lotSize, found, plansEvaluated);
        }
        if (found.inspectEveryUnit()) {
            if (request.save() != null) {
                throw new JobException(JobException.Kind.INVALID_REQUEST, "save", "--save: no sampling plan inspects"
                        + " fewer units on average than screening every unit of the lot, so there is no plan to save");
            }
            return new Result(request, model, found, Double.NaN, null, null, null);
        }
        SinglePlan plan = found.plan();
        var oc = new lotgate.sampling.OperatingCharacteristic(plan, model, lotSize);
        double ltpd5 = oc.qualityAt(0.05);
        double ltpdPoint = request.ltpd() != null ? request.ltpd() : found.ltpd10();
        double beta = request.ltpd() != null ? request.beta() : 0.10;
        Comparison comparison = compare(model, lotSize, average, ltpdPoint, beta);
        SavedPlan saved = save(request, model, lotSize, plan, ltpdPoint, beta);
        return new Result(request, model, found, ltpd5, comparison, saved, null);
    }

    /** The double plan under the LTPD protection, beside the single least-inspection plan. */
    private static Result runDouble(Request request, OcModel model, int lotSize, LeastInspectionDesigner.Result single,
            LongConsumer plansEvaluated) {
        LeastInspectionDoubleSearch.Result found;
        try {
            found = new LeastInspectionDoubleSearch(model, lotSize).forLtpd(request.ltpd(), request.beta(),
                    request.processAverage(), plansEvaluated);
        } catch (LeastInspectionDoubleSearch.OverBudget e) {
            throw new JobException(JobException.Kind.NO_PLAN, "scheme", "--scheme double: " + e.getMessage()
                    + "; use the single plan");
        }
        double singleLtpd5 = single.inspectEveryUnit() ? Double.NaN
                : new lotgate.sampling.OperatingCharacteristic(single.plan(), model, lotSize).qualityAt(0.05);
        if (found.inspectEveryUnit()) {
            if (request.save() != null) {
                throw new JobException(JobException.Kind.INVALID_REQUEST, "save", "--save: no double plan inspects"
                        + " fewer units on average than screening every unit of the lot, so there is no plan to save");
            }
            return new Result(request, model, single, singleLtpd5, null, null, new DoubleFound(found, Double.NaN));
        }
        DoublePlan plan = found.plan();
        double ltpd5 = new lotgate.sampling.OperatingCharacteristic(plan, model, lotSize).qualityAt(0.05);
        SavedPlan saved = save(request, model, lotSize, plan, request.ltpd(), request.beta());
        return new Result(request, model, single, singleLtpd5, null, saved, new DoubleFound(found, ltpd5));
    }

    /** Saves the plan when asked, with the process average and the LTPD as its design points. */
    private static SavedPlan save(Request request, OcModel model, int lotSize, lotgate.sampling.Plan plan,
            double ltpdPoint, double beta) {
        if (request.save() == null) {
            return null;
        }
        double average = request.processAverage();
        RiskPoints points;
        try {
            points = new RiskPoints(average, Math.max(plan.rejection(model, model.producerPoint(average)), 1e-300),
                    ltpdPoint, beta);
        } catch (IllegalArgumentException e) {
            throw JobException.invalid("save", "--save: the plan cannot be saved: " + e.getMessage());
        }
        return request.save().save((name, now) -> PlanFormat.seal(name, request.save().description(), now, plan,
                model, lotSize, points, SavedPlan.LEAST_INSPECTION));
    }

    private static Comparison compare(OcModel model, int lotSize, double average, double ltpd, double beta) {
        if (average >= ltpd) {
            return null;
        }
        SingleDesign design = new SinglePlanDesigner(model, lotSize).design(new RiskPoints(average, COMPARISON_ALPHA,
                ltpd, beta));
        if (!(design instanceof SingleDesign.Found plain) || plain.plan().n() >= lotSize) {
            return null;
        }
        SinglePlan plan = plain.plan();
        var oc = new lotgate.sampling.OperatingCharacteristic(plan, model, lotSize);
        return new Comparison(plan, ltpd, plan.averageTotalInspection(model, average, lotSize), oc.aoql().limit());
    }
}
