package lotgate.report.results;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.function.Consumer;

/** Text written line by line, collected as one string. */
final class Text {
    private Text() {
    }

    /** What the writer prints, as a string with the platform's line endings. */
    static String of(Consumer<PrintWriter> writer) {
        StringWriter text = new StringWriter();
        PrintWriter out = new PrintWriter(text);
        writer.accept(out);
        out.flush();
        return text.toString();
    }
}
