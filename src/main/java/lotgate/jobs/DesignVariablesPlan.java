package lotgate.jobs;

import lotgate.plan.Measurement;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.Percent;
import lotgate.sampling.OcModel;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SingleDesign;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.SinglePlanDesigner;
import lotgate.sampling.VariablesDesigner;
import lotgate.sampling.VariablesPlan;

/**
 * Designing a k-method plan for a measured characteristic (sigma known or unknown), or evaluating a given (n, k),
 * beside the attribute plan for the same risks.
 */
public final class DesignVariablesPlan {

    /**
     * The risks (levels may be null when not given), the limits, a known sigma (or null), how two limits are
     * judged (null: combined), what is measured and its unit, the lower limit's own AQL and LTPD (or null), a
     * given plan's n and k (or null), and where to save (or null).
     */
    public record Request(OcModel model, int lotSize, Double aql, double alpha, Double ltpd, double beta, Double lower,
            Double upper, Double sigma, String limits, String characteristic, String unit, Double lowerAql,
            Double lowerLtpd, Integer sampleSize, Double k, SaveTarget save) {
    }

    /**
     * The design (or given plan) with its measurement, the lower limit's own design (or null), the design with
     * sigma known, the attribute plan for the same risks (or null), the plan as saved (or null), and why no plan
     * meets the request (or null).
     */
    public record Result(Request request, RiskPoints points, Measurement measurement, VariablesDesigner.Design design,
            VariablesDesigner.Design lowerDesign, VariablesDesigner.Design known, SinglePlan single, SavedPlan saved,
            String noPlanReason) {
        /** Whether the plan was given rather than designed. */
        public boolean given() {
            return Double.isNaN(design.lowestK());
        }
    }

    private DesignVariablesPlan() {
    }

    /** Checks the request, designs or evaluates the plan, and saves it if asked. */
    public static Result run(Request request) {
        OcModel model = request.model();
        int lotSize = request.lotSize();
        Measurement measurement = measurement(request);
        RiskPoints points = Checks.points(model, request.aql(), request.alpha(), request.ltpd(), request.beta(),
                "give --aql and --ltpd: the fractions beyond the limit(s) that should pass and fail");
        if (request.save() != null) {
            request.save().check();
        }
        RiskPoints lowerPoints = lowerPoints(request, points, measurement);
        Integer sampleSize = request.sampleSize();
        Double k = request.k();
        boolean given = sampleSize != null || k != null;
        if (given && (sampleSize == null || k == null || !Double.isFinite(k))) {
            throw JobException.invalid(sampleSize == null ? "sampleSize" : "k", "give both --sample-size N and --k K"
                    + " to evaluate a variables plan you already have");
        }
        if (given && lowerPoints != null) {
            throw JobException.invalid("lowerAql", "--lower-aql and --lower-ltpd shape a design; a given plan"
                    + " (--sample-size, --k) has one k");
        }
        if (given && sampleSize < (measurement.sigmaKnown() ? 1 : 2)) {
            throw JobException.invalid("sampleSize", "--sample-size " + sampleSize + ": a variables plan with sigma"
                    + " unknown needs at least 2 units");
        }
        VariablesDesigner.Design design = given
                ? VariablesDesigner.evaluate(points, new VariablesPlan(sampleSize, k, measurement.sigmaKnown()))
                : VariablesDesigner.design(points, measurement.sigmaKnown());
        VariablesDesigner.Design lowerDesign = null;
        if (lowerPoints != null && design != null) {
            // Both limits share one sample: the larger n, with each limit's k in its own range there.
            lowerDesign = VariablesDesigner.design(lowerPoints, measurement.sigmaKnown());
            for (int round = 0; round < 100 && lowerDesign != null && design != null
                    && lowerDesign.plan().n() != design.plan().n(); round++) {
                int n = Math.max(lowerDesign.plan().n(), design.plan().n());
                design = VariablesDesigner.design(points, measurement.sigmaKnown(), n);
                lowerDesign = VariablesDesigner.design(lowerPoints, measurement.sigmaKnown(), n);
            }
            if (lowerDesign == null) {
                design = null;
            } else {
                measurement = new Measurement(measurement.characteristic(), measurement.lower(), measurement.upper(),
                        measurement.unit(), measurement.sigma(), measurement.limits(),
                        new Measurement.LimitDesign(lowerPoints, lowerDesign.plan().k()));
            }
        }
        if (design == null) {
            return new Result(request, points, measurement, null, null, null, null, null, "no variables plan with at"
                    + " most " + VariablesDesigner.MOST_UNITS + " units meets both risks");
        }
        VariablesPlan plan = design.plan();
        if (measurement.limits().equals(Measurement.COMBINED) && plan.n() < (plan.sigmaKnown() ? 2 : 3)) {
            throw JobException.invalid("limits", "the M-method needs at least " + (plan.sigmaKnown() ? 2 : 3)
                    + " units; these risks give n = " + plan.n() + ": use --limits separate");
        }
        if (lotSize > 0 && plan.n() > lotSize) {
            throw JobException.invalid("lotSize", "the plan measures " + plan.n() + " units, more than --lot-size "
                    + lotSize);
        }
        SingleDesign attribute = new SinglePlanDesigner(model, lotSize).design(points);
        SinglePlan single = attribute instanceof SingleDesign.Found found ? found.plan() : null;
        VariablesDesigner.Design known = measurement.sigmaKnown() && !given ? design
                : VariablesDesigner.design(points, true);
        SavedPlan saved = null;
        if (request.save() != null) {
            Measurement measured = measurement;
            String method = given ? SavedPlan.GIVEN : SavedPlan.SMALLEST_SAMPLE;
            saved = request.save().save((name, now) -> PlanFormat.seal(name, request.save().description(), now, plan,
                    model, lotSize, points, method, measured));
        }
        return new Result(request, points, measurement, design, lowerDesign, known, single, saved, null);
    }

    private static Measurement measurement(Request request) {
        OcModel model = request.model();
        Double lower = request.lower();
        Double upper = request.upper();
        Double sigma = request.sigma();
        if (!model.countsUnits() || model instanceof OcModel.Hypergeometric) {
            throw JobException.invalid("model", "--model " + model.name() + ": a variables plan judges the fraction"
                    + " of a steady process beyond its limits (type B); leave out --model");
        }
        if (lower == null && upper == null) {
            throw JobException.invalid("lower", "--scheme variables needs a specification limit: give --lower,"
                    + " --upper or both");
        }
        for (Double limit : new Double[] {lower, upper, sigma}) {
            if (limit != null && !Double.isFinite(limit)) {
                throw JobException.invalid(limit == sigma ? "sigma" : "lower", "the limits and --sigma must be"
                        + " numbers");
            }
        }
        if (lower != null && upper != null && !(lower < upper)) {
            throw JobException.invalid("lower", "--lower " + lower + " must be below --upper " + upper);
        }
        if (sigma != null && !(sigma > 0)) {
            throw JobException.invalid("sigma", "--sigma " + sigma + ": the known process standard deviation must"
                    + " be above 0");
        }
        boolean two = lower != null && upper != null;
        String limits;
        if (!two) {
            if (request.limits() != null) {
                throw JobException.invalid("limits", "--limits is for plans with both --lower and --upper");
            }
            limits = Measurement.ONE;
        } else if (request.limits() == null || request.limits().equals(Measurement.COMBINED)) {
            limits = Measurement.COMBINED;
        } else if (request.limits().equals(Measurement.SEPARATE)) {
            limits = Measurement.SEPARATE;
        } else {
            throw JobException.invalid("limits", "--limits " + request.limits() + ": give combined or separate");
        }
        return new Measurement(request.characteristic() == null ? "" : request.characteristic().trim(), lower, upper,
                request.unit() == null ? "" : request.unit().trim(), sigma, limits);
    }

    /** The lower limit's own design points, or null when it shares the plan's. */
    private static RiskPoints lowerPoints(Request request, RiskPoints points, Measurement measurement) {
        if (request.lowerAql() == null && request.lowerLtpd() == null) {
            return null;
        }
        if (!measurement.limits().equals(Measurement.SEPARATE)) {
            throw JobException.invalid("lowerAql", "--lower-aql and --lower-ltpd give the lower limit a design of"
                    + " its own: add --limits separate (with both --lower and --upper)");
        }
        double aql = request.lowerAql() != null ? request.lowerAql() : points.aql();
        double ltpd = request.lowerLtpd() != null ? request.lowerLtpd() : points.ltpd();
        Checks.level(request.model(), "--lower-aql", aql);
        Checks.level(request.model(), "--lower-ltpd", ltpd);
        if (aql >= ltpd) {
            throw JobException.invalid("lowerAql", "the lower limit's AQL " + Percent.level(aql) + " must be below"
                    + " its LTPD " + Percent.level(ltpd));
        }
        return new RiskPoints(aql, points.alpha(), ltpd, points.beta());
    }
}
