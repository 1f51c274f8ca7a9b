package lotgate.cli;

import lotgate.report.Percent;
import lotgate.report.Json;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lotgate.plan.ClassPlan;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.PlanWording;
import lotgate.sampling.Plan;
import lotgate.sampling.SinglePlan;
import lotgate.report.CsvTable;
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
        PrintWriter out = spec.commandLine().getOut();
        switch (format.kind) {
            case json -> out.println(Json.text(json(saved)));
            case csv -> out.print(csv(saved));
            case text -> printText(out, saved);
        }
        out.flush();
    }

    private ObjectNode json(SavedPlan saved) {
        ObjectNode node = Json.object();
        node.put("file", planFile.toString());
        node.put("valid", true);
        node.put("name", saved.name());
        node.put("description", saved.description());
        node.put("created", saved.created().toString());
        node.put("model", saved.model().name());
        if (saved.lotSize() > 0) {
            node.put("lotSize", saved.lotSize());
        }
        node.put("sampleSize", saved.sampleSize());
        if (saved.unclassified()) {
            putClass(node, saved.classes().get(0));
        } else {
            var list = node.putArray("classes");
            for (ClassPlan criteria : saved.classes()) {
                ObjectNode entry = list.addObject();
                entry.put("class", criteria.defectClass().label());
                putClass(entry, criteria);
            }
        }
        node.put("fingerprint", saved.fingerprint());
        return node;
    }

    private static void putClass(ObjectNode node, ClassPlan criteria) {
        node.setAll(lotgate.plan.PlanFormat.planJson(criteria.plan()));
        node.put("aql", criteria.designedFor().aql());
        node.put("alpha", criteria.designedFor().alpha());
        node.put("ltpd", criteria.designedFor().ltpd());
        node.put("beta", criteria.designedFor().beta());
        node.put("method", criteria.method());
        node.put("producerRisk", criteria.achieved().producerRisk());
        node.put("consumerRisk", criteria.achieved().consumerRisk());
    }

    private String csv(SavedPlan saved) {
        List<List<Object>> rows = new ArrayList<>();
        for (ClassPlan criteria : saved.classes()) {
            Plan plan = criteria.plan();
            rows.add(List.of(planFile.toString(), saved.name(), criteria.defectClass().label(), saved.model().name(),
                    plan.scheme(), PlanWording.brief(plan), plan.maxSampleSize(),
                    saved.lotSize() > 0 ? saved.lotSize() : "", criteria.achieved().producerRisk(),
                    criteria.achieved().consumerRisk(), saved.fingerprint()));
        }
        return CsvTable.table(List.of("file", "name", "class", "model", "scheme", "plan", "maxSampleSize", "lotSize",
                "producerRisk", "consumerRisk", "fingerprint"), rows);
    }

    private void printText(PrintWriter out, SavedPlan saved) {
        out.println("Plan file " + planFile + ": valid (lotgate plan format)");
        out.println("  name         " + saved.name());
        if (!saved.description().isBlank()) {
            out.println("  description  " + saved.description());
        }
        out.println("  created      " + saved.created());
        if (saved.measurement() != null) {
            out.println("  measures     " + PlanWording.measurement(saved.measurement()));
        } else {
            out.println("  model        " + PlanWording.model(saved.model(), saved.lotSize()));
        }
        for (ClassPlan criteria : saved.classes()) {
            Plan plan = criteria.plan();
            String heading = saved.unclassified() ? "plan" : criteria.defectClass().label();
            out.printf("  %-12s %s%n", heading, plan instanceof SinglePlan single ? "n = " + single.n() + ", c = "
                    + single.c() + " (reject at " + single.rejectionNumber() + ")"
                    : plan.scheme() + ": " + PlanWording.brief(plan));
            out.println("               designed for AQL " + Percent.level(criteria.designedFor().aql()) + " with alpha "
                    + Percent.level(criteria.designedFor().alpha()) + ", LTPD "
                    + Percent.level(criteria.designedFor().ltpd()) + " with beta "
                    + Percent.level(criteria.designedFor().beta()) + " (" + criteria.method() + ")");
            out.println("               achieves producer's risk " + Percent.probability(criteria.achieved().producerRisk())
                    + ", consumer's risk " + Percent.probability(criteria.achieved().consumerRisk()));
        }
        if (!saved.unclassified()) {
            out.println("  sample       n = " + saved.sampleSize() + " units per lot");
        }
        out.println("  fingerprint  " + saved.fingerprint());
    }
}
