package lotgate.cli;

import lotgate.inspection.Columns;
import lotgate.inspection.ResultWords;
import lotgate.jobs.SheetLayout;
import lotgate.jobs.TypedValues;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;

/** The options that say how to read an inspection sheet, turned into what the readers take (jobs.SheetLayout). */
final class SheetOptions {
    private SheetOptions() {
    }

    /** The standard result words, with the site's (LOTGATE_RESULT_WORDS) and then the option's added. */
    static ResultWords resultWords(CommandSpec spec, String option) {
        return SheetLayout.resultWords(option);
    }

    /** The column names of --columns, with the header row, separator and result words of the other options. */
    static Columns columns(CommandSpec spec, String mapping, Integer headerRow, String delimiter, String words) {
        Character separator = null;
        if (delimiter != null) {
            try {
                separator = TypedValues.delimiter(delimiter);
            } catch (IllegalArgumentException e) {
                throw new ParameterException(spec.commandLine(), "--delimiter " + delimiter + ": " + e.getMessage());
            }
        }
        return SheetLayout.columns(mapping, headerRow, separator, words);
    }

    /** The first and last sheet row of --rows FIRST-LAST, or {0, 0} when the option is not given. */
    static int[] rowRange(CommandSpec spec, String rows) {
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
