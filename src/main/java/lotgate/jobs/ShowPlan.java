package lotgate.jobs;

import java.nio.file.Path;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;

/** Checking a saved plan file (format, ranges, fingerprint, recorded risks) and reading what it says. */
public final class ShowPlan {

    /** The plan file to check. */
    public record Request(Path planFile) {
    }

    /** The file and the plan it holds, checked. */
    public record Result(Path planFile, SavedPlan plan) {
    }

    private ShowPlan() {
    }

    /** Reads and checks the plan file; a changed or inconsistent file is refused as a bad input file. */
    public static Result run(Request request) {
        return new Result(request.planFile(), PlanFormat.read(request.planFile()));
    }
}
