package lotgate.cli;

import java.util.List;
import lotgate.jobs.ComparePlans;
import lotgate.report.results.CompareRendering;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

/** Puts several plans side by side: their risks at the same AQL and LTPD, key levels, and one OC chart. */
@Command(name = "compare", header = "Compare plans side by side, on one OC chart and one ASN chart.",
        description = {
                "Compares plans at the same quality levels: P(accept) at the AQL and the LTPD, the producer's and"
                        + " consumer's risks there, the quality levels at 95%%, 50%% and 10%% acceptance, and the"
                        + " AOQL, and what each costs: the average sample number (ASN) at the AQL and the LTPD and the"
                        + " most units it can inspect. Each PLAN is a saved plan file of any kind (single, double,"
                        + " multiple, sequential) or a single plan written as n,c (such as 45,0), under --model.",
                ""})
final class CompareCommand implements Runnable {
    @Override
    public void run() {
        format.outputs(chart.file(), asnChart.file);
        format.print(ComparePlans.run(new ComparePlans.Request(plans, models.named(), models.lotSize(),
                marked.aql.level, marked.ltpd.level, chart.file(), asnChart.file)), CompareRendering::text,
                CompareRendering::json, CompareRendering::csv);
        format.written("OC chart", chart.file(), "ASN chart", asnChart.file);
    }

    @Parameters(arity = "1..*", paramLabel = "PLAN", description = "Two or more plans: plans/*.json files or n,c.")
    List<String> plans;

    @Mixin
    ModelOptions models;

    @Mixin
    MarkedLevels marked;

    @Mixin
    SharedOptions.OcCurvesChart chart;

    @Mixin
    SharedOptions.AsnChart asnChart;

    @Mixin
    OutputFormat format;
}
