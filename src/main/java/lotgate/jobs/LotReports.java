package lotgate.jobs;

import java.nio.file.Path;
import lotgate.report.LotReport;
import lotgate.sentencing.LotDecision;

/**
 * Writing a lot report (.xlsx or .html) for a decision already made, when a face asks for it after
 * sentencing rather than during it (the workbench writes a report when its link is followed).
 */
public final class LotReports {
    private LotReports() {
    }

    /** Writes the report of the decision to the file; the extension chooses the kind. */
    public static void write(LotDecision decision, Path file) {
        LotReport.write(decision, file);
    }
}
