package lotgate.report.results;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.Locale;
import java.util.function.Consumer;

/** Text written line by line, collected as one string. */
final class Text {
    private Text() {
    }

    /** What the writer prints, as a string with the platform's line endings. */
    static String of(Consumer<PrintWriter> writer) {
        StringWriter text = new StringWriter();
        PrintWriter out = new Unlocalised(text);
        writer.accept(out);
        out.flush();
        return text.toString();
    }

    /** The arguments formatted as {@link Unlocalised} writes them. */
    static String format(String format, Object... args) {
        return String.format((Locale) null, format, args);
    }

    /**
     * A writer whose {@code printf} writes numbers the same on every machine (a decimal point, comma grouping),
     * as the JSON and CSV outputs do, not in the user's locale. Formatting without a locale also spares a short
     * command the JDK's loading of its CLDR locale data (5 ms), which even the United States locale costs.
     */
    private static final class Unlocalised extends PrintWriter {
        Unlocalised(StringWriter text) {
            super(text);
        }

        @Override
        public PrintWriter format(String format, Object... args) {
            return super.format((Locale) null, format, args);
        }

        @Override
        public PrintWriter printf(String format, Object... args) {
            return super.format((Locale) null, format, args);
        }
    }
}
