package lotgate.cli;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import lotgate.history.Identifiers;
import lotgate.inspection.LotDetails;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/** The lot's details given as options, beside (or instead of) those of the sheet's lot sheet or file. */
final class LotOptions {
    @Option(names = "--lot", paramLabel = "ID", description = "The lot's identifier.")
    String lotId;

    @Mixin
    SupplierAndPart lotOf;

    @Mixin
    SharedOptions.LotSize lotSize;

    @Option(names = "--received", paramLabel = "DATE", description = "The day the lot was received (2026-03-14).")
    String received;

    @Option(names = "--inspector", paramLabel = "NAME", description = "Who inspected the sample.")
    String inspector;

    @Option(names = "--lot-file", paramLabel = "FILE",
            description = "Lot details as key/value rows (default: the workbook's 'lot' sheet, or NAME.lot.csv beside"
                    + " a CSV sheet).")
    Path file;

    /** The details given, each checked as the history records it; blank ones as none. */
    LotDetails given(CommandSpec spec) {
        LocalDate day = null;
        if (received != null) {
            try {
                day = LocalDate.parse(received.trim());
            } catch (DateTimeParseException e) {
                throw new ParameterException(spec.commandLine(), "--received " + received + ": give a date such as"
                        + " 2026-03-14");
            }
        }
        String[][] ids = {{"--lot", lotId}, {"--supplier", lotOf.supplier.name}, {"--part", lotOf.part.name},
                {"--inspector", inspector}};
        for (String[] id : ids) {
            String problem = Identifiers.problem(id[0], id[1]);
            if (problem != null) {
                throw new ParameterException(spec.commandLine(), problem);
            }
        }
        return new LotDetails(blankToNull(lotId), blankToNull(lotOf.supplier.name), blankToNull(lotOf.part.name),
                lotSize.size == null ? 0 : lotSize.size, day, blankToNull(inspector));
    }

    private static String blankToNull(String text) {
        return text == null || text.isBlank() ? null : text.trim();
    }
}
