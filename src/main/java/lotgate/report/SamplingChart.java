package lotgate.report;

import java.util.Arrays;
import java.util.List;
import lotgate.inspection.InspectionSample;
import lotgate.inspection.Tally;
import lotgate.plan.DefectClass;
import lotgate.sampling.Plan;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.Stage;
import lotgate.sentencing.ClassVerdict;
import lotgate.sentencing.LotDecision;
import lotgate.sentencing.Stopping;
import org.jfree.chart.JFreeChart;

/**
 * The sampling chart of a sentenced lot: its count path against the plan's acceptance and rejection numbers,
 * as two lines for a sequential plan and as steps at the stage ends of a plan in stages.
 */
public final class SamplingChart {
    private SamplingChart() {
    }

    public static JFreeChart of(LotDecision decision) {
        ClassVerdict verdict = decision.sentence().classes().get(0);
        Plan plan = verdict.plan();
        InspectionSample sample = decision.sample();
        boolean units = decision.countsUnits();
        // A sequential plan is drawn to its truncation point, where its two boundaries meet.
        int shown = plan.maxSampleSize();
        double[] accept = new double[shown + 1];
        double[] reject = new double[shown + 1];
        double[] path = new double[verdict.inspected() + 1];
        Arrays.fill(accept, Double.NaN);
        Arrays.fill(reject, Double.NaN);
        Arrays.fill(path, Double.NaN);
        if (plan instanceof SequentialPlan sequential) {
            for (int m = 1; m <= shown; m++) {
                accept[m] = sequential.acceptanceNumber(m);
                reject[m] = sequential.rejectionNumber(m);
            }
            long count = 0;
            int[] sequence = sample.sequence();
            for (int m = 1; m <= verdict.inspected() && sequence != null && m <= sequence.length; m++) {
                count += units ? (sequence[m - 1] > 0 ? 1 : 0) : sequence[m - 1];
                path[m] = count;
            }
        } else {
            List<Stage> stages = Stopping.stages(plan);
            int total = 0;
            for (Stage stage : stages) {
                total += stage.n();
                accept[total] = stage.c();
                reject[total] = stage.r();
                if (total <= verdict.inspected()) {
                    Tally tally = total == sample.units() ? sample.all() : sample.tallies().get(total);
                    if (tally != null) {
                        path[total] = units ? tally.nonconformingUnits(DefectClass.ANY)
                                : tally.nonconformities(DefectClass.ANY);
                    }
                }
            }
        }
        String title = plan instanceof SequentialPlan ? "Sequential sampling chart" : "Sampling chart by stage";
        JFreeChart chart = Charts.sampling(title, units, accept, reject, path, plan instanceof SequentialPlan);
        return Charts.withSubtitle(chart, "lot " + decision.lot().lot() + ", plan " + decision.plan().name() + " ("
                + PlanWording.brief(plan) + "): " + decision.sentence().verdict() + " at " + verdict.step());
    }
}
