package lotgate.cli;

import static lotgate.demo.DemoData.row;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import lotgate.demo.DemoData;
import lotgate.history.StoreLocation;
import lotgate.history.Stores;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The history store through the command line on SQLite and PostgreSQL: a recorded lot's outputs show its
 * place in the chain and verify checks a kept head; no silent new store; one record per lot; secrets never
 * shown; identifiers clean; reports reissued from the store.
 */
class StoreCommandsTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String BOLTS = "plans/arnwick-af-m8-40.json";

    @TempDir
    Path folder;

    static Stream<String> kinds() {
        return Stores.kinds();
    }

    /** A pass/fail sheet of 132 units with the given number failing, for an invented lot. */
    private Path sheet(String lot, int failing) throws Exception {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "result"));
        for (int i = 1; i <= 132; i++) {
            rows.add(row(lot + "-" + i, i <= failing ? "fail" : "pass"));
        }
        Path file = folder.resolve(lot + ".xlsx");
        DemoData.workbook(file, "Sample", rows, null);
        return file;
    }

    private Cli.Result sentence(String store, String lot, int failing, String... extra) throws Exception {
        List<String> args = new ArrayList<>(List.of("sentence", BOLTS, sheet(lot, failing).toString(), "--lot", lot,
                "--supplier", "Invented Works", "--part", "IW-1", "--store", store));
        args.addAll(List.of(extra));
        return Cli.run(args.toArray(String[]::new));
    }

    private static String xlsxText(Path file) throws Exception {
        StringBuilder text = new StringBuilder();
        try (InputStream in = Files.newInputStream(file); XSSFWorkbook workbook = new XSSFWorkbook(in)) {
            workbook.getSheet("Summary").forEach(r -> r.forEach(c -> text.append(c.toString()).append('|')));
        }
        return text.toString();
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void everyOutputOfARecordedLotShowsItsPlaceAndVerifyChecksAKeptHead(String kind) throws Exception {
        String store = Stores.fresh(kind, folder);
        sentence(store, "K0", 0, "--create-store");
        Path html = folder.resolve("K1.html");
        Path xlsx = folder.resolve("K1.xlsx");
        Path record = folder.resolve("K1.json");
        Cli.Result json = sentence(store, "K1", 0, "--report", html.toString(), "--report", xlsx.toString(),
                "--record", record.toString(), "--format", "json");
        assertEquals(0, json.exitCode(), json.err());
        JsonNode history = JSON.readTree(json.out()).get("history");
        assertEquals(2, history.get("seq").asLong());
        String hash = history.get("recordHash").asText();
        assertTrue(hash.matches("[0-9a-f]{64}"), hash);
        assertEquals("2:" + hash, history.get("expect").asText());
        JsonNode saved = JSON.readTree(record.toFile()).get("historyRecord");
        assertEquals(2, saved.get("seq").asLong());
        assertEquals(hash, saved.get("chainHash").asText());
        assertTrue(Files.readString(html).contains("History record #2 in " + StoreLocation.masked(store)
                .replace("&", "&amp;") + ", chain hash " + hash));
        assertTrue(xlsxText(xlsx).contains("Chain hash|" + hash + "|"), xlsxText(xlsx));
        Cli.Result text = sentence(store, "K2", 0);
        assertTrue(text.out().contains("  chain hash "), text.out());
        assertTrue(text.out().contains("'lotgate verify --expect 3:"), text.out());

        Cli.Result verified = Cli.run("verify", "--store", store, "--expect", "2:" + hash, "--format", "json");
        assertEquals(0, verified.exitCode(), verified.err());
        JsonNode result = JSON.readTree(verified.out());
        assertEquals(3, result.get("headSeq").asLong());
        assertTrue(result.get("storeId").asText().matches("[0-9a-f-]{36}"));
        String head = result.get("head").asText();
        Cli.Result plain = Cli.run("verify", "--store", store);
        assertTrue(plain.out().contains("  head:     " + head + " "), plain.out());
        assertTrue(plain.out().contains("  store id: " + result.get("storeId").asText()), plain.out());

        // Someone cuts the last record and moves the chain head back: only the kept head tells.
        TamperingTest.sql(store, "DELETE FROM defect_count WHERE seq = 3", "DELETE FROM lot_record WHERE seq = 3",
                "UPDATE chain_head SET seq = 2, hash = (SELECT hash FROM lot_record WHERE seq = 2)");
        assertEquals(0, Cli.run("verify", "--store", store).exitCode());
        Cli.Result caught = Cli.run("verify", "--store", store, "--expect", head, "--expect", "2:" + hash);
        assertEquals(ExitCode.STORE, caught.exitCode());
        assertEquals("lotgate: history store " + StoreLocation.masked(store) + " is damaged: the kept head " + head
                + " names record 3, but the store ends at record 2: records were removed from its end, or the store"
                + " was replaced (2 records before it are intact)" + System.lineSeparator(), caught.err());
        Cli.Result badHead = Cli.run("verify", "--store", store, "--expect", "3:abc");
        assertEquals(ExitCode.USAGE, badHead.exitCode());
        assertTrue(badHead.err().startsWith("lotgate: --expect '3:abc' is not SEQ:HASH"), badHead.err());
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void noCommandStartsANewStoreSilently(String kind) throws Exception {
        String store = Stores.fresh(kind, folder);
        String shown = StoreLocation.masked(store);
        for (String[] command : List.of(new String[] {"history"}, new String[] {"supplier", "Invented Works"},
                new String[] {"suppliers"}, new String[] {"verify"})) {
            List<String> args = new ArrayList<>(List.of(command));
            args.addAll(List.of("--store", store));
            Cli.Result refused = Cli.run(args.toArray(String[]::new));
            assertEquals(ExitCode.BAD_INPUT, refused.exitCode(), command[0]);
            assertTrue(refused.err().startsWith("lotgate: history store " + shown + " does not exist"), refused.err());
        }
        Cli.Result notAsked = sentence(store, "N1", 0);
        assertEquals(ExitCode.BAD_INPUT, notAsked.exitCode());
        assertTrue(notAsked.err().contains("does not exist")
                && notAsked.err().contains("; give --create-store to start a new store there (nothing was recorded)"),
                notAsked.err());
        assertEquals(ExitCode.BAD_INPUT, Cli.run("history", "--store", store).exitCode(), "still no store");
        Cli.Result asked = sentence(store, "N1", 0, "--create-store");
        assertEquals(0, asked.exitCode(), asked.err());
        assertTrue(asked.err().startsWith("lotgate: created a new history store " + shown + " (store id "),
                asked.err());
        Cli.Result second = sentence(store, "N2", 0, "--create-store");
        assertEquals("", second.err(), "an existing store is not created again");
    }

    @Test
    void aStoreHeldInMemoryIsRefused() throws Exception {
        for (String url : List.of("jdbc:sqlite::memory:", "jdbc:sqlite:", "jdbc:sqlite:file::memory:?cache=shared",
                "jdbc:sqlite:file:x.db?mode=memory")) {
            Cli.Result refused = sentence(url, "M1", 0, "--create-store");
            assertEquals(ExitCode.STORE, refused.exitCode(), url);
            assertEquals("lotgate: store " + url + " is held in memory and would be lost when lotgate ends; name a"
                    + " SQLite file or a PostgreSQL database" + System.lineSeparator(), refused.err());
            assertFalse(refused.out().contains("recorded"), refused.out());
        }
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aLotIsRecordedOnceAndImportRefusesDuplicates(String kind) throws Exception {
        String store = Stores.fresh(kind, folder);
        assertEquals(0, sentence(store, "D1", 0, "--create-store").exitCode());
        Cli.Result twice = sentence(store, "D1", 0);
        assertEquals(ExitCode.USAGE, twice.exitCode());
        assertEquals("lotgate: lot D1 of Invented Works, part IW-1 is already recorded as #1 in "
                + StoreLocation.masked(store) + "; to correct that record, sentence again with --supersedes 1 --reason"
                + " TEXT" + System.lineSeparator(), twice.err());
        Path past = folder.resolve("past.csv");
        DemoData.csv(past, ',', false, List.of(row("lot", "supplier", "part", "received", "sample size",
                "nonconforming", "verdict"), row("P1", "Invented Works", "IW-1", "2026-01-05", 80, 0, "accept"),
                row("P2", "Invented Works", "IW-1", "2026-01-06", 80, 0, "accept"),
                row("P1", "Invented Works", "IW-1", "2026-01-07", 80, 1, "accept")));
        Cli.Result inFile = Cli.run("import", past.toString(), "--store", store);
        assertEquals(ExitCode.BAD_INPUT, inFile.exitCode());
        assertTrue(inFile.err().endsWith("past.csv: row 4: lot P1 of Invented Works, part IW-1 is listed twice (first"
                + " row 2); a lot is recorded once (nothing was imported)" + System.lineSeparator()), inFile.err());
        DemoData.csv(past, ',', false, List.of(row("lot", "supplier", "part", "received", "sample size",
                "nonconforming", "verdict"), row("P1", "Invented Works", "IW-1", "2026-01-05", 80, 0, "accept"),
                row("D1", "Invented Works", "IW-1", "2026-01-06", 80, 0, "accept")));
        Cli.Result inStore = Cli.run("import", past.toString(), "--store", store);
        assertEquals(ExitCode.BAD_INPUT, inStore.exitCode());
        assertTrue(inStore.err().endsWith("past.csv: row 3: lot D1 of Invented Works, part IW-1 is already recorded"
                + " as #1 in " + StoreLocation.masked(store) + " (nothing was imported)" + System.lineSeparator()),
                inStore.err());
        JsonNode listed = JSON.readTree(Cli.run("history", "--store", store, "--format", "json").out());
        assertEquals(1, listed.get("records").size(), "all or nothing: P1 was not imported either");
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aStorePasswordIsNeverShown(String kind) throws Exception {
        String store = Stores.fresh(kind, folder);
        String secret = "Sesame-4711";
        String withSecret = kind.equals("sqlite") ? "jdbc:sqlite:" + store + "?password=" + secret
                : store.replace("password=lotgate", "password=" + secret);
        List<Cli.Result> results = new ArrayList<>();
        results.add(sentence(withSecret, "S1", 0, "--create-store", "--format", "json"));
        results.add(sentence(withSecret, "S1", 0));
        results.add(Cli.run("history", "--store", withSecret));
        results.add(Cli.run("verify", "--store", withSecret, "--format", "json"));
        results.add(Cli.run("history", "--store", "jdbc:postgresql://127.0.0.1:1/none?connectTimeout=2&user=u&password="
                + secret));
        results.add(Cli.run("history", "--store", "jdbc:postgresql://u:" + secret + "@127.0.0.1:1/none"));
        for (Cli.Result result : results) {
            assertFalse((result.out() + result.err()).contains(secret), result.out() + result.err());
        }
        assertTrue(results.get(4).err().startsWith("lotgate: cannot open the history store"
                + " jdbc:postgresql://127.0.0.1:1/none?connectTimeout=2&user=u&password=*** ("), results.get(4).err());
    }

    /** Runs lotgate in its own process with the given environment; returns its exit code and output. */
    private static Cli.Result lotgate(Map<String, String> environment, String... args) throws Exception {
        return Cli.process(environment, args);
    }

    @Test
    void thePostgresPasswordMayComeFromTheEnvironmentOrThePasswordFile() throws Exception {
        String store = Stores.fresh("postgresql", folder);
        assertEquals(0, sentence(store, "E1", 0, "--create-store").exitCode());
        String password = store.replaceAll(".*[?&]password=([^&]*).*", "$1");
        String bare = store.replaceAll("([?&])password=[^&]*&?", "$1");
        Cli.Result fromEnvironment = lotgate(Map.of("PGPASSWORD", password, "HOME", folder.toString()), "verify",
                "--store", bare);
        assertEquals(0, fromEnvironment.exitCode(), fromEnvironment.out());
        assertTrue(fromEnvironment.out().contains("1 record, chain intact"), fromEnvironment.out());
        Path pgpass = folder.resolve("pgpass");
        Files.writeString(pgpass, "*:*:*:*:" + password + "\n");
        Files.setPosixFilePermissions(pgpass, java.nio.file.attribute.PosixFilePermissions.fromString("rw-------"));
        Cli.Result fromFile = lotgate(Map.of("PGPASSFILE", pgpass.toString(), "HOME", folder.toString()), "verify",
                "--store", bare);
        assertEquals(0, fromFile.exitCode(), fromFile.out());
        Cli.Result without = lotgate(Map.of("HOME", folder.toString()), "verify", "--store", bare);
        assertEquals(ExitCode.STORE, without.exitCode(), without.out());
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void idsWithControlCharactersAreRefusedAndFreeTextIsEscaped(String kind) throws Exception {
        String store = Stores.fresh(kind, folder);
        Cli.Result forged = sentence(store, "L1\nREJECT lot L1", 0, "--create-store");
        assertEquals(ExitCode.USAGE, forged.exitCode());
        assertTrue(forged.err().startsWith("lotgate: --lot 'L1\\nREJECT lot L1' holds the control character U+000A at"
                + " position 3; an id must be printable text"), forged.err());
        for (String[] option : List.of(new String[] {"--supplier", "Invented\u001b[2JWorks"},
                new String[] {"--part", "IW\u202e1-"}, new String[] {"--inspector", "A\u0085B"})) {
            List<String> args = new ArrayList<>(List.of("sentence", BOLTS, sheet("C1", 0).toString(), "--lot", "C1",
                    "--supplier", "Invented Works", "--part", "IW-1", "--store", store, "--create-store"));
            int given = args.indexOf(option[0]);
            if (given >= 0) {
                args.set(given + 1, option[1]);
            } else {
                args.addAll(List.of(option));
            }
            Cli.Result refused = Cli.run(args.toArray(String[]::new));
            assertEquals(ExitCode.USAGE, refused.exitCode(), option[0]);
            assertTrue(refused.err().startsWith("lotgate: " + option[0] + " '"), refused.err());
            assertFalse(refused.err().contains("\u001b") || refused.err().contains("\u202e")
                    || refused.err().contains("\u0085"), "shown escaped");
        }
        Path past = folder.resolve("past.csv");
        DemoData.csv(past, ',', false, List.of(row("lot", "supplier", "part", "received", "sample size",
                "nonconforming", "verdict", "defects"), row("P1", "Invented Works", "IW-1", "2026-01-05", 80, 1,
                "accept", "burr\u001b[31m:1"), row("P\u009b2", "Invented Works", "IW-1", "2026-01-06", 80, 0, "accept",
                "")));
        Cli.Result badImport = Cli.run("import", past.toString(), "--store", store, "--create-store");
        assertEquals(ExitCode.BAD_INPUT, badImport.exitCode());
        assertTrue(badImport.err().contains("past.csv: row 3, column A: lot 'P\\u009b2' holds the control character"
                + " U+009B"), badImport.err());
        DemoData.csv(past, ',', false, List.of(row("lot", "supplier", "part", "received", "sample size",
                "nonconforming", "verdict", "defects"), row("P1", "Invented Works", "IW-1", "2026-01-05", 80, 1,
                "accept", "burr\u001b[2K\u001b[1GREJECT:1")));
        assertEquals(0, Cli.run("import", past.toString(), "--store", store, "--create-store").exitCode());
        Cli.Result audit = Cli.run("supplier", "Invented Works", "--store", store);
        assertEquals(0, audit.exitCode(), audit.err());
        assertTrue(audit.out().contains("burr\\e[2K\\e[1GREJECT"), audit.out());
        assertFalse(audit.out().contains("\u001b"), "no raw control character");
        Cli.Result message = Cli.run("sentence", BOLTS, sheet("C2", 0).toString(), "--production", "x\nREJECT",
                "--no-record");
        assertTrue(message.err().startsWith("lotgate: --production x\\nREJECT: give steady or irregular"),
                message.err());
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aRecordedLotsReportsAreReissuedFromTheStore(String kind) throws Exception {
        String store = Stores.fresh(kind, folder);
        Path html = folder.resolve("R1.html");
        Path record = folder.resolve("R1.json");
        Cli.Result sentenced = sentence(store, "R1", 1, "--create-store", "--report", html.toString(), "--record",
                record.toString());
        assertEquals(0, sentenced.exitCode(), sentenced.err());
        String original = Files.readString(html);
        String originalRecord = Files.readString(record);
        Files.delete(html);
        Files.delete(record);
        Cli.Result bySeq = Cli.run("reissue", "#1", "--store", store, "--report", html.toString(), "--record",
                record.toString());
        assertEquals(0, bySeq.exitCode(), bySeq.err());
        // The same report, chain hash included; only the chart's generated element ids differ.
        assertEquals(original.replaceAll("_[0-9]+clip", "_clip"), Files.readString(html).replaceAll("_[0-9]+clip",
                "_clip"));
        assertEquals(originalRecord, Files.readString(record));
        Path xlsx = folder.resolve("R1.xlsx");
        Cli.Result byLot = Cli.run("reissue", "R1", "--store", store, "--report", xlsx.toString());
        assertEquals(0, byLot.exitCode(), byLot.err());
        assertTrue(xlsxText(xlsx).contains("Chain hash|"), xlsxText(xlsx));
        sheet("R1", 2); // the sheet is changed after the lot was recorded
        Cli.Result changed = Cli.run("reissue", "1", "--store", store, "--report", html.toString());
        assertEquals(ExitCode.USAGE, changed.exitCode());
        assertTrue(changed.err().contains("R1.xlsx is not the sheet record 1 was decided from (its SHA-256 differs);"
                + " name that sheet"), changed.err());
        Cli.Result none = Cli.run("reissue", "L-404", "--store", store, "--report", html.toString());
        assertEquals(ExitCode.USAGE, none.exitCode());
        assertEquals("lotgate: the store " + StoreLocation.masked(store) + " holds no lot L-404"
                + System.lineSeparator(), none.err());
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aSupplierNameTooLongForACellIsCutWithAMarkAndTheLotIsRecordedWithItsReport(String kind) throws Exception {
        String store = Stores.fresh(kind, folder);
        String name = "Invented " + "W".repeat(40_000);
        Path xlsx = folder.resolve("long.xlsx");
        Cli.Result result = Cli.run("sentence", BOLTS, sheet("W1", 0).toString(), "--lot", "W1", "--supplier", name,
                "--part", "IW-1", "--store", store, "--create-store", "--report", xlsx.toString());
        assertEquals(0, result.exitCode(), result.err());
        String summary = xlsxText(xlsx);
        assertTrue(summary.contains(" [... cut here: 40009 characters in all]|"), "a visible mark");
        JsonNode listed = JSON.readTree(Cli.run("history", "--store", store, "--format", "json").out());
        assertEquals(name, listed.get("records").get(0).get("supplier").asText(), "the record keeps the whole name");
    }

    @Test
    void filesLeftByAKilledRunAreNamedForWhatTheyAreAndRemovedByTheNextRun() throws Exception {
        String store = folder.resolve("history.sqlite").toString();
        Path reports = Files.createDirectories(folder.resolve("reports"));
        long ended = ProcessHandle.current().pid() + 1_000_000_000L; // no process runs under this id
        Path leftover = reports.resolve(".lotgate-unfinished-" + ended + "-0123abcd-L9.html");
        Files.writeString(leftover, "<html>half");
        Path running = reports.resolve(".lotgate-unfinished-" + ProcessHandle.current().pid() + "-0123abcd-L8.html");
        Files.writeString(running, "<html>another run still at work");
        Cli.Result result = sentence(store, "L10", 0, "--create-store", "--report", reports.resolve("L10.html")
                .toString());
        assertEquals(0, result.exitCode(), result.err());
        assertFalse(Files.exists(leftover), "a file of a run that ended is removed");
        assertTrue(Files.exists(running), "a file of a run still going is left alone");
        assertTrue(Files.exists(reports.resolve("L10.html")));
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void outputsThatCannotBeMovedIntoPlaceAfterTheCommitAreReissued(String kind) throws Exception {
        String store = Stores.fresh(kind, folder);
        assertEquals(0, sentence(store, "P0", 0, "--create-store").exitCode());
        Path html = folder.resolve("P1.html");
        Path record = folder.resolve("P1.json");
        Files.createDirectories(html).resolve("in the way").toFile().createNewFile();
        Cli.Result stopped = sentence(store, "P1", 0, "--report", html.toString(), "--record",
                record.toString());
        assertEquals(ExitCode.CANNOT_WRITE, stopped.exitCode());
        assertTrue(stopped.err().startsWith("lotgate: cannot write " + html + ": "), stopped.err());
        assertTrue(stopped.err().endsWith("; the lot was recorded as #2: once the cause is removed, write its outputs"
                + " with 'lotgate reissue 2'" + System.lineSeparator()), stopped.err());
        try (Stream<Path> files = Files.list(folder)) {
            assertEquals(0, files.filter(f -> f.getFileName().toString().startsWith(".lotgate-unfinished-")).count(),
                    "no staged file is left");
        }
        Files.delete(html.resolve("in the way"));
        Files.delete(html);
        Cli.Result reissued = Cli.run("reissue", "2", "--store", store, "--report", html.toString(), "--record",
                record.toString());
        assertEquals(0, reissued.exitCode(), reissued.err());
        assertEquals(2, JSON.readTree(record.toFile()).get("historyRecord").get("seq").asLong());
        assertTrue(Files.readString(html).contains("History record #2"));
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void theHistoryListingShowsEachRecordsPlaceThatVerifyAccepts(String kind) throws Exception {
        String store = Stores.fresh(kind, folder);
        assertEquals(0, sentence(store, "H1", 0, "--create-store").exitCode());
        assertEquals(0, sentence(store, "H2", 1).exitCode());
        JsonNode listed = JSON.readTree(Cli.run("history", "--store", store, "--format", "json").out());
        JsonNode first = listed.get("records").get(0);
        String kept = first.get("seq").asLong() + ":" + first.get("hash").asText();
        assertEquals(64, first.get("hash").asText().length());
        Cli.Result verified = Cli.run("verify", "--store", store, "--expect", kept);
        assertEquals(0, verified.exitCode(), verified.err());
        Cli.Result text = Cli.run("history", "--store", store);
        assertTrue(text.out().contains(first.get("hash").asText().substring(0, 12)), text.out());
        assertTrue(text.out().contains("--format json or csv gives them whole"), text.out());
        String csv = Cli.run("history", "--store", store, "--format", "csv").out();
        assertTrue(csv.lines().findFirst().orElseThrow().endsWith(",hash"), csv);
        assertTrue(csv.contains(first.get("hash").asText()), csv);
    }

    @ParameterizedTest
    @MethodSource("kinds")
    void aSupplierTypedInAnotherCaseJoinsTheHistoryItBelongsTo(String kind) throws Exception {
        String store = Stores.fresh(kind, folder);
        assertEquals(0, sentence(store, "C1", 0, "--create-store").exitCode());
        Cli.Result typed = Cli.run("sentence", BOLTS, sheet("C2", 0).toString(), "--lot", "C2", "--supplier",
                "invented  works", "--part", "iw-1", "--store", store);
        assertEquals(0, typed.exitCode(), typed.err());
        assertTrue(typed.out().contains("recorded under the store's spelling 'Invented Works', part 'IW-1'"),
                typed.out());
        JsonNode listed = JSON.readTree(Cli.run("history", "--store", store, "--supplier", "INVENTED WORKS",
                "--format", "json").out());
        assertEquals(2, listed.get("records").size(), "both lots in one history, found in any case");
        assertEquals("Invented Works", listed.get("records").get(1).get("supplier").asText());
        Cli.Result again = Cli.run("sentence", BOLTS, sheet("C1", 0).toString(), "--lot", "C1", "--supplier",
                "INVENTED WORKS", "--part", "IW-1", "--store", store);
        assertEquals(ExitCode.USAGE, again.exitCode(), "the same lot under another spelling is still a duplicate");
        Cli.Result unknown = Cli.run("history", "--store", store, "--supplier", "Invented Werks");
        assertEquals(ExitCode.USAGE, unknown.exitCode());
        assertTrue(unknown.err().contains("has no lots of 'Invented Werks'; did you mean 'Invented Works'?"),
                unknown.err());
    }
}
