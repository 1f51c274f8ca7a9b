package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** The progress line: what it says, when it redraws (on a clock the test moves), and that it wipes itself. */
class ProgressTest {
    private long now;

    @Test
    void theLineSaysWhatIsDoneAndHowFar() {
        Progress progress = new Progress(null, "import: recording lots", 100_000, () -> now);
        assertEquals("import: recording lots: 40,000 of 100,000 (40%)", progress.line(40_000));
        assertEquals("import: reading rows: 52,001", new Progress(null, "import: reading rows", 0, () -> now)
                .line(52_001));
    }

    @Test
    void itRedrawsInPlaceAtMostFiveTimesASecondAndWipesItselfAtTheEnd() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        PrintStream terminal = new PrintStream(bytes, true, StandardCharsets.UTF_8);
        Progress progress = new Progress(terminal, "work", 10, () -> now);
        progress.at(1);
        assertEquals("", bytes.toString(StandardCharsets.UTF_8), "nothing within the first fifth of a second");
        now += 200_000_000L;
        progress.at(5);
        now += 100_000_000L;
        progress.at(6);
        now += 100_000_000L;
        progress.at(10);
        progress.close();
        assertEquals("\rwork: 5 of 10 (50%)\rwork: 10 of 10 (100%)\r" + " ".repeat(21) + "\r",
                bytes.toString(StandardCharsets.UTF_8));
    }

    @Test
    void withoutATerminalOrForAProgramItIsSilent() {
        // The tests run with no console (as a command does when piped), and JSON or CSV output asks for none.
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        PrintStream err = System.err;
        System.setErr(new PrintStream(bytes, true, StandardCharsets.UTF_8));
        try {
            for (boolean text : new boolean[] {true, false}) {
                try (Progress progress = Progress.onTerminal("work", 10, text)) {
                    for (int i = 0; i <= 10; i++) {
                        progress.at(i);
                    }
                }
            }
        } finally {
            System.setErr(err);
        }
        assertEquals("", bytes.toString(StandardCharsets.UTF_8));
    }

    @Test
    void aLastStepIsSaidAtOnceOverTheLineBeforeAndWipedAtTheEnd() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        PrintStream terminal = new PrintStream(bytes, true, StandardCharsets.UTF_8);
        Progress counting = new Progress(terminal, "import: lots", 0, () -> now);
        assertEquals(false, counting.shown());
        now += 200_000_000L;
        counting.at(1_500);
        assertEquals(true, counting.shown());
        counting.close();
        assertEquals(false, counting.shown());
        Progress last = new Progress(terminal, "import: committing", 0, () -> now);
        last.say();
        last.close();
        assertEquals("\rimport: lots: 1,500\r" + " ".repeat(19) + "\r\rimport: committing\r" + " ".repeat(18) + "\r",
                bytes.toString(StandardCharsets.UTF_8));
    }
}
