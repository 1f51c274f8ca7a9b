package lotgate.cli;

import java.io.PrintStream;
import java.util.Locale;
import java.util.function.LongSupplier;

/**
 * A progress line for commands that can run for seconds (a large import, a long sheet, the demo): what
 * is being done and how far, redrawn in place on the terminal at most five times a second and wiped
 * when the work is done. It writes only to a terminal: with output piped or redirected, or with
 * {@code --format json|csv}, it stays silent, so that no program ever reads it.
 */
final class Progress implements AutoCloseable {
    private static final long INTERVAL = 200_000_000L;
    private static final Progress SILENT = new Progress(null, "", 0, System::nanoTime);

    private final PrintStream terminal;
    private final String what;
    private final long total;
    private final LongSupplier clock;
    private long shownAt;
    private int width;

    Progress(PrintStream terminal, String what, long total, LongSupplier clock) {
        this.terminal = terminal;
        this.what = what;
        this.total = total;
        this.clock = clock;
        this.shownAt = clock.getAsLong();
    }

    /** A progress line on the terminal, or a silent one when there is no terminal or the output is for a program. */
    static Progress onTerminal(String what, long total, boolean textOutput) {
        return textOutput && System.console() != null ? new Progress(System.err, what, total, System::nanoTime) : SILENT;
    }

    /** Notes how much is done; the line is redrawn when the last drawing is old enough. */
    void at(long done) {
        if (terminal == null) {
            return;
        }
        long now = clock.getAsLong();
        if (now - shownAt < INTERVAL) {
            return;
        }
        shownAt = now;
        String line = line(done);
        terminal.print("\r" + line + " ".repeat(Math.max(0, width - line.length())));
        terminal.flush();
        width = line.length();
    }

    /** Whether the line is on the terminal now (drawn, and not wiped since). */
    boolean shown() {
        return width > 0;
    }

    /** Draws the line's text alone, at once: a last step with nothing to count (an import's commit). */
    void say() {
        if (terminal == null) {
            return;
        }
        terminal.print("\r" + what + " ".repeat(Math.max(0, width - what.length())));
        terminal.flush();
        width = what.length();
    }

    /** The line for this much done: "importing lots: 40,000 of 100,000 (40%)", or a count when the total is unknown. */
    String line(long done) {
        if (total > 0) {
            return String.format(Locale.ROOT, "%s: %,d of %,d (%d%%)", what, done, total, done * 100 / total);
        }
        return String.format(Locale.ROOT, "%s: %,d", what, done);
    }

    /** Wipes the line, so that what the command prints next starts on a clean line. */
    @Override
    public void close() {
        if (terminal != null && width > 0) {
            terminal.print("\r" + " ".repeat(width) + "\r");
            terminal.flush();
            width = 0;
        }
    }
}
