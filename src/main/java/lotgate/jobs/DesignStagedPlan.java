package lotgate.jobs;

import java.util.List;
import java.util.function.Supplier;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.Percent;
import lotgate.sampling.DoubleDesign;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.DoublePlanDesigner;
import lotgate.sampling.MultiplePlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.SequentialPlanDesigner;
import lotgate.sampling.SingleDesign;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.SinglePlanDesigner;
import lotgate.sampling.Stage;
import lotgate.sampling.WaldSequential;

/**
 * Designing a double plan (smallest ASN) or a sequential plan (Wald's lines), or evaluating given stages of a
 * double or multiple plan, beside the single plan for the same risks.
 */
public final class DesignStagedPlan {
    /** The kinds of plan this job handles. */
    public enum Scheme { DOUBLE, MULTIPLE, SEQUENTIAL }

    /**
     * The risks (a level may be null when not given), given stages (empty: design), the double-plan search space
     * and ASN level (null: the AQL), the sequential truncation (null: 3 times the single n), whether to keep Wald's
     * lines as asked, whether to show the curtailed ASN, and where to save (or null).
     */
    public record Request(Scheme scheme, OcModel model, int lotSize, Double aql, double alpha, Double ltpd,
            double beta, List<Stage> stages, DoublePlanDesigner.Space space, Double asnAt, Integer truncateAt,
            boolean plainWald, boolean curtailed, SaveTarget save) {
        public Request {
            stages = List.copyOf(stages);
        }
    }

    /**
     * The plan with how it was obtained, its exact risks, the plans the search evaluated, the single plan for the
     * same risks (or null), the level the ASN was minimised at, the plan as saved (or null), and why no plan
     * meets the request (or null, then plan and risks are set).
     */
    public record Result(Request request, RiskPoints points, Plan plan, String method, PlanRisks risks,
            long candidates, SinglePlan single, double asnLevel, SavedPlan saved, String noPlanReason) {
        /** Wald's test whose lines a sequential plan has: the nominal risks they were drawn for. */
        public WaldSequential lines() {
            SequentialPlan sequential = (SequentialPlan) plan;
            return WaldSequential.fromLines(points.aql(), points.ltpd(), !request.model().countsUnits(),
                    sequential.h1(), sequential.h2());
        }
    }

    private DesignStagedPlan() {
    }

    /** Checks the request, designs or evaluates the plan, sets it beside the single plan and saves it if asked. */
    public static Result run(Request request) {
        OcModel model = request.model();
        int lotSize = request.lotSize();
        String scheme = request.scheme().name().toLowerCase(java.util.Locale.ROOT);
        RiskPoints points = Checks.points(model, request.aql(), request.alpha(), request.ltpd(), request.beta(),
                "give --aql and --ltpd: the " + scheme + " plan is designed for them, or evaluated at them");
        if (request.save() != null) {
            request.save().check();
        }
        SingleDesign singleDesign = new SinglePlanDesigner(model, lotSize).design(points);
        SinglePlan single = singleDesign instanceof SingleDesign.Found found ? found.plan() : null;
        double asnLevel = model.producerPoint(points.aql());
        Plan plan;
        String method;
        long candidates = 0;
        List<Stage> stages = request.stages();
        switch (request.scheme()) {
            case DOUBLE -> {
                if (stages.isEmpty()) {
                    if (request.asnAt() != null) {
                        Checks.level(model, "--asn-at", request.asnAt());
                        asnLevel = request.asnAt();
                    }
                    DoubleDesign design = new DoublePlanDesigner(model, lotSize).design(points, request.space(),
                            asnLevel);
                    if (design instanceof DoubleDesign.NotFound none) {
                        return new Result(request, points, null, null, null, 0, single, asnLevel, null,
                                none.reason());
                    }
                    DoubleDesign.Found found = (DoubleDesign.Found) design;
                    plan = found.plan();
                    candidates = found.candidates();
                    method = SavedPlan.SMALLEST_ASN;
                } else {
                    if (stages.size() != 2 || stages.get(0).c() == Stage.NO_ACCEPTANCE) {
                        throw JobException.invalid("stages", "--scheme double takes two --stage options, the first"
                                + " with an acceptance number, e.g. --stage 50:1:4 --stage 100:3");
                    }
                    plan = given(() -> new DoublePlan(stages.get(0).n(), stages.get(0).c(), stages.get(0).r(),
                            stages.get(1).n(), stages.get(1).c()));
                    method = SavedPlan.GIVEN;
                }
            }
            case MULTIPLE -> {
                plan = given(() -> new MultiplePlan(stages));
                method = SavedPlan.GIVEN;
            }
            default -> {
                int truncation = truncation(request, single);
                if (request.plainWald()) {
                    plan = SequentialPlan.wald(WaldSequential.of(points, model), truncation);
                } else {
                    SequentialPlanDesigner designer = new SequentialPlanDesigner(model);
                    SequentialPlanDesigner.Design design = designer.design(points, truncation);
                    if (!design.met()) {
                        return new Result(request, points, null, null, null, 0, single, asnLevel, null,
                                unmetTruncation(designer, points, truncation, single, lotSize));
                    }
                    plan = design.plan();
                }
                method = SavedPlan.WALD;
            }
        }
        if (lotSize > 0 && plan.maxSampleSize() > lotSize) {
            throw JobException.invalid("lotSize", "the plan may inspect " + plan.maxSampleSize()
                    + " units, more than --lot-size " + lotSize);
        }
        SavedPlan saved = null;
        if (request.save() != null) {
            Plan designed = plan;
            String how = method;
            saved = request.save().save((name, now) -> PlanFormat.seal(name, request.save().description(), now,
                    designed, model, lotSize, points, how));
        }
        return new Result(request, points, plan, method, PlanRisks.of(plan, model, points), candidates, single,
                asnLevel, saved, null);
    }

    private static Plan given(Supplier<Plan> build) {
        try {
            return build.get();
        } catch (IllegalArgumentException e) {
            throw JobException.invalid("stages", "--stage: " + e.getMessage());
        }
    }

    /** Why the redrawn lines cannot meet both risks at this truncation, and the smallest one at which they do. */
    private static String unmetTruncation(SequentialPlanDesigner designer, RiskPoints points, int truncation,
            SinglePlan single, int lotSize) {
        String asked = "producer's risk " + Percent.level(points.alpha()) + " and consumer's risk "
                + Percent.level(points.beta());
        double least = designer.leastConsumerRisk(points, truncation);
        String why = least > points.beta()
                ? "no sequential plan truncated at " + truncation + " units can meet " + asked + ": even the best"
                        + " test of any kind on " + truncation + " units (Neyman-Pearson on the count) has a"
                        + " consumer's risk of " + Percent.probability(least) + " when its producer's risk is "
                        + Percent.level(points.alpha())
                : "Wald's lines, redrawn for smaller nominal risks, do not meet " + asked + " when truncated at "
                        + truncation + " units";
        int limit = Math.max(2 * truncation, single == null ? 0 : 3 * single.n());
        if (lotSize > 0) {
            limit = Math.min(limit, lotSize);
        }
        int smallest = designer.smallestTruncation(points, limit);
        return why + (smallest > 0 ? "; the smallest truncation at which lotgate's redrawn lines meet both is "
                + smallest + " units (--truncate-at " + smallest + ")"
                : "; no truncation up to " + limit + " units meets both");
    }

    private static int truncation(Request request, SinglePlan single) {
        int lotSize = request.lotSize();
        if (request.truncateAt() != null) {
            if (lotSize > 0 && request.truncateAt() > lotSize) {
                throw JobException.invalid("truncateAt", "--truncate-at " + request.truncateAt()
                        + " exceeds --lot-size " + lotSize);
            }
            return request.truncateAt();
        }
        if (single == null) {
            throw JobException.invalid("truncateAt", "no single plan meets these risks, so there is no default"
                    + " truncation point; give --truncate-at N");
        }
        long three = 3L * single.n();
        return (int) Math.min(lotSize > 0 ? lotSize : Integer.MAX_VALUE, three);
    }
}
