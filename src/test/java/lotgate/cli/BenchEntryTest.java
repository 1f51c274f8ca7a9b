package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The inspection bench keeps every unit entered, takes defect types, and says what an unfinished sample means. */
class BenchEntryTest {
    private static final String BOLTS = "plans/arnwick-af-m8-40.json";

    @TempDir
    Path folder;

    @AfterEach
    void standardInput() {
        InspectCommand.input = () -> System.in;
    }

    private static Cli.Result bench(String lines, String... more) {
        InspectCommand.input = () -> new ByteArrayInputStream(lines.getBytes(StandardCharsets.UTF_8));
        String[] args = new String[more.length + 2];
        args[0] = "inspect";
        args[1] = BOLTS;
        System.arraycopy(more, 0, args, 2, more.length);
        return Cli.run(args);
    }

    @Test
    void aMistypedPipedLineKeepsTheUnitsEnteredBeforeIt() throws IOException {
        Path sheet = folder.resolve("partial.csv");
        Cli.Result result = bench("pass\nFAIL thread damage\nok\nfial\npass\n", "--save-sheet", sheet.toString());
        assertEquals(ExitCode.BAD_INPUT, result.exitCode());
        assertEquals("lotgate: line 4: 'fial' is not a result word (pass, p, ok, good (pass) or fail, f, nc, ng, bad"
                + " (fail)), optionally followed by a defect type; the 3 units entered before it are kept in " + sheet
                + " (an unfinished sample: 3 of up to 132 units)", result.err().strip());
        assertEquals("unit,result,defect\r\n1,pass,\r\n2,fail,thread damage\r\n3,pass,\r\n",
                Files.readString(sheet).replace("\n", "\r\n").replace("\r\r\n", "\r\n"));
        Cli.Result unnamed = bench("pass\nxx\n");
        String err = unnamed.err().strip();
        Path kept = Path.of(err.substring(err.indexOf("kept in ") + "kept in ".length(), err.indexOf(" (an unfinished")));
        assertTrue(Files.readString(kept).contains("1,pass"), err);
        Files.delete(kept);
    }

    @Test
    void defectTypesEnteredAtTheBenchReachTheSheetsPareto() throws IOException {
        Path sheet = folder.resolve("bench.csv");
        StringBuilder lines = new StringBuilder();
        for (int i = 1; i <= 132; i++) {
            lines.append(i == 7 ? "ng burr\n" : i == 50 ? "fail Thread damage\n" : "OK\n");
        }
        Cli.Result result = bench(lines.toString(), "--save-sheet", sheet.toString());
        assertEquals(ExitCode.OK, result.exitCode(), result.err());
        Cli.Result sentenced = Cli.run("sentence", "--no-record", "--lot", "B-1", BOLTS, sheet.toString(), "--format",
                "json");
        assertEquals(ExitCode.OK, sentenced.exitCode(), sentenced.err());
        assertTrue(sentenced.out().contains("\"burr\""), sentenced.out());
        assertTrue(sentenced.out().contains("\"Thread damage\""), sentenced.out());
    }

    @Test
    void quittingEarlySaysPlainlyThatTheSampleIsUnfinished() throws IOException {
        Path sheet = folder.resolve("early.csv");
        Cli.Result result = bench("pass\npass\nfail\nquit\n", "--save-sheet", sheet.toString());
        assertEquals(ExitCode.NOT_DECIDED, result.exitCode());
        assertTrue(result.out().contains("No decision: 3 of up to 132 units entered. An unfinished sample neither"
                + " accepts nor rejects the lot: the plan decides only when its units are inspected.\nThe 3 units"
                + " entered are kept in " + sheet + "; add the units still to inspect to it (or enter them all again"
                + " here) before sentencing the lot."), result.out());
        assertFalse(result.out().contains("lotgate sentence"), result.out());
    }

    @Test
    void aSitesOwnWordsWorkAtTheBench() {
        Cli.Result result = bench("GO\nNOGO scratch\nquit\n", "--result-words", "pass=GO;fail=NOGO");
        assertEquals(ExitCode.NOT_DECIDED, result.exitCode(), result.err());
        assertTrue(result.out().contains("unit 2     fail  found 1"), result.out());
    }
}
