package lotgate.cli;

import java.time.LocalDate;
import lotgate.jobs.AuditSupplier;
import lotgate.report.results.AuditRendering;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The supplier audit: one supplier's lots, acceptance, process average, p-chart, Pareto and severity. */
@Command(name = "supplier", header = "Audit one supplier's lot history.",
        description = {"For a supplier (optionally one part and a period of received dates): lots received,"
                + " accepted and rejected; the process average pooled over lots with its exact interval; the"
                + " p-chart of lot fractions with their control limits; the Pareto of defect types; the severity"
                + " timeline with every switch and its reason; and the rejected lots with their evidence.", ""})
final class SupplierCommand implements Runnable {
    @Override
    public void run() {
        format.outputs(audit.reports.files);
        format.print(AuditSupplier.run(new AuditSupplier.Request(supplier, part.name, from, to, switching.rules,
                audit.confidence.level, audit.reports.files, audit.storeOption.location())), AuditRendering::text,
                AuditRendering::json, AuditRendering::csv);
        format.written("report", audit.reports.files);
    }

    @Parameters(index = "0", paramLabel = "SUPPLIER", description = "The supplier, as recorded.")
    String supplier;

    @Mixin
    SharedOptions.Part part;

    @Option(names = "--from", paramLabel = "DATE", converter = Values.Day.class, description = "First received date of the period (2026-01-01).")
    LocalDate from;

    @Option(names = "--to", paramLabel = "DATE", converter = Values.Day.class, description = "Last received date of the period.")
    LocalDate to;

    @Mixin
    SharedOptions.Switching switching;

    @Mixin
    AuditOptions audit;

    @Mixin
    OutputFormat format;

    /** What the audit of one supplier and the ranking of all take alike: their intervals, reports and store. */
    static final class AuditOptions {
        @Mixin
        SharedOptions.Confidence confidence;

        @Mixin
        SharedOptions.Reports reports;

        @Mixin
        StoreOption storeOption;
    }
}
