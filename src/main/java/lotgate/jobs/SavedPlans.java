package lotgate.jobs;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import lotgate.files.InputFileException;
import lotgate.plan.ClassPlan;
import lotgate.plan.PlanFamily;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.Percent;
import lotgate.report.PlanWording;

/** The saved plans and plan families of a plans folder: listed with a summary of each, read and described. */
public final class SavedPlans {
    /** One file of the folder: its name without .json, whether it is a family, the plan in brief, its description. */
    public record Entry(String name, Path file, boolean family, String summary, String description) {
    }

    private SavedPlans() {
    }

    /** The plan files and families in the folder, by name; a file that cannot be read says why in its summary. */
    public static List<Entry> list(Path folder) {
        List<Entry> entries = new ArrayList<>();
        if (!Files.isDirectory(folder)) {
            return entries;
        }
        List<Path> files;
        try (Stream<Path> listing = Files.list(folder)) {
            files = listing.filter(p -> p.getFileName().toString().endsWith(".json") && Files.isRegularFile(p))
                    .sorted().toList();
        } catch (IOException e) {
            throw new InputFileException(folder, "the plans folder cannot be read (" + e.getMessage() + ")", e);
        }
        for (Path file : files) {
            String fileName = file.getFileName().toString();
            String name = fileName.substring(0, fileName.length() - ".json".length());
            try {
                if (PlanFamily.isFamily(file)) {
                    entries.add(new Entry(name, file, true, "plan family", ""));
                    continue;
                }
                SavedPlan saved = PlanFormat.read(file);
                entries.add(new Entry(name, file, false, summary(saved), saved.description()));
            } catch (InputFileException e) {
                entries.add(new Entry(name, file, false, "cannot be used: " + e.getMessage(), ""));
            }
        }
        return entries;
    }

    /** A saved plan, checked as the show command checks it. */
    public static SavedPlan read(Path file) {
        return PlanFormat.read(file);
    }

    /** The plan in brief: its numbers, or its classes' sample size. */
    public static String summary(SavedPlan saved) {
        if (saved.unclassified()) {
            return saved.plan().scheme() + ", " + PlanWording.brief(saved.plan());
        }
        return saved.classes().size() + " defect classes, n = " + saved.sampleSize();
    }

    /** What a saved plan says, in the show command's words. */
    public static String describe(Path file, SavedPlan saved) {
        StringBuilder out = new StringBuilder();
        out.append("Plan file ").append(file.getFileName()).append(": valid (lotgate plan format)\n");
        out.append("  name         ").append(saved.name()).append('\n');
        if (!saved.description().isBlank()) {
            out.append("  description  ").append(saved.description()).append('\n');
        }
        out.append("  created      ").append(saved.created()).append('\n');
        if (saved.measurement() != null) {
            out.append("  measures     ").append(PlanWording.measurement(saved.measurement())).append('\n');
        } else {
            out.append("  model        ").append(PlanWording.model(saved.model(), saved.lotSize())).append('\n');
        }
        for (ClassPlan criteria : saved.classes()) {
            String heading = saved.unclassified() ? "plan" : criteria.defectClass().label();
            out.append(String.format("  %-12s %s%n", heading, criteria.plan().scheme() + ": "
                    + PlanWording.brief(criteria.plan())));
            out.append("               designed for AQL ").append(Percent.level(criteria.designedFor().aql()))
                    .append(" with alpha ").append(Percent.level(criteria.designedFor().alpha())).append(", LTPD ")
                    .append(Percent.level(criteria.designedFor().ltpd())).append(" with beta ")
                    .append(Percent.level(criteria.designedFor().beta())).append(" (").append(criteria.method())
                    .append(")\n");
            out.append("               achieves producer's risk ")
                    .append(Percent.probability(criteria.achieved().producerRisk())).append(", consumer's risk ")
                    .append(Percent.probability(criteria.achieved().consumerRisk())).append('\n');
        }
        out.append("  fingerprint  ").append(saved.fingerprint()).append('\n');
        return out.toString();
    }
}
