package lotgate.jobs;

import lotgate.inspection.Columns;
import lotgate.inspection.ResultWords;

/**
 * How a sample sits on its sheet, from what a face was given (command options or form fields): the own column
 * names, the header row, the CSV separator and the result words, as the sheet readers take them. A refusal is a
 * JobException naming the option, in the words the command line prints.
 */
public final class SheetLayout {
    private SheetLayout() {
    }

    /** The standard result words, with the site's ({@value ResultWords#SITE_VARIABLE}) and then the given ones added. */
    public static ResultWords resultWords(String words) {
        ResultWords all = ResultWords.standard();
        String site = System.getenv(ResultWords.SITE_VARIABLE);
        if (site != null && !site.isBlank()) {
            try {
                all = all.with(site);
            } catch (IllegalArgumentException e) {
                throw JobException.invalid("--result-words", ResultWords.SITE_VARIABLE + ": " + e.getMessage());
            }
        }
        if (words != null) {
            try {
                all = all.with(words);
            } catch (IllegalArgumentException e) {
                throw JobException.invalid("--result-words", "--result-words: " + e.getMessage());
            }
        }
        return all;
    }

    /**
     * The column names of a role=header mapping (null: the standard names), with the header row (null: searched
     * for), the CSV separator (null: decided from the header row) and the result words added.
     */
    public static Columns columns(String mapping, Integer headerRow, Character delimiter, String words) {
        Columns columns;
        try {
            columns = mapping == null ? Columns.standard() : Columns.mapped(mapping);
        } catch (IllegalArgumentException e) {
            throw JobException.invalid("--columns", "--columns: " + e.getMessage());
        }
        if (headerRow != null) {
            columns = columns.withHeaderRow(headerRow);
        }
        if (delimiter != null) {
            columns = columns.withDelimiter(delimiter);
        }
        return columns.withResultWords(resultWords(words));
    }
}
