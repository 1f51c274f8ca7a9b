package lotgate.cli;

import lotgate.jobs.DesignLeastInspection;
import lotgate.jobs.SaveTarget;
import lotgate.report.results.LeastInspectionRendering;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Designs the plan with the least average total inspection under an LTPD or AOQL protection (Dodge-Romig). */
@Command(name = "least-inspection", header = "Design the plan that inspects least on average, for rectifying"
        + " inspection.",
        description = {
                "For inspection with rectification (every rejected lot is screened 100%% and its nonconforming units"
                        + " replaced), finds the single plan with the least average total inspection ATI = n + (N - n)"
                        + " P(reject) at the supplier's process average, among the plans that protect lot quality"
                        + " (--ltpd: P(accept) at the LTPD at most --beta) or the average outgoing quality (--aoql: the"
                        + " AOQL at most the target). These are the plans Dodge and Romig tabled, computed exactly for"
                        + " the lot size (hypergeometric by default). --lot-size (up to 1,000,000) and"
                        + " --process-average are required.",
                "",
                "The plan 'design' gives for the same protection is shown beside it, with its ATI.",
                "",
                "--scheme double finds the double plan with the least ATI = n1 Pa1 + (n1 + n2) Pa2 + N (1 - Pa) under"
                        + " the --ltpd protection, in Dodge and Romig's family: n1 and n2 free (n1 + n2 at most N),"
                        + " c1 < c2, and the first sample rejects only when it finds more than c2 (r1 = c2 + 1). The"
                        + " single least-inspection plan is shown beside it, with the inspection the double plan"
                        + " saves.",
                ""})
final class LeastInspectionCommand implements Runnable {
    @Mixin
    ModelOptions models;

    @Mixin
    SharedOptions.Ltpd ltpd;

    @Mixin
    SharedOptions.ConsumerRisk beta;

    @Option(names = "--aoql", paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "Instead of --ltpd: the largest average outgoing quality allowed (e.g. 2%%).")
    Double aoql;

    @Option(names = {"-p", "--process-average"}, paramLabel = "LEVEL", converter = Values.Quality.class,
            description = "The supplier's usual quality (e.g. 0.5%%), where the inspection is counted.")
    Double processAverage;

    @Mixin
    SharedOptions.Scheme schemes;

    @ArgGroup(exclusive = false)
    DesignCommand.SaveOptions save;

    @Mixin
    OutputFormat format;

    @Override
    public void run() {
        SaveTarget target = DesignCommand.SaveOptions.target(save);
        format.outputs(save == null ? null : save.file);
        DesignLeastInspection.Request request = new DesignLeastInspection.Request(
                models.lotSize(), ltpd.level, beta.beta, aoql, processAverage, models.named(), target, schemes.name);
        DesignLeastInspection.Result result;
        try (Progress search = Progress.onTerminal("least-inspection: double plans evaluated", 0,
                format.kind == OutputFormat.Kind.text && request.isDouble())) {
            result = DesignLeastInspection.run(request, search::at);
        }
        format.print(result, LeastInspectionRendering::text, LeastInspectionRendering::json,
                LeastInspectionRendering::csv);
        format.written();
    }
}
