package lotgate.jobs;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import lotgate.files.InputFileException;
import lotgate.plan.PlanFamily;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
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

    /** The plan in brief: its numbers, or its classes' sample size. */
    public static String summary(SavedPlan saved) {
        if (saved.unclassified()) {
            return saved.plan().scheme() + ", " + PlanWording.brief(saved.plan());
        }
        return saved.classes().size() + " defect classes, n = " + saved.sampleSize();
    }
}
