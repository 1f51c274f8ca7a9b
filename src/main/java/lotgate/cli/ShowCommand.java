package lotgate.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.sampling.SinglePlan;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** Checks a saved plan file (format, ranges, fingerprint, recorded risks) and prints what it says. */
@Command(name = "show", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
        header = "Check a saved plan file and print what it says.",
        description = {"Checks a saved plan file (format, ranges, fingerprint, recorded risks) and prints the plan,"
                + " what it was designed for, what it achieves and its fingerprint. A changed or inconsistent file"
                + " is refused (exit code 3).", ""})
final class ShowCommand implements Runnable {

    @Parameters(index = "0", paramLabel = "PLAN", description = "A saved plan file (plans/*.json).")
    Path planFile;

    @Mixin
    OutputFormat format;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        SavedPlan saved = PlanFormat.read(planFile);
        SinglePlan plan = (SinglePlan) saved.plan();
        PrintWriter out = spec.commandLine().getOut();
        switch (format.kind) {
            case json -> {
                ObjectNode node = Json.object();
                node.put("file", planFile.toString());
                node.put("valid", true);
                node.put("name", saved.name());
                node.put("description", saved.description());
                node.put("created", saved.created().toString());
                node.put("scheme", plan.scheme());
                node.put("model", saved.model().name());
                node.put("n", plan.n());
                node.put("c", plan.c());
                if (saved.lotSize() > 0) {
                    node.put("lotSize", saved.lotSize());
                }
                node.put("aql", saved.designedFor().aql());
                node.put("alpha", saved.designedFor().alpha());
                node.put("ltpd", saved.designedFor().ltpd());
                node.put("beta", saved.designedFor().beta());
                node.put("method", saved.method());
                node.put("producerRisk", saved.achieved().producerRisk());
                node.put("consumerRisk", saved.achieved().consumerRisk());
                node.put("fingerprint", saved.fingerprint());
                out.println(Json.text(node));
            }
            case csv -> out.print(Csv.table(
                    java.util.List.of("file", "name", "model", "n", "c", "lotSize", "producerRisk", "consumerRisk",
                            "fingerprint"),
                    java.util.List.of(java.util.List.of(planFile.toString(), saved.name(), saved.model().name(),
                            plan.n(), plan.c(), saved.lotSize() > 0 ? saved.lotSize() : "",
                            saved.achieved().producerRisk(), saved.achieved().consumerRisk(), saved.fingerprint()))));
            case text -> {
                out.println("Plan file " + planFile + ": valid (format version " + PlanFormat.VERSION + ")");
                out.println("  name         " + saved.name());
                if (!saved.description().isBlank()) {
                    out.println("  description  " + saved.description());
                }
                out.println("  created      " + saved.created());
                out.println("  plan         n = " + plan.n() + ", c = " + plan.c() + " (reject at "
                        + plan.rejectionNumber() + ")");
                out.println("  model        " + DesignCommand.modelLine(saved.model(), saved.lotSize()));
                out.println("  designed for AQL " + Percent.level(saved.designedFor().aql()) + " with alpha "
                        + Percent.level(saved.designedFor().alpha()) + ", LTPD " + Percent.level(saved.designedFor().ltpd())
                        + " with beta " + Percent.level(saved.designedFor().beta()) + " (" + saved.method() + ")");
                out.println("  achieves     producer's risk " + Percent.probability(saved.achieved().producerRisk())
                        + ", consumer's risk " + Percent.probability(saved.achieved().consumerRisk()));
                out.println("  fingerprint  " + saved.fingerprint());
            }
        }
        out.flush();
    }
}
