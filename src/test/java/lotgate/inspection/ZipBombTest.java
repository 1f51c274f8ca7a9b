package lotgate.inspection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Zip bombs that pass POI's inflate-ratio guard are refused in one line by a lotgate whose heap is 256 MB (a
 * forked JVM with -Xmx256m): the shared strings, the cell texts and the cells of a row are capped. Each of these
 * bombs exhausts such a heap in a reader that holds whatever the package expands to.
 */
class ZipBombTest {
    @TempDir
    Path folder;

    private static String[] sentence(Path bomb) {
        return new String[] {Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-Xmx256m", "-cp",
                System.getProperty("java.class.path"), "lotgate.cli.Main", "sentence", "--no-record", "--lot", "L-1",
                "plans/arnwick-af-m8-40.json", bomb.toString()};
    }

    private static String refusal(Path bomb) throws IOException, InterruptedException {
        // Each part compresses less than a hundredfold, so POI's guard (1% ratio) lets it through.
        assertTrue(Bombs.lowestRatio(bomb) > 0.02, bomb + " " + Bombs.lowestRatio(bomb));
        Process process = new ProcessBuilder(sentence(bomb)).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        String err = new String(process.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(3, process.waitFor(), err);
        assertEquals(1, err.lines().count(), err);
        return err.strip();
    }

    @Test
    void bombsUnderPoisRatioGuardAreRefusedWithinA256MegabyteHeap() throws Exception {
        Path strings = folder.resolve("strings.xlsx");
        Bombs.sharedStrings(strings);
        Path cell = folder.resolve("cell.xlsx");
        Bombs.hugeCell(cell);
        Path row = folder.resolve("row.xlsx");
        Bombs.wideRow(row);
        List<String> expected = List.of(
                "lotgate: " + strings + ": refused: the workbook's shared strings hold more than 33,554,432 characters,"
                        + " far beyond a real inspection sheet",
                "lotgate: " + cell + ": refused: sheet 'Sample' cell A2 holds more than 32,767 characters, more than a"
                        + " spreadsheet cell holds",
                "lotgate: " + row + ": refused: sheet 'Sample' row 2 has cells beyond column XFD, the last a sheet has");
        assertEquals(expected, List.of(refusal(strings), refusal(cell), refusal(row)));
    }
}
