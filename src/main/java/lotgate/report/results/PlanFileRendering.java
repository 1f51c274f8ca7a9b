package lotgate.report.results;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lotgate.jobs.ShowPlan;
import lotgate.plan.ClassPlan;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.CsvTable;
import lotgate.report.Json;
import lotgate.report.Percent;
import lotgate.report.PlanWording;
import lotgate.sampling.Plan;
import lotgate.sampling.SinglePlan;

/** A checked plan file as text, JSON or CSV. */
public final class PlanFileRendering {
    private PlanFileRendering() {
    }

    /** The plan file as JSON. */
    public static ObjectNode json(ShowPlan.Result result) {
        SavedPlan saved = result.plan();
        Path planFile = result.planFile();
        ObjectNode node = Json.object();
        node.put("file", planFile.toString());
        node.put("valid", true);
        PlanFormat.putIdentity(node, saved);
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
        node.setAll(PlanFormat.planJson(criteria.plan()));
        node.put("aql", criteria.designedFor().aql());
        node.put("alpha", criteria.designedFor().alpha());
        node.put("ltpd", criteria.designedFor().ltpd());
        node.put("beta", criteria.designedFor().beta());
        node.put("method", criteria.method());
        node.put("producerRisk", criteria.achieved().producerRisk());
        node.put("consumerRisk", criteria.achieved().consumerRisk());
    }

    /** The plan file as CSV, a row per defect class. */
    public static String csv(ShowPlan.Result result) {
        SavedPlan saved = result.plan();
        Path planFile = result.planFile();
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

    /** The plan file as text. */
    public static String text(ShowPlan.Result result) {
        return Text.of(out -> {
            SavedPlan saved = result.plan();
            Path planFile = result.planFile();
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
        });
    }
}
