package lotgate.report.results;

import java.util.Locale;
import lotgate.jobs.InspectAtBench;
import lotgate.plan.SavedPlan;
import lotgate.report.PlanWording;
import lotgate.sampling.Plan;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.Stage;
import lotgate.sentencing.Stopping;

/** What the inspection bench says as text: the plan at the start, and where the plan stands after each unit. */
public final class BenchRendering {
    private BenchRendering() {
    }

    /** The plan applied and how to enter units (two lines). */
    public static String opening(InspectAtBench.Bench bench) {
        SavedPlan saved = bench.saved();
        return "Plan " + saved.name() + " (fingerprint " + saved.shortFingerprint() + "): "
                + PlanWording.brief(saved.plan()) + "\n"
                + "Enter each unit as inspected: " + (bench.countsUnits() ? "pass or fail" : "the number of"
                + " nonconformities") + ", then a defect type if you like (fail thread damage); 'undo' takes back the"
                + " last, 'quit' stops.\n";
    }

    /** The line after a unit: its number, result, the count so far, and the decision or how long to go on. */
    public static String afterUnit(InspectAtBench.State state) {
        String head = String.format(Locale.ROOT, "  unit %-5d %-5s found %-4d ", state.units(), state.countsUnits()
                ? (state.last().count() > 0 ? "fail" : "pass") : String.valueOf(state.last().count()), state.found());
        return head + standing(state) + "\n";
    }

    /** Where the plan stands after the last unit: the decision with its reason, or until when to inspect on. */
    public static String standing(InspectAtBench.State state) {
        Stopping.Point point = state.decision();
        if (point == null) {
            return "inspect on: " + until(state.plan(), state.units(), state.found());
        }
        return point.verdict() == Stopping.Verdict.ACCEPT
                ? "ACCEPT the lot (" + point.step() + ": " + state.found() + " is at most " + point.acceptanceNumber() + ")"
                : "REJECT the lot (" + point.step() + ": " + state.found() + " reaches " + point.rejectionNumber() + ")";
    }

    /** The line after 'undo'. */
    public static String takenBack(InspectAtBench.Bench before, InspectAtBench.Bench after) {
        return before.units().isEmpty() ? "  nothing to take back\n"
                : "  unit " + before.units().size() + " taken back; " + after.units().size() + " units entered\n";
    }

    /** What stopping before the plan decides means, in words. */
    public static String unfinished(int entered, Plan plan) {
        return "No decision: " + entered + " of up to " + plan.maxSampleSize() + " units entered. An unfinished"
                + " sample neither accepts nor rejects the lot: the plan decides only when its units are inspected.\n";
    }

    private static String until(Plan plan, int m, long found) {
        if (plan instanceof SequentialPlan sequential) {
            int clean = Stopping.acceptanceIfClean(sequential, m, found);
            return "accepted after unit " + clean + " if nothing more is found; rejected at "
                    + sequential.rejectionNumber(Math.min(m + 1, sequential.truncation())) + " found";
        }
        int total = 0;
        for (Stage stage : Stopping.stages(plan)) {
            total += stage.n();
            if (total > m) {
                return "this sample ends at unit " + total + (stage.c() == Stage.NO_ACCEPTANCE
                        ? " (it cannot accept; reject at " + stage.r() + ")"
                        : " (accept there with up to " + PlanWording.acceptance(stage.c()) + ", reject at "
                                + stage.r() + ")");
            }
        }
        return "";
    }
}
