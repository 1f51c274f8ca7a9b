package lotgate.cli;

import static lotgate.demo.DemoData.row;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.stream.Stream;
import lotgate.demo.DemoData;
import lotgate.history.Stores;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A sentencing run killed (SIGKILL) at any moment leaves either no record and no outputs, or the record
 * and outputs that are in place or can be reissued; files it left half-done are named for what they are
 * and removed by the next run.
 */
class OutputCrashTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path folder;

    static Stream<String> kinds() {
        return Stores.kinds();
    }

    private static Process recorder(String store, Path outputs, Path sheet, int first) throws Exception {
        String classpath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        return new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-Xmx256m",
                "-Djava.awt.headless=true",
                "-Dlog4j.provider=org.apache.logging.log4j.simple.internal.SimpleProvider", "-cp", classpath,
                SentencingRecorder.class.getName(), store, outputs.toString(), "plans/arnwick-af-m8-40.json",
                sheet.toString(), Integer.toString(first), "100000").redirectErrorStream(true).start();
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aSentencingKilledAtAnyMomentLeavesRecordAndOutputsThatAgree(String kind) throws Exception {
        String store = Stores.fresh(kind, folder);
        Path outputs = Files.createDirectories(folder.resolve("out"));
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "result"));
        for (int i = 1; i <= 132; i++) {
            rows.add(row("U-" + i, i == 7 ? "fail" : "pass"));
        }
        Path sheet = folder.resolve("sample.xlsx");
        DemoData.workbook(sheet, "Sample", rows, null);
        Random random = new Random(2860);
        Set<String> reportedDone = new HashSet<>();
        int reissued = 0;
        int rounds = 6;
        for (int round = 0; round < rounds; round++) {
            Process process = recorder(store, outputs, sheet, round * 1000);
            // The kill point is a count of finished runs, not a time: the process is killed while it works on
            // its next lot, wherever that run is (reading, rendering, committing or moving files into place).
            int killAfter = 1 + random.nextInt(4);
            try (BufferedReader out = new BufferedReader(new InputStreamReader(process.getInputStream(),
                    StandardCharsets.UTF_8))) {
                int seen = 0;
                while (seen < killAfter) {
                    String line = out.readLine();
                    assertTrue(line != null && !line.startsWith("failed "), "round " + round + ": " + line);
                    if (line.startsWith("done ")) {
                        reportedDone.add(line.substring(5));
                        seen++;
                    }
                }
            } finally {
                process.destroyForcibly(); // SIGKILL on Linux; also when an assertion above failed
            }
            process.waitFor();
            Cli.Result verified = Cli.run("verify", "--store", store);
            assertEquals(0, verified.exitCode(), verified.err());
            JsonNode records = JSON.readTree(Cli.run("history", "--store", store, "--format", "json").out())
                    .get("records");
            Set<String> recorded = new HashSet<>();
            for (JsonNode record : records) {
                String lot = record.get("lot").asText();
                recorded.add(lot);
                Path report = outputs.resolve(lot + ".html");
                Path decision = outputs.resolve(lot + ".json");
                if (!Files.exists(report) || !Files.exists(decision)) {
                    // Killed between the commit and the move into place: the outputs are reissued from the store.
                    Cli.Result again = Cli.run("reissue", "#" + record.get("seq").asLong(), "--store", store,
                            "--report", report.toString(), "--record", decision.toString());
                    assertEquals(0, again.exitCode(), again.err());
                    reissued++;
                }
                JsonNode saved = JSON.readTree(decision.toFile()).get("historyRecord");
                assertEquals(record.get("seq").asLong(), saved.get("seq").asLong(), lot);
                assertTrue(Files.readString(report).contains("chain hash " + saved.get("chainHash").asText()), lot);
            }
            assertTrue(recorded.containsAll(reportedDone), "round " + round + ": a lot reported done is missing");
            try (Stream<Path> files = Files.list(outputs)) {
                for (Path file : files.toList()) {
                    String name = file.getFileName().toString();
                    if (name.startsWith(".")) {
                        assertTrue(name.startsWith(".lotgate-unfinished-"), name);
                    } else {
                        assertTrue(recorded.contains(name.substring(0, name.lastIndexOf('.'))),
                                "round " + round + ": an output of a lot that was not recorded: " + name);
                    }
                }
            }
        }
        // The next run into the folder removes what the killed runs left half-done.
        Cli.Result next = Cli.run("sentence", "plans/arnwick-af-m8-40.json", sheet.toString(), "--lot", "K-last",
                "--supplier", "Invented Works", "--part", "IW-1", "--store", store, "--report",
                outputs.resolve("K-last.html").toString());
        assertEquals(0, next.exitCode(), next.err());
        try (Stream<Path> files = Files.list(outputs)) {
            assertEquals(0, files.filter(f -> f.getFileName().toString().startsWith(".")).count());
        }
        assertFalse(reportedDone.isEmpty());
        System.out.println("crash | " + kind + " | " + rounds + " kills | lots reported done " + reportedDone.size()
                + " | outputs reissued after a kill between commit and publish " + reissued);
    }
}
