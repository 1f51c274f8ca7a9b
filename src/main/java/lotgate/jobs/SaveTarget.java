package lotgate.jobs;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.function.BiFunction;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;

/** Where a designed plan is saved, what it is for, and whether an existing file may be replaced. */
public record SaveTarget(Path file, String description, boolean replace) {

    public SaveTarget {
        description = description == null ? "" : description;
    }

    /** The plan's name: the file name without its .json ending. */
    public String planName() {
        String name = file.getFileName().toString();
        return name.substring(0, name.length() - ".json".length());
    }

    /** Refuses a target that is not a .json file, exists without leave to replace it, or is a folder. */
    void check() {
        if (!file.getFileName().toString().endsWith(".json")) {
            throw JobException.invalid("save", "--save " + file + ": a plan file name must end in .json");
        }
        if (Files.exists(file) && !replace) {
            throw JobException.invalid("save", "--save " + file + ": the file exists; add --replace to"
                    + " overwrite it (plans already in use should keep their name and fingerprint)");
        }
        if (Files.isDirectory(file)) {
            throw JobException.invalid("save", "--save " + file + " is a folder");
        }
    }

    /** Seals the plan with its name, description and the current second, and writes it. */
    SavedPlan save(BiFunction<String, Instant, SavedPlan> seal) {
        SavedPlan saved = seal.apply(planName(), Instant.now().truncatedTo(ChronoUnit.SECONDS));
        PlanFormat.write(file, saved);
        return saved;
    }
}
