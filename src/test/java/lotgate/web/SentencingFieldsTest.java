package lotgate.web;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.net.URLDecoder;
import java.net.URLEncoder;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The sentencing page's fields against the sentence command's options: each refusal the command gives is shown
 * beside the field of that option's name, in the command's own words, and the fields change the verdict as the
 * options do.
 */
class SentencingFieldsTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path PLAN = Path.of("plans", "arnwick-af-m8-40.json").toAbsolutePath();

    @TempDir
    Path folder;

    /** The command's refusal, as a page shows it: no "lotgate: " nor help hint, the sheet by its file name. */
    private static String commandSays(Path sheet, String form) {
        List<String> args = new ArrayList<>(List.of("sentence", PLAN.toString(), sheet.toString()));
        boolean record = false;
        for (String pair : form.split("&")) {
            int equals = pair.indexOf('=');
            String name = pair.substring(0, equals);
            if (name.equals("record")) {
                record = true;
            } else {
                args.add("--" + name + "=" + URLDecoder.decode(pair.substring(equals + 1), StandardCharsets.UTF_8));
            }
        }
        if (!record) {
            args.add("--no-record");
        }
        StringWriter err = new StringWriter();
        int code = lotgate.cli.Main.run(new PrintWriter(java.io.Writer.nullWriter()), new PrintWriter(err), args.toArray(String[]::new));
        assertNotEquals(0, code, "the command took " + args);
        String line = err.toString().strip();
        assertTrue(line.startsWith("lotgate: "), line);
        return line.substring("lotgate: ".length()).replace(" (see 'lotgate sentence --help')", "")
                .replace(sheet.toString(), sheet.getFileName().toString());
    }

    private static JsonNode pageSays(Served served, Path sheet, String form) throws Exception {
        HttpResponse<String> answer = served.upload("/api/sentence?plan=arnwick&file="
                + sheet.getFileName() + "&" + form, sheet);
        return JSON.readTree(answer.body());
    }

    @ParameterizedTest(name = "{0} beside {1}")
    @CsvSource(delimiter = '|', value = {
        "sheet=Nope                              | sheet",
        "columns=bogus                           | columns",
        "columns=result%3DOutcome                | columns",
        "columns=grade%3DOutcome                 | columns",
        "rows=5-2                                | rows",
        "rows=two                                | rows",
        "rows=1-40                               | rows",
        "header-row=0                            | header-row",
        "header-row=2000000                      | header-row",
        "header-row=7                            | header-row",
        "header-row=60                           | header-row",
        "result-words=pass                       | result-words",
        "result-words=pass%3Dfail                | result-words",
        "delimiter=pipe                          | delimiter",
        "confidence=150%25                       | confidence",
        "confidence=0.95%25x                     | confidence",
        "supersedes=abc&reason=miscount          | supersedes",
        "supersedes=0&reason=miscount            | supersedes",
        "supersedes=3                            | supersedes",
        "supersedes=3&reason=miscount            | supersedes",
        "production=bumpy                        | production",
        "lot-size=0                              | lot-size",
        "received=yesterday                      | received",
    })
    void everyRefusalOfTheCommandIsShownBesideItsFieldInTheCommandsWords(String form, String field) throws Exception {
        Path sheet = Path.of("demo-data", "arnwick-af2611.xlsx").toAbsolutePath();
        try (Served served = Served.start(folder)) {
            Files.copy(PLAN, served.plans.resolve("arnwick.json"));
            JsonNode answer = pageSays(served, sheet, form);
            assertEquals(false, answer.get("ok").asBoolean(), answer.toString());
            assertEquals(field, answer.get("errors").get(0).get("field").asText(), answer.toString());
            assertEquals(commandSays(sheet, form), answer.get("errors").get(0).get("message").asText());
        }
    }

    @Test
    void aSheetNameForACsvFileIsRefusedBesideTheSheetName() throws Exception {
        Path sheet = Path.of("demo-data", "arnwick-af2618.csv").toAbsolutePath();
        try (Served served = Served.start(folder)) {
            Files.copy(PLAN, served.plans.resolve("arnwick.json"));
            JsonNode answer = pageSays(served, sheet, "lot=AF-2618&sheet=Sample");
            assertEquals("sheet", answer.get("errors").get(0).get("field").asText(), answer.toString());
            assertEquals(commandSays(sheet, "lot=AF-2618&sheet=Sample"), answer.get("errors").get(0).get("message").asText());
        }
    }

    @Test
    void theSheetRowsColumnsAndWordsGivenChooseTheSample() throws Exception {
        Path sheet = nightShift(folder);
        try (Served served = Served.start(folder)) {
            Files.copy(PLAN, served.plans.resolve("arnwick.json"));
            String form = "lot=NS-1&sheet=Night+shift&header-row=3&rows=4-135&columns=unit%3DSerial,result%3DOutcome"
                    + "&result-words=pass%3DGO;fail%3DSCRAP&confidence=90%25";
            JsonNode answer = pageSays(served, sheet, form);
            assertEquals(true, answer.get("ok").asBoolean(), answer.toString());
            assertEquals("accept", answer.get("decision").asText(), answer.toString());
            // Plan arnwick-af-m8-40: n = 132, c = 3 (its plan file); 2 units scrapped in rows 4-135.
            assertTrue(answer.get("text").asText().contains("2 nonconforming units found in 132 units"),
                    answer.get("text").asText());
            assertTrue(answer.get("text").asText().contains("90%"), answer.get("text").asText());
            JsonNode wider = pageSays(served, sheet, form.replace("rows=4-135", "rows=4-143"));
            assertEquals(false, wider.get("ok").asBoolean());
            assertEquals("sheet-file", wider.get("errors").get(0).get("field").asText());
        }
    }

    /** The sheet sent as the page sends it with a lot details file: the lot file's bytes first, then the sheet's. */
    private static JsonNode pageSays(Served served, Path sheet, Path lotFile, String form) throws Exception {
        byte[] lot = Files.readAllBytes(lotFile);
        byte[] body = java.util.Arrays.copyOf(lot, lot.length + (int) Files.size(sheet));
        System.arraycopy(Files.readAllBytes(sheet), 0, body, lot.length, body.length - lot.length);
        HttpResponse<String> answer = served.client.send(java.net.http.HttpRequest.newBuilder(served.uri(
                "/api/sentence?plan=arnwick&file=" + sheet.getFileName() + "&lot-file=" + lotFile.getFileName()
                        + "&lot-file-bytes=" + lot.length + "&" + form))
                .header("Content-Type", "application/octet-stream").header(Guard.CSRF_HEADER, served.csrf())
                .header("Origin", served.origin()).POST(java.net.http.HttpRequest.BodyPublishers.ofByteArray(body))
                .build(), HttpResponse.BodyHandlers.ofString());
        return JSON.readTree(answer.body());
    }

    @Test
    void aLotDetailsFileSentWithTheSheetGivesTheLotItsDetails() throws Exception {
        // An uploaded CSV sheet has no side file beside it: its lot details come as a file of their own.
        Path sheet = Path.of("demo-data", "arnwick-af2618.csv").toAbsolutePath();
        Path lotFile = Path.of("demo-data", "arnwick-af2618.lot.csv").toAbsolutePath();
        try (Served served = Served.start(folder)) {
            Files.copy(PLAN, served.plans.resolve("arnwick.json"));
            JsonNode answer = pageSays(served, sheet, lotFile, "record=yes");
            assertEquals(true, answer.get("ok").asBoolean(), answer.toString());
            // The lot file's own rows: lot AF-2618 of Arnwick Fasteners (invented), part AF-M8-40.
            assertTrue(answer.get("headline").asText().startsWith("Lot AF-2618: "), answer.toString());
            assertTrue(answer.get("facts").toString().contains("Arnwick Fasteners (invented)"), answer.toString());
            assertTrue(answer.get("record").get("sequence").asText().equals("1"), answer.toString());

            Path broken = folder.resolve("af2618-broken.lot.csv");
            Files.writeString(broken, "lot;AF-2618\ncolour;blue\n");
            JsonNode refused = pageSays(served, sheet, broken, "");
            assertEquals("lot-file", refused.get("errors").get(0).get("field").asText(), refused.toString());
            assertEquals(commandSays(sheet, "lot-file=" + broken), refused.get("errors").get(0).get("message").asText()
                    .replace(broken.getFileName().toString(), broken.toString()));
        }
    }

    /**
     * An invented workbook of two tabs: a cover sheet first, then the sample under a title block (header in row 3)
     * with the site's own headers (Serial, Outcome) and words (GO, SCRAP). Rows 4-135 hold 132 units, 2 scrapped
     * (units 40 and 90); the 8 units after them are all scrapped.
     */
    static Path nightShift(Path folder) throws java.io.IOException {
        Path sheet = folder.resolve("night-shift.xlsx");
        try (var workbook = new org.apache.poi.xssf.usermodel.XSSFWorkbook();
                var out = Files.newOutputStream(sheet)) {
            workbook.createSheet("Cover").createRow(0).createCell(0).setCellValue("Receiving inspection (invented)");
            var tab = workbook.createSheet("Night shift");
            tab.createRow(0).createCell(0).setCellValue("Lot NS-1 (invented)");
            var header = tab.createRow(2);
            header.createCell(0).setCellValue("Serial");
            header.createCell(1).setCellValue("Outcome");
            for (int i = 1; i <= 140; i++) {
                var row = tab.createRow(2 + i);
                row.createCell(0).setCellValue("NS-" + i);
                row.createCell(1).setCellValue(i == 40 || i == 90 || i > 132 ? "SCRAP" : "GO");
            }
            workbook.write(out);
        }
        return sheet;
    }
}
