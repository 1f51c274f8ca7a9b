package lotgate.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.Writer;
import lotgate.history.Identifiers;

/**
 * What lotgate prints passes through here, so that text from files and the store (a reason, a cell,
 * an old record's id) can neither forge a line nor drive the terminal: line ends and tabs pass,
 * every other control character (escape sequences, a lone carriage return, C1, bidi overrides) is
 * shown escaped. Line ends are written by lotgate itself, and a CSV cell may hold one inside quotes.
 */
final class EscapingWriter extends FilterWriter {
    private boolean pendingReturn;

    EscapingWriter(Writer out) {
        super(out);
    }

    @Override
    public void write(int c) throws IOException {
        if (pendingReturn) {
            pendingReturn = false;
            if (c == '\n') {
                out.write("\r\n");
                return;
            }
            out.write("\\r");
        }
        if (c == '\r') {
            pendingReturn = true;
        } else if (c == '\n' || c == '\t' || !Identifiers.isControl(c)) {
            out.write(c);
        } else {
            out.write(Identifiers.escape(String.valueOf((char) c)));
        }
    }

    /** Runs of characters that pass unchanged go out in one piece; the others one by one, as above. */
    @Override
    public void write(char[] buffer, int offset, int length) throws IOException {
        int end = offset + length;
        int run = offset;
        for (int i = offset; i < end; i++) {
            if (special(buffer[i])) {
                out.write(buffer, run, i - run);
                write(buffer[i]);
                run = i + 1;
            }
        }
        out.write(buffer, run, end - run);
    }

    @Override
    public void write(String text, int offset, int length) throws IOException {
        int end = offset + length;
        int run = offset;
        for (int i = offset; i < end; i++) {
            if (special(text.charAt(i))) {
                out.write(text, run, i - run);
                write(text.charAt(i));
                run = i + 1;
            }
        }
        out.write(text, run, end - run);
    }

    /** Whether a character cannot simply be passed on: a return, the character after one, or a control. */
    private boolean special(char c) {
        return pendingReturn || c == '\r' || (c != '\n' && c != '\t' && Identifiers.isControl(c));
    }

    @Override
    public void flush() throws IOException {
        out.flush();
    }

    @Override
    public void close() throws IOException {
        if (pendingReturn) {
            pendingReturn = false;
            out.write("\\r");
        }
        out.close();
    }
}
