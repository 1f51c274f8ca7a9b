package lotgate.cli;

import java.util.Locale;
import lotgate.inspection.ResultWords;
import lotgate.inspection.Columns;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;

/** The options that say how to read an inspection sheet, turned into what the readers take. */
final class SheetOptions {
    private SheetOptions() {
    }

    /** The standard result words, with the site's (LOTGATE_RESULT_WORDS) and then the option's added. */
    static ResultWords resultWords(CommandSpec spec, String option) {
        ResultWords words = ResultWords.standard();
        String site = System.getenv(ResultWords.SITE_VARIABLE);
        if (site != null && !site.isBlank()) {
            try {
                words = words.with(site);
            } catch (IllegalArgumentException e) {
                throw new ParameterException(spec.commandLine(), ResultWords.SITE_VARIABLE + ": " + e.getMessage());
            }
        }
        if (option != null) {
            try {
                words = words.with(option);
            } catch (IllegalArgumentException e) {
                throw new ParameterException(spec.commandLine(), "--result-words: " + e.getMessage());
            }
        }
        return words;
    }

    /** The column names of --columns, with the header row, separator and result words of the other options. */
    static Columns columns(CommandSpec spec, String mapping, Integer headerRow, String delimiter, String words) {
        Columns columns;
        try {
            columns = mapping == null ? Columns.standard() : Columns.mapped(mapping);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "--columns: " + e.getMessage());
        }
        if (headerRow != null) {
            columns = columns.withHeaderRow(headerRow);
        }
        if (delimiter != null) {
            columns = columns.withDelimiter(delimiter(spec, delimiter));
        }
        return columns.withResultWords(resultWords(spec, words));
    }

    private static char delimiter(CommandSpec spec, String option) {
        return switch (option.trim().toLowerCase(Locale.ROOT)) {
            case "comma", "," -> ',';
            case "semicolon", ";" -> ';';
            case "tab", "\\t" -> '\t';
            default -> throw new ParameterException(spec.commandLine(), "--delimiter " + option + ": give comma,"
                    + " semicolon or tab");
        };
    }
}
