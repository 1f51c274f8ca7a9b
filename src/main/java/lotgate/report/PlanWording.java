package lotgate.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.MultiplePlan;
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
            return "n = " + single.n() + ", c = " + single.c();
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
}
