package lotgate.cli;

import java.nio.file.Path;
import lotgate.jobs.ShowPlan;
import lotgate.report.results.PlanFileRendering;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

/** Checks a saved plan file (format, ranges, fingerprint, recorded risks) and prints what it says. */
@Command(name = "show", header = "Check a saved plan file and print what it says.",
        description = {"Checks a saved plan file (format, ranges, fingerprint, recorded risks) and prints the plan,"
                + " what it was designed for, what it achieves and its fingerprint. A changed or inconsistent file"
                + " is refused (exit code 3).", ""})
final class ShowCommand implements Runnable {
    @Override
    public void run() {
        format.print(ShowPlan.run(new ShowPlan.Request(planFile)), PlanFileRendering::text, PlanFileRendering::json, PlanFileRendering::csv);
    }

    @Parameters(index = "0", paramLabel = "PLAN", description = "A saved plan file (plans/*.json).")
    Path planFile;

    @Mixin
    OutputFormat format;
}
