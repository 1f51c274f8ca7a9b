package lotgate.sentencing;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntToLongFunction;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.MultiplePlan;
import lotgate.sampling.Plan;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.Stage;

/**
 * Where a plan stops on a sample recorded in inspection order: at the single sample, at the first stage of a
 * double or multiple plan whose numbers decide, or after the unit at which a sequential plan's count crosses
 * a line; or nowhere yet, with how many more units to inspect.
 */
public final class Stopping {
    private Stopping() {
    }

    public enum Verdict {
        ACCEPT, REJECT, CONTINUE
    }

    /**
     * @param inspected        the units the verdict rests on (the prefix of the sample up to the stopping point)
     * @param found            the count found in them
     * @param acceptanceNumber the largest count that accepts there ({@link Stage#NO_ACCEPTANCE} where none does)
     * @param rejectionNumber  the smallest count that rejects there
     * @param step             where the plan stopped, in words: "first sample", "stage 3 of 5", "unit 47"
     * @param moreUnits        for CONTINUE, the units of the next stage (1 for a sequential plan); else 0
     */
    public record Point(Verdict verdict, int inspected, long found, int acceptanceNumber, int rejectionNumber,
            String step, int moreUnits) {
    }

    /** The sample sizes at which the plan may stop: its stage boundaries, or every unit for a sequential plan. */
    public static List<Integer> boundaries(Plan plan) {
        List<Integer> sizes = new ArrayList<>();
        if (plan instanceof SequentialPlan) {
            return sizes;
        }
        int total = 0;
        for (Stage stage : stages(plan)) {
            total += stage.n();
            sizes.add(total);
        }
        return sizes;
    }

    /** The stages of a single, double or multiple plan. */
    public static List<Stage> stages(Plan plan) {
        if (plan instanceof SinglePlan single) {
            return List.of(new Stage(single.n(), single.c(), single.rejectionNumber()));
        }
        if (plan instanceof DoublePlan twice) {
            return twice.stages();
        }
        if (plan instanceof MultiplePlan multiple) {
            return multiple.stages();
        }
        throw new IllegalArgumentException("a sequential plan has no stages");
    }

    /**
     * Applies the plan to the first units of a sample.
     *
     * @param units   the units recorded: for plans in stages a stage boundary, or a point inside a stage where the
     *                count already reaches the stage's rejection number; any number for a sequential plan
     * @param countAt the count found in the first m units
     */
    public static Point at(Plan plan, int units, IntToLongFunction countAt) {
        if (plan instanceof SequentialPlan sequential) {
            return sequential(sequential, units, countAt);
        }
        List<Stage> stages = stages(plan);
        int total = 0;
        for (int i = 0; i < stages.size(); i++) {
            Stage stage = stages.get(i);
            total += stage.n();
            String step = stepName(plan, i, stages.size());
            if (total > units) {
                // Inside a stage only a rejection can be certain: the count never falls (curtailed inspection).
                long sofar = countAt.applyAsLong(units);
                if (sofar >= stage.r()) {
                    return new Point(Verdict.REJECT, units, sofar, stage.c(), stage.r(), step + ", curtailed", 0);
                }
                throw new IllegalArgumentException("the sample ends inside the " + step + ", at unit " + units
                        + " of " + total);
            }
            long found = countAt.applyAsLong(total);
            if (found <= stage.c()) {
                return new Point(Verdict.ACCEPT, total, found, stage.c(), stage.r(), step, 0);
            }
            if (found >= stage.r()) {
                return new Point(Verdict.REJECT, total, found, stage.c(), stage.r(), step, 0);
            }
            if (i == stages.size() - 1) {
                // A reduced plan of the tables (Re > Ac + 1): a count between them accepts the lot, and the
                // verdict's count above its acceptance number tells the switching rules to reinstate normal.
                return new Point(Verdict.ACCEPT, total, found, stage.c(), stage.r(), step, 0);
            }
            if (total == units) {
                return new Point(Verdict.CONTINUE, total, found, stage.c(), stage.r(), step, stages.get(i + 1).n());
            }
        }
        throw new IllegalStateException("the last stage decides every lot");
    }

    private static String stepName(Plan plan, int index, int count) {
        if (plan instanceof SinglePlan) {
            return "the sample";
        }
        if (plan instanceof DoublePlan) {
            return index == 0 ? "first sample" : "second sample";
        }
        return "stage " + (index + 1) + " of " + count;
    }

    private static Point sequential(SequentialPlan plan, int units, IntToLongFunction countAt) {
        int last = Math.min(units, plan.truncation());
        for (int m = 1; m <= last; m++) {
            long found = countAt.applyAsLong(m);
            SequentialPlan.Step step = plan.step(m, found);
            if (step != SequentialPlan.Step.CONTINUE) {
                return new Point(step == SequentialPlan.Step.ACCEPT ? Verdict.ACCEPT : Verdict.REJECT, m, found,
                        plan.acceptanceNumber(m), plan.rejectionNumber(m), "unit " + m, 0);
            }
        }
        long found = countAt.applyAsLong(last);
        return new Point(Verdict.CONTINUE, last, found, plan.acceptanceNumber(last), plan.rejectionNumber(last),
                "unit " + last, 1);
    }

    /**
     * For a sequential plan that has not decided after m units with the given count: the unit after which the
     * lot is accepted if no further nonconformity is found.
     */
    public static int acceptanceIfClean(SequentialPlan plan, int m, long found) {
        int unit = m + 1;
        while (unit < plan.truncation() && plan.acceptanceNumber(unit) < found) {
            unit++;
        }
        return unit;
    }
}
