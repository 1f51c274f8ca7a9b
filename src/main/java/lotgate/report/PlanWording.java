package lotgate.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.plan.Measurement;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.MultiplePlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.Stage;
import lotgate.sampling.VariablesPlan;

/** A plan's numbers in a few words, the same in every output: "n = 132, c = 3", "n1 = 50, c1 = 1, ...". */
public final class PlanWording {
    private PlanWording() {
    }

    /** The plan's numbers on one line. */
    public static String brief(Plan plan) {
        if (plan instanceof SinglePlan single) {
            return "n = " + single.n() + ", c = " + single.c() + (single.hasGap() ? ", Re = " + single.rejectionNumber()
                    : "");
        }
        if (plan instanceof DoublePlan twice) {
            return "n1 = " + twice.n1() + ", c1 = " + twice.c1() + ", r1 = " + twice.r1() + "; n2 = " + twice.n2()
                    + ", c2 = " + twice.c2();
        }
        if (plan instanceof MultiplePlan multiple) {
            List<String> stages = new ArrayList<>();
            for (Stage stage : multiple.stages()) {
                stages.add(stage.n() + "/" + acceptance(stage.c()) + "/" + stage.r());
            }
            return multiple.stages().size() + " stages n/c/r " + String.join(", ", stages);
        }
        if (plan instanceof VariablesPlan variables) {
            return String.format(Locale.ROOT, "n = %d, k = %.4f, sigma %s", variables.n(), variables.k(),
                    variables.sigmaKnown() ? "known" : "unknown");
        }
        SequentialPlan sequential = (SequentialPlan) plan;
        return String.format(Locale.ROOT, "item by item, h1 = %.4g, h2 = %.4g, s = %.4g, truncated at %d",
                sequential.h1(), sequential.h2(), sequential.slope(), sequential.truncation());
    }

    /** An acceptance number, or "none" for a stage that cannot accept. */
    public static String acceptance(int c) {
        return c == Stage.NO_ACCEPTANCE ? "none" : String.valueOf(c);
    }

    /** The kind of plan in words. */
    public static String kind(Plan plan) {
        return switch (plan.scheme()) {
            case "double" -> "Double sampling plan";
            case "multiple" -> "Multiple sampling plan";
            case "sequential" -> "Sequential plan (item by item)";
            case "variables" -> "Variables plan (k-method)";
            default -> "Single sampling plan";
        };
    }

    /** The OC model in words, with the lot size where one is given. */
    public static String model(OcModel model, int lotSize) {
        return switch (model.name()) {
            case "hypergeometric" -> "hypergeometric model (type A: an isolated lot of " + lotSize + " units)";
            case "poisson" -> "Poisson model (nonconformities per unit)"
                    + (lotSize > 0 ? ", lot size " + lotSize : "");
            default -> "binomial model (type B: units from a steady process)"
                    + (lotSize > 0 ? ", lot size " + lotSize : "");
        };
    }

    /** The model in words; for a variables plan, what its quality means. */
    public static String model(Plan plan, OcModel model, int lotSize) {
        if (plan instanceof VariablesPlan) {
            return "variables plan: quality is the fraction beyond the limit(s) of normal measurements (type B)"
                    + (lotSize > 0 ? ", lot size " + lotSize : "");
        }
        return model(model, lotSize);
    }

    /** What a count of the model counts, singular or plural. */
    public static String counted(OcModel model, long count) {
        if (model.countsUnits()) {
            return count == 1 ? "nonconforming unit" : "nonconforming units";
        }
        return count == 1 ? "nonconformity" : "nonconformities";
    }

    /** The first unit after which a count accepts the lot, or 0 if it never does (acceptance numbers never fall). */
    public static int firstUnitAccepting(SequentialPlan plan, long count) {
        for (int m = 1; m <= plan.truncation(); m++) {
            if (plan.acceptanceNumber(m) >= count) {
                return m;
            }
        }
        return 0;
    }

    /** The last unit up to which a count rejects the lot, or 0 if it never does (rejection numbers never fall). */
    public static int lastUnitRejecting(SequentialPlan plan, long count) {
        int last = 0;
        for (int m = 1; m <= plan.truncation() && plan.rejectionNumber(m) <= count; m++) {
            last = m;
        }
        return last;
    }

    /** The fewest units a plan can inspect: its first stage, or the first unit that can accept or reject. */
    public static int fewestInspected(Plan plan) {
        if (plan instanceof VariablesPlan variables) {
            return variables.n();
        }
        if (plan instanceof SequentialPlan sequential) {
            int first = firstUnitAccepting(sequential, 0);
            return Math.min(first > 0 ? first : sequential.truncation(), sequential.rejectionNumber(1));
        }
        return lotgate.sentencing.Stopping.stages(plan).get(0).n();
    }

    private static String number(double value) {
        return String.format(Locale.ROOT, "%.6g", value).replaceAll("(\\.\\d*?)0+$", "$1").replaceAll("\\.$", "");
    }

    /** What is measured, in one line: "bore diameter in mm, limits 9.95 to 10.05, sigma 0.012 known". */
    public static String measurement(Measurement measurement) {
        String what = measurement.characteristic().isEmpty() ? "measurements" : measurement.characteristic();
        String unit = measurement.unit().isEmpty() ? "" : " " + measurement.unit();
        String limits = measurement.twoLimits() ? "limits " + number(measurement.lower()) + " to "
                + number(measurement.upper()) + unit + " (" + measurement.limits() + ")"
                : measurement.lower() != null ? "lower limit " + number(measurement.lower()) + unit
                        : "upper limit " + number(measurement.upper()) + unit;
        String own = measurement.lowerDesign() == null ? "" : String.format(Locale.ROOT, ", the lower limit held to its"
                + " own AQL %s and LTPD %s (k = %.4f)", Percent.level(measurement.lowerDesign().designedFor().aql()),
                Percent.level(measurement.lowerDesign().designedFor().ltpd()), measurement.lowerDesign().k());
        return what + ", " + limits + own + ", " + (measurement.sigmaKnown() ? "sigma " + number(measurement.sigma())
                + unit + " known" : "sigma unknown (estimated by each sample's s)");
    }

    /** A variables plan's acceptance rule in words. */
    public static List<String> rule(VariablesPlan plan, Measurement measurement) {
        String deviation = plan.sigmaKnown() ? "sigma" : "s";
        List<String> lines = new ArrayList<>();
        lines.add(String.format(Locale.ROOT, "Measure n = %d units; compute their mean%s.", plan.n(),
                plan.sigmaKnown() ? "" : " and standard deviation s"));
        String k = String.format(Locale.ROOT, "k = %.4f", plan.k());
        switch (measurement.limits()) {
            case Measurement.COMBINED -> lines.add(String.format(Locale.ROOT, "Accept the lot when the estimated fraction"
                    + " beyond both limits (M-method, from (U - mean)/%s and (mean - L)/%s) is at most M = %s.",
                    deviation, deviation, Percent.probability(plan.maxEstimate())));
            case Measurement.SEPARATE -> lines.add(measurement.lowerDesign() == null
                    ? "Accept the lot when both (U - mean)/" + deviation + " and (mean - L)/" + deviation
                            + " are at least " + k + "."
                    : String.format(Locale.ROOT, "Accept the lot when (U - mean)/%s is at least k = %.4f and (mean - L)/%s"
                            + " at least k = %.4f.", deviation, plan.k(), deviation, measurement.lowerDesign().k()));
            default -> lines.add("Accept the lot when " + (measurement.upper() != null ? "(U - mean)/" : "(mean - L)/")
                    + deviation + " is at least " + k + "; reject it otherwise.");
        }
        return lines;
    }
}
