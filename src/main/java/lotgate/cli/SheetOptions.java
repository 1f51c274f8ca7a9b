package lotgate.cli;

import lotgate.inspection.Columns;
import lotgate.jobs.SheetLayout;
import lotgate.jobs.TypedValues;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/** The options that say how to read an inspection sheet, turned into what the readers take (jobs.SheetLayout). */
final class SheetOptions {
    @Mixin
    SharedOptions.Sheet sheet;

    @Mixin
    SharedOptions.ColumnNames columnNames;

    @Option(names = "--header-row", paramLabel = "ROW", converter = Values.SheetRow.class,
            description = "The sheet row that holds the column names (default: the first of the top 50 rows that"
                    + " names a result, defect class or value column; rows above it, such as a title block, are"
                    + " passed over). 1 to 1048576.")
    Integer headerRow;

    @Mixin
    SharedOptions.ResultWords resultWords;

    @Option(names = "--delimiter", paramLabel = "CHAR",
            description = "How a CSV sheet separates its values: comma, semicolon or tab (default: decided from the"
                    + " header row).")
    String delimiter;

    @Option(names = "--rows", paramLabel = "FIRST-LAST",
            description = "The sheet rows that form the sample, when the sheet holds more units (e.g. 2-126).")
    String rows;

    /** The column names of --columns, with the header row, separator and result words of the other options. */
    Columns columns(CommandSpec spec) {
        Character separator = null;
        if (delimiter != null) {
            try {
                separator = TypedValues.delimiter(delimiter);
            } catch (IllegalArgumentException e) {
                throw new ParameterException(spec.commandLine(), "--delimiter " + delimiter + ": " + e.getMessage());
            }
        }
        return SheetLayout.columns(columnNames.mapping, headerRow, separator, resultWords.mapping);
    }

    /** The first and last sheet row of --rows FIRST-LAST, or {0, 0} when the option is not given. */
    int[] rowRange(CommandSpec spec) {
        if (rows == null) {
            return new int[] {0, 0};
        }
        try {
            return TypedValues.rowRange(rows);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "--rows " + rows + ": " + e.getMessage());
        }
    }
}
