package lotgate.web;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.SecureRandom;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lotgate.files.InputFileException;
import lotgate.history.Identifiers;
import lotgate.history.StoreException;
import lotgate.inspection.Columns;
import lotgate.inspection.LotDetails;
import lotgate.jobs.InspectAtBench;
import lotgate.jobs.JobException;
import lotgate.jobs.LotReports;
import lotgate.jobs.SentenceLot;
import lotgate.jobs.SheetLayout;
import lotgate.jobs.TypedValues;
import lotgate.plan.PlanFamily;
import lotgate.report.results.BenchRendering;
import lotgate.report.results.SentenceRendering;
import lotgate.sentencing.LotDecision;
import lotgate.sentencing.Stopping;

/**
 * Sentencing answers: a lot from an uploaded sheet, recorded in the history store unless the user says
 * not to, with its lot reports; and unit-by-unit bench entry, judged after each unit by the same job.
 */
final class SentenceApi {
    private static final SecureRandom RANDOM = new SecureRandom();
    private final Workbench.Settings settings;
    private final Uploads uploads;
    /** The decisions of this session whose reports may be asked for, by the random id their links carry. */
    private final Map<String, LotDecision> decisions = java.util.Collections.synchronizedMap(
            new java.util.LinkedHashMap<>(64, 0.75f, true) {
                private static final long serialVersionUID = 1L;

                @Override
                protected boolean removeEldestEntry(Map.Entry<String, LotDecision> eldest) {
                    return size() > 500;
                }
            });

    SentenceApi(Workbench.Settings settings, Uploads uploads) {
        this.settings = settings;
        this.uploads = uploads;
    }

    Reply sentence(Exchange exchange) throws IOException {
        Map<String, String> fields = exchange.queryParameters();
        Path plan;
        try {
            plan = DesignApi.planFile(settings.plans(), fields.get("plan"));
        } catch (FieldError e) {
            return JsonText.refused(400, "plan", e.getMessage().replace("plan name", "plan"));
        }
        Given given = given(fields);
        String browserName = fields.get("file");
        String lotName = blankToNull(fields.get("lot-file"));
        try (Uploads.Sheet sheet = uploads.receive(exchange, browserName, lotName, fields.get("lot-file-bytes"))) {
            String id = newId();
            SentenceLot.Result result;
            try {
                result = SentenceLot.run(new SentenceLot.Request(plan, sheet.file(), given.sheet(), given.columns(),
                        given.rows()[0], given.rows()[1], details(fields), sheet.lotFile(), given.confidence(), given.record(),
                        given.supersedes(), given.reason(), given.production(), settings.store(),
                        SentenceLot.Outputs.NONE));
            } catch (JobException e) {
                return JsonText.refused(400, field(e.field()), shown(e.getMessage(), sheet, browserName));
            } catch (InputFileException e) {
                String message = sheet.lotFile() == null ? e.getMessage()
                        : e.getMessage().replace(sheet.lotFile().toString(), safeName(lotName));
                boolean aboutLotFile = sheet.lotFile() != null && e.getMessage().startsWith(sheet.lotFile().toString());
                return JsonText.refused(400, aboutLotFile ? "lot-file" : fieldOf(e, plan, fields),
                        shown(message, sheet, browserName));
            } catch (StoreException e) {
                return JsonText.refused(503, null, e.getMessage());
            }
            Map<String, Object> members = new LinkedHashMap<>();
            if (result instanceof SentenceLot.Undecided undecided) {
                members.put("decision", "pending");
                members.put("headline", "No decision yet");
                members.put("facts", List.of(List.of("next", SentenceRendering.instruction(undecided))));
            } else {
                SentenceLot.Decided decided = (SentenceLot.Decided) result;
                String lot = decided.decision().lot().lot();
                members.put("decision", decided.accepted() ? "accept" : "reject");
                members.put("headline", (lot == null ? "Lot" : "Lot " + lot) + ": "
                        + (decided.accepted() ? "ACCEPT" : "REJECT"));
                List<List<String>> facts = new ArrayList<>();
                facts.add(List.of("plan", decided.decision().plan().name() + " (fingerprint "
                        + decided.decision().plan().shortFingerprint() + ")"));
                facts.add(List.of("supplier", orEmpty(decided.decision().lot().supplier())));
                facts.add(List.of("part", orEmpty(decided.decision().lot().part())));
                facts.add(List.of("sheet", safeName(browserName) + " (SHA-256 "
                        + decided.decision().sheetSha256().substring(0, 12) + ")"));
                if (decided.recording() != null) {
                    facts.add(List.of("inspection severity", decided.recording().applied().label()));
                }
                members.put("facts", facts);
                members.put("notices", decided.decision().notices());
                if (decided.recording() != null && decided.recording().recorded()) {
                    members.put("record", Map.of("sequence", Long.toString(decided.recording().record().seq()),
                            "chain", decided.recording().record().hash()));
                }
                // The reports are written when their links are followed: the verdict does not wait for them.
                decisions.put(id, decided.decision());
                members.put("reports", List.of(
                        Map.of("label", "Lot report (xlsx)", "href", "/download/lot?id=" + id + "&as=xlsx"),
                        Map.of("label", "Lot report (HTML, printable)", "href", "/download/lot?id=" + id + "&as=html")));
            }
            members.put("text", shown(SentenceRendering.text(result), sheet, browserName));
            return JsonText.ok(members);
        }
    }

    /**
     * Bench entry: the units said so far, judged unit by unit by the bench job (a plan family's variant, which
     * the supplier's history chooses, by sentencing them as a sheet); the answer is for the unit the plan
     * decided at, or the last.
     */
    Reply bench(Map<String, String> fields) throws IOException {
        Path plan;
        try {
            plan = DesignApi.planFile(settings.plans(), fields.get("plan"));
        } catch (FieldError e) {
            return JsonText.refused(400, "plan", e.getMessage().replace("plan name", "plan"));
        }
        List<Integer> counts = new ArrayList<>();
        String units = fields.get("units");
        for (String unit : units == null || units.isBlank() ? new String[0] : units.split(",")) {
            try {
                counts.add(TypedValues.wholeNumber(unit, 0));
            } catch (IllegalArgumentException e) {
                return JsonText.refused(400, "units", "unit " + (counts.size() + 1) + ": " + e.getMessage());
            }
        }
        if (counts.isEmpty()) {
            return JsonText.refused(400, "units", "say the first unit: conforming or nonconforming");
        }
        if (PlanFamily.isFamily(plan)) {
            return familyBench(plan, counts, fields);
        }
        InspectAtBench.Bench bench;
        try {
            bench = InspectAtBench.start(new InspectAtBench.Request(plan, null, "U"));
        } catch (JobException | InputFileException e) {
            return JsonText.refused(400, "plan", e.getMessage());
        }
        InspectAtBench.State state = bench.state();
        for (int count : counts) {
            bench = bench.with(new InspectAtBench.Unit(count, ""));
            state = bench.state();
            if (state.decided()) {
                break;
            }
        }
        String say = "Unit " + state.units() + ": " + state.found() + " found; " + BenchRendering.standing(state);
        if (!state.decided()) {
            return JsonText.ok(Map.of("decision", "pending", "headline", "Go on", "say", say));
        }
        boolean accepted = state.decision().verdict() == Stopping.Verdict.ACCEPT;
        return JsonText.ok(Map.of("decision", accepted ? "accept" : "reject",
                "headline", accepted ? "ACCEPT the lot" : "REJECT the lot",
                "say", say + ". Sentence the lot with its sheet to record it."));
    }

    /** The bench for a plan family: the units sentenced as a sheet of that many, under the supplier's variant. */
    private Reply familyBench(Path plan, List<Integer> counts, Map<String, String> fields) throws IOException {
        boolean byCount = counts.stream().anyMatch(c -> c > 1);
        StringBuilder sheetText = new StringBuilder(byCount ? "unit,major\n" : "unit,result\n");
        for (int i = 0; i < counts.size(); i++) {
            sheetText.append("U").append(i + 1).append(',');
            sheetText.append(byCount ? Integer.toString(counts.get(i)) : counts.get(i) > 0 ? "fail" : "pass").append('\n');
        }
        Path folder = Files.createTempDirectory("lotgate-bench-");
        Path sheet = folder.resolve("bench.csv");
        try {
            Files.writeString(sheet, sheetText);
            LotDetails lot = new LotDetails("bench", blankToNull(fields.get("supplier")), blankToNull(fields.get("part")),
                    0, null, null);
            SentenceLot.Result result;
            try {
                result = SentenceLot.run(new SentenceLot.Request(plan, sheet, null, Columns.standard(), 0, 0, lot, null,
                        0.95, false, null, null, "steady", settings.store(), SentenceLot.Outputs.NONE));
            } catch (JobException e) {
                if (e.kind() == JobException.Kind.INCOMPLETE_SAMPLE) {
                    return JsonText.ok(Map.of("decision", "pending", "headline", "Go on",
                            "say", e.getMessage().replace(sheet.toString(), "the bench")
                                    .replaceFirst("^the bench: ", "").replaceFirst(", rows \\d+ to \\d+", "")));
                }
                return JsonText.refused(400, "units", e.getMessage().replace(sheet.toString(), "the bench"));
            } catch (InputFileException e) {
                return JsonText.refused(400, "plan", e.getMessage().replace(sheet.toString(), "the bench"));
            }
            if (result instanceof SentenceLot.Undecided undecided) {
                return JsonText.ok(Map.of("decision", "pending", "headline", "Go on",
                        "say", SentenceRendering.instruction(undecided)));
            }
            SentenceLot.Decided decided = (SentenceLot.Decided) result;
            return JsonText.ok(Map.of("decision", decided.accepted() ? "accept" : "reject",
                    "headline", decided.accepted() ? "ACCEPT the lot" : "REJECT the lot",
                    "say", "After " + counts.size() + " units: " + decided.decision().sentence().verdict()
                            + ". Sentence the lot with its sheet to record it."));
        } finally {
            Files.deleteIfExists(sheet);
            Files.deleteIfExists(folder);
        }
    }

    /** A lot report of a decision of this session, by id and kind, written into the reports folder when first asked. */
    Reply report(String id, String as) throws IOException {
        LotDecision decision = id == null ? null : decisions.get(id);
        if (decision == null || !("xlsx".equals(as) || "html".equals(as))) {
            return Reply.text(404, "no such report in this session of the workbench");
        }
        String lot = decision.lot().lot() == null ? "lot" : decision.lot().lot().replaceAll("[^A-Za-z0-9._-]", "_");
        Path file = settings.work().resolve("lot-" + lot + "-" + id + "." + as);
        synchronized (decision) {
            if (!Files.isRegularFile(file)) {
                Files.createDirectories(settings.work());
                LotReports.write(decision, file);
            }
        }
        if (as.equals("html")) {
            // The report is a page of its own with its style inside: it may use that style, and nothing else.
            return new Reply(200, Reply.HTML, Files.readAllBytes(file), Map.of("Content-Security-Policy",
                    "default-src 'none'; style-src 'unsafe-inline'; img-src data:; base-uri 'none'; form-action 'none'"));
        }
        return Reply.download("application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
                Files.readAllBytes(file), file.getFileName().toString());
    }

    /** How to read the sheet and what to record, from the form: each value read as its command option is. */
    private record Given(String sheet, Columns columns, int[] rows, double confidence, boolean record, Long supersedes,
            String reason, String production) {
    }

    private static Given given(Map<String, String> fields) {
        Integer headerRow = blankToNull(fields.get("header-row")) == null ? null
                : typed("header-row", fields, TypedValues::sheetRow);
        String delimiter = blankToNull(fields.get("delimiter"));
        Character separator = null;
        if (delimiter != null) {
            try {
                separator = TypedValues.delimiter(delimiter);
            } catch (IllegalArgumentException e) {
                throw new FieldError("delimiter", "--delimiter " + delimiter + ": " + e.getMessage());
            }
        }
        Columns columns;
        try {
            columns = SheetLayout.columns(blankToNull(fields.get("columns")), headerRow, separator,
                    blankToNull(fields.get("result-words")));
        } catch (JobException e) {
            throw new FieldError(field(e.field()), e.getMessage());
        }
        String rows = blankToNull(fields.get("rows"));
        int[] range = {0, 0};
        if (rows != null) {
            try {
                range = TypedValues.rowRange(rows);
            } catch (IllegalArgumentException e) {
                throw new FieldError("rows", "--rows " + rows + ": " + e.getMessage());
            }
        }
        double confidence = blankToNull(fields.get("confidence")) == null ? 0.95
                : typed("confidence", fields, TypedValues::risk);
        Long supersedes = blankToNull(fields.get("supersedes")) == null ? null
                : typed("supersedes", fields, TypedValues::sequenceNumber);
        String production = blankToNull(fields.get("production"));
        return new Given(blankToNull(fields.get("sheet")), columns, range, confidence, "yes".equals(fields.get("record")),
                supersedes, blankToNull(fields.get("reason")), production == null ? "steady" : production);
    }

    /** A field's value read by the parser of its command option, refused in picocli's words for an option value. */
    private static <T> T typed(String name, Map<String, String> fields, java.util.function.Function<String, T> parser) {
        try {
            return parser.apply(fields.get(name));
        } catch (IllegalArgumentException e) {
            throw new FieldError(name, "Invalid value for option '--" + name + "': " + e.getMessage());
        }
    }

    /**
     * The field a refused input file is about: the plan, or the sheet's part the user gave (the workbook sheet
     * named, the header row, the own column names, the rows), else the sheet file itself.
     */
    static String fieldOf(InputFileException e, Path plan, Map<String, String> fields) {
        String message = e.getMessage();
        if (message.startsWith(plan.toString())) {
            return "plan";
        }
        if (message.contains(": no sheet named '") || message.contains("has no sheets to choose from")) {
            return "sheet";
        }
        if (message.contains("given as the header row")) {
            return "header-row";
        }
        if (message.contains(": the sample rows start at ")) {
            return "rows";
        }
        boolean aboutHeader = message.contains(": no header row: ") || message.contains(": the header row, ")
                || message.contains("' column in the header row, ");
        if (aboutHeader && blankToNull(fields.get("columns")) != null) {
            return "columns";
        }
        if (aboutHeader && blankToNull(fields.get("header-row")) != null) {
            return "header-row";
        }
        return "sheet-file";
    }

    private static LotDetails details(Map<String, String> fields) {
        LocalDate day = null;
        String received = blankToNull(fields.get("received"));
        if (received != null) {
            try {
                day = LocalDate.parse(received);
            } catch (DateTimeParseException e) {
                throw new FieldError("received", "--received " + received + ": give a date such as 2026-03-14");
            }
        }
        Integer lotSize = blankToNull(fields.get("lot-size")) == null ? null
                : typed("lot-size", fields, size -> TypedValues.wholeNumber(size, 1));
        for (String id : new String[] {"lot", "supplier", "part", "inspector"}) {
            String problem = Identifiers.problem("--" + id, fields.get(id));
            if (problem != null) {
                throw new FieldError(id, problem);
            }
        }
        return new LotDetails(blankToNull(fields.get("lot")), blankToNull(fields.get("supplier")),
                blankToNull(fields.get("part")), lotSize == null ? 0 : lotSize, day, blankToNull(fields.get("inspector")));
    }

    /**
     * A message with the temporary sheet's path and name (a CSV file's one sheet, its side file) put back to the
     * name the user knows it by.
     */
    private static String shown(String message, Uploads.Sheet sheet, String browserName) {
        String name = sheet.file().getFileName().toString();
        return message.replace(sheet.file().toString(), safeName(browserName))
                .replace("'" + name + "'", "'" + safeName(browserName) + "'")
                .replace(sideFile(sheet.file().getFileName().toString()), sideFile(safeName(browserName)));
    }

    /** The lot details file a CSV sheet of that name has beside it by default (NAME.lot.csv). */
    private static String sideFile(String sheetName) {
        int dot = sheetName.lastIndexOf('.');
        return (dot < 0 ? sheetName : sheetName.substring(0, dot)) + ".lot.csv";
    }

    private static String safeName(String browserName) {
        String name = browserName == null ? "sheet" : browserName;
        int slash = Math.max(name.lastIndexOf('/'), name.lastIndexOf('\\'));
        return name.substring(slash + 1);
    }

    private static String field(String jobField) {
        String field = DesignApi.fieldOf(jobField);
        return field == null ? null : switch (field) {
            case "plan-file" -> "plan";
            case "sheet" -> "sheet-file";
            default -> field;
        };
    }

    private static String orEmpty(String text) {
        return text == null ? "" : text;
    }

    private static String blankToNull(String text) {
        return text == null || text.isBlank() ? null : text.trim();
    }

    private static String newId() {
        byte[] bytes = new byte[8];
        RANDOM.nextBytes(bytes);
        return HexFormat.of().formatHex(bytes);
    }
}
