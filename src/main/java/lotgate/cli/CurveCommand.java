package lotgate.cli;

import java.nio.file.Path;
import lotgate.jobs.EvaluatePlan;
import lotgate.report.results.CurveRendering;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Tabulates and draws a plan's OC, AOQ and ATI curves with their key quality levels. */
@Command(name = "curve", header = "Tabulate and draw a plan's OC, AOQ, ATI and ASN curves.",
        description = {
                "Shows a plan's operating characteristics over a range of incoming quality levels: P(accept)"
                        + " (the OC curve), AOQ, and ATI when the lot size is known; the quality levels at"
                        + " P(accept) = 95%%, 50%% (indifference quality) and 10%%; and the AOQL. For double, multiple"
                        + " and sequential plans also the ASN (average sample number), and for a sequential plan"
                        + " Wald's approximate P(accept) and ASN beside the exact values of the truncated plan.",
                "",
                "Give a saved plan file, or the plan as --sample-size and --acceptance with a model.",
                ""})
final class CurveCommand implements Runnable {
    @Override
    public void run() {
        EvaluatePlan.ChartFiles drawn = charts.files();
        format.outputs(drawn.all(), drawn.oc(), drawn.aoq(), drawn.ati(), drawn.asn());
        format.print(EvaluatePlan.run(new EvaluatePlan.Request(planFile, defectClass, sampleSize.n, acceptance.c,
                models.named(), models.lotSize(), marked.aql.level, marked.ltpd.level, upTo, steps, drawn,
                curtailed.on)), CurveRendering::text, CurveRendering::json, CurveRendering::csv);
        format.written("OC, AOQ and ATI chart", drawn.all(), "OC chart", drawn.oc(), "AOQ chart", drawn.aoq(),
                "ATI chart", drawn.ati(), "ASN chart", drawn.asn());
    }

    @Parameters(index = "0", arity = "0..1", paramLabel = "PLAN", description = "A saved plan file (plans/*.json).")
    Path planFile;

    @Mixin
    SharedOptions.SampleSize sampleSize;

    @Mixin
    SharedOptions.Acceptance acceptance;

    @Mixin
    ModelOptions models;

    @Option(names = "--class", paramLabel = "CLASS",
            description = "For a plan with criteria per defect class: the class to show (critical, major, minor).")
    String defectClass;

    @Mixin
    MarkedLevels marked;

    @Option(names = "--up-to", paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "Highest incoming quality in the table and charts (default: a round level just past"
                    + " where P(accept) falls to 1%% and past 1.25 times the LTPD, at most 100%%).")
    Double upTo;

    @Option(names = "--steps", paramLabel = "K", defaultValue = "20", converter = Values.Steps.class,
            description = "Number of equal steps in the table, 1 to 10000 (default ${DEFAULT-VALUE}).")
    int steps;

    @Mixin
    Charts charts;

    @Mixin
    SharedOptions.Curtailed curtailed;

    @Mixin
    OutputFormat format;

    /** The charts the command draws: the curves stacked, or each alone. */
    static final class Charts {
        @Mixin
        SharedOptions.CurvesChart all;

        @Mixin
        SharedOptions.OcChart oc;

        @Option(names = "--aoq-chart", paramLabel = "FILE", description = "Draw the AOQ curve alone; .png or .svg.")
        Path aoq;

        @Option(names = "--ati-chart", paramLabel = "FILE",
                description = "Draw the ATI curve alone (needs a lot size); .png or .svg.")
        Path ati;

        @Mixin
        SharedOptions.AsnChart asn;

        EvaluatePlan.ChartFiles files() {
            return new EvaluatePlan.ChartFiles(all.file(), oc.file, aoq, ati, asn.file);
        }
    }
}
