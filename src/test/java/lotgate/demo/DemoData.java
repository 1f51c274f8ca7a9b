package lotgate.demo;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Writes the demo's invented inspection sheets into demo-data/ (run it after changing them; the files
 * are committed). Every company, part, person and count in them is invented.
 */
public final class DemoData {
    private DemoData() {
    }

    public static void main(String[] args) throws IOException {
        Path folder = Path.of(args.length > 0 ? args[0] : "demo-data");
        Files.createDirectories(folder);
        arnwickAccepted(folder.resolve("arnwick-af2611.xlsx"));
        arnwickRejected(folder.resolve("arnwick-af2618.csv"));
        kestruneCritical(folder.resolve("kestrune-kc0907.xlsx"));
        mirelleDefects(folder.resolve("mirelle-ms1130.csv"));
        mirelleMalformed(folder.resolve("mirelle-ms1204-malformed.xlsx"));
        pastYear(folder.resolve("lots-2025.csv"));
        quorrinClips(folder.resolve("quorrin-qp2611.csv"));
        quorrinTablesLot(folder.resolve("quorrin-qp2612.csv"));
        kestruneBores(folder.resolve("kestrune-kc0911-bore.csv"), "KC-0911", false, 911);
        kestruneBores(folder.resolve("kestrune-kc0915-bore.csv"), "KC-0915", true, 915);
    }

    /**
     * Kestrune housings' bore diameters, 42 measured in mm against 41.950 to 42.050 (invented): lot KC-0911 from a
     * centred normal process; lot KC-0915 skewed (a worn reamer leaves a long tail towards the upper limit), which
     * the normality test flags.
     */
    static void kestruneBores(Path file, String lot, boolean skewed, long seed) throws IOException {
        java.util.Random random = new java.util.Random(seed);
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "value", "note"));
        for (int i = 1; i <= 42; i++) {
            double value = skewed ? 41.985 + 0.004 * Math.exp(1.1 * random.nextGaussian()) : 42.000 + 0.011
                    * random.nextGaussian();
            rows.add(row(String.format("%s-%02d", lot.replace("-", ""), i), String.format(java.util.Locale.ROOT,
                    "%.4f", value), null));
        }
        csv(file, ',', false, rows);
        lotFile(file, lot, "Kestrune Castings (invented)", "KC-114", 400, skewed ? "2026-11-26" : "2026-11-12",
                "M. Lindqvist (invented)");
    }

    /** The lot details beside a CSV sheet, as NAME.lot.csv. */
    private static void lotFile(Path sheet, String lot, String supplier, String part, int size, String received,
            String inspector) throws IOException {
        String stem = sheet.getFileName().toString().replace(".csv", ".lot.csv");
        csv(sheet.resolveSibling(stem), ',', false, List.of(row("lot", lot), row("supplier", supplier), row("part", part),
                row("lot size", size), row("received", received), row("inspector", inspector)));
    }

    /**
     * Quorrin lot QP-2611: 138 snap clips pull-tested to destruction in the order drawn, two fail (units 23 and
     * 97). The single plan (n = 132, c = 3) accepts on rows 2-133; the double plan (69 + 69) needs its second
     * sample after one failure in the first and then accepts; the sequential plan accepts after unit 96.
     */
    static void quorrinClips(Path file) throws IOException {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "result", "defect", "note"));
        for (int i = 1; i <= 138; i++) {
            String unit = String.format("QP2611-%03d", i);
            if (i == 23) {
                rows.add(row(unit, "fail", "latch cracked", "broke at 41 N"));
            } else if (i == 97) {
                rows.add(row(unit, "fail", "short shot", null));
            } else {
                rows.add(row(unit, "pass", null, null));
            }
        }
        csv(file, ',', false, rows);
        lotFile(file, "QP-2611", "Quorrin Plastics (invented)", "QP-7", 2000, "2026-11-24", "R. Okafor (invented)");
    }

    /**
     * Quorrin lot QP-2612, sampled under the purchase order's tables plan (level II, AQL 0.65, lot of 2000: code
     * letter K, n = 125, Ac 2): 125 snap clips, one fails (unit 61), so the lot is accepted on normal inspection.
     */
    static void quorrinTablesLot(Path file) throws IOException {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "result", "defect", "note"));
        for (int i = 1; i <= 125; i++) {
            String unit = String.format("QP2612-%03d", i);
            rows.add(i == 61 ? row(unit, "fail", "latch cracked", "broke at 38 N") : row(unit, "pass", null, null));
        }
        csv(file, ',', false, rows);
        lotFile(file, "QP-2612", "Quorrin Plastics (invented)", "QP-7", 2000, "2026-12-01", "R. Okafor (invented)");
    }

    /**
     * An invented year of past lots: Arnwick slides into tightened inspection and recovers (and has a
     * rejected lot near the end of the year), Mirelle earns
     * reduced inspection, Kestrune has one rejected lot, and Quorrin Plastics has only three lots.
     */
    static void pastYear(Path file) throws IOException {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("lot", "supplier", "part", "received", "lot size", "sample size", "acceptance number",
                "nonconforming", "verdict", "defects", "production", "inspector"));
        java.util.Random random = new java.util.Random(2025);
        String[] boltDefects = {"thread damage", "head burr", "plating missing"};
        int[] arnwick = {1, 0, 2, 1, 3, 5, 2, 4, 1, 0, 2, 1, 0, 1, 2, 0, 1, 3, 0, 1, 2, 1, 4, 1};
        int[] mirelle = {0, 1, 0, 0, 2, 0, 1, 0, 0, 1, 0, 0};
        int[] kestrune = {1, 0, 0, 3, 1, 0, 2, 0, 1, 0};
        int[] quorrin = {2, 1, 4};
        LocalDate start = LocalDate.of(2025, 1, 6);
        int lots = Math.max(Math.max(arnwick.length, mirelle.length), Math.max(kestrune.length, quorrin.length));
        for (int i = 0; i < lots; i++) {
            LocalDate week = start.plusWeeks(2L * i);
            if (i < arnwick.length) {
                rows.add(pastLot(String.format("AF-25%02d", i + 1), "Arnwick Fasteners (invented)", "AF-M8-40", week,
                        5000, 132, 3, arnwick[i], boltDefects, random));
            }
            if (i < mirelle.length) {
                rows.add(pastLot(String.format("MS-25%02d", i + 1), "Mirelle Seals (invented)", "MS-22", week.plusDays(2),
                        10000, 84, 3, mirelle[i], new String[] {"surface blemish", "flash"}, random));
            }
            if (i < kestrune.length) {
                rows.add(pastLot(String.format("KC-25%02d", i + 1), "Kestrune Castings (invented)", "KC-114",
                        week.plusDays(3), 400, 82, 2, kestrune[i], new String[] {"flange out of flat", "casting flash"},
                        random));
            }
            if (i < quorrin.length) {
                rows.add(pastLot(String.format("QP-25%02d", i + 1), "Quorrin Plastics (invented)", "QP-7", week.plusDays(4),
                        2000, 125, 3, quorrin[i], new String[] {"short shot", "sink mark"}, random));
            }
        }
        csv(file, ',', false, rows);
    }

    private static List<Object> pastLot(String lot, String supplier, String part, LocalDate received, int lotSize,
            int n, int c, int found, String[] types, java.util.Random random) {
        java.util.Map<String, Integer> defects = new java.util.TreeMap<>();
        for (int k = 0; k < found; k++) {
            defects.merge(types[random.nextInt(types.length)], 1, Integer::sum);
        }
        String list = String.join("; ", defects.entrySet().stream().map(e -> e.getKey() + ":" + e.getValue()).toList());
        return row(lot, supplier, part, received.toString(), lotSize, n, c, found, found <= c ? "accept" : "reject",
                list, "steady", "D. Varga (invented)");
    }

    /** A row of cells: strings, numbers or null for an empty cell. */
    public static List<Object> row(Object... cells) {
        return java.util.Arrays.asList(cells);
    }

    public static void workbook(Path file, String sheetName, List<List<Object>> rows, Map<String, Object> lot)
            throws IOException {
        try (XSSFWorkbook workbook = new XSSFWorkbook()) {
            fill(workbook.createSheet(sheetName), rows);
            if (lot != null) {
                Sheet details = workbook.createSheet("lot");
                CellStyle date = workbook.createCellStyle();
                date.setDataFormat(workbook.getCreationHelper().createDataFormat().getFormat("yyyy-mm-dd"));
                int r = 0;
                for (Map.Entry<String, Object> entry : lot.entrySet()) {
                    Row row = details.createRow(r++);
                    row.createCell(0).setCellValue(entry.getKey());
                    Object value = entry.getValue();
                    if (value instanceof LocalDate day) {
                        row.createCell(1).setCellValue(day);
                        row.getCell(1).setCellStyle(date);
                    } else if (value instanceof Number number) {
                        row.createCell(1).setCellValue(number.doubleValue());
                    } else {
                        row.createCell(1).setCellValue(value.toString());
                    }
                }
            }
            try (OutputStream out = Files.newOutputStream(file)) {
                workbook.write(out);
            }
        }
    }

    public static void fill(Sheet sheet, List<List<Object>> rows) {
        for (int r = 0; r < rows.size(); r++) {
            Row row = sheet.createRow(r);
            List<Object> cells = rows.get(r);
            for (int c = 0; c < cells.size(); c++) {
                Object value = cells.get(c);
                if (value instanceof Number number) {
                    row.createCell(c).setCellValue(number.doubleValue());
                } else if (value != null) {
                    row.createCell(c).setCellValue(value.toString());
                }
            }
        }
    }

    public static void csv(Path file, char separator, boolean bom, List<List<Object>> rows) throws IOException {
        StringBuilder text = new StringBuilder(bom ? "\uFEFF" : "");
        for (List<Object> row : rows) {
            List<String> cells = new ArrayList<>();
            for (Object cell : row) {
                String value = cell == null ? "" : cell.toString();
                cells.add(value.indexOf(separator) >= 0 || value.contains("\"") ? "\"" + value.replace("\"", "\"\"")
                        + "\"" : value);
            }
            text.append(String.join(String.valueOf(separator), cells)).append("\r\n");
        }
        Files.writeString(file, text.toString(), StandardCharsets.UTF_8);
    }

    private static Map<String, Object> lot(String id, String supplier, String part, int size, LocalDate received,
            String inspector) {
        Map<String, Object> lot = new java.util.LinkedHashMap<>();
        lot.put("lot", id);
        lot.put("supplier", supplier);
        lot.put("part", part);
        lot.put("lot size", size);
        lot.put("received", received);
        lot.put("inspector", inspector);
        return lot;
    }

    /** Arnwick lot AF-2611: 132 bolts, 2 fail; the plan accepts up to 3. */
    static void arnwickAccepted(Path file) throws IOException {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "result", "defect", "note"));
        for (int i = 1; i <= 132; i++) {
            String unit = String.format("AF2611-%03d", i);
            if (i == 17) {
                rows.add(row(unit, "fail", "thread damage", "first two threads crushed"));
            } else if (i == 88) {
                rows.add(row(unit, "fail", "head burr", null));
            } else {
                rows.add(row(unit, "pass", null, null));
            }
        }
        workbook(file, "Sample", rows, lot("AF-2611", "Arnwick Fasteners (invented)", "AF-M8-40", 5000,
                LocalDate.of(2026, 11, 3), "D. Varga (invented)"));
    }

    /** Arnwick lot AF-2618: 132 bolts, 6 fail; semicolon-separated CSV with a byte-order mark. */
    static void arnwickRejected(Path file) throws IOException {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "result", "defect", "note"));
        Map<Integer, String> fails = Map.of(9, "thread damage", 31, "plating missing", 47, "thread damage",
                76, "head burr", 102, "plating missing", 118, "thread damage");
        for (int i = 1; i <= 132; i++) {
            String defect = fails.get(i);
            rows.add(row(String.format("AF2618-%03d", i), defect == null ? "pass" : "fail", defect, null));
        }
        csv(file, ';', true, rows);
        String stem = file.getFileName().toString().replace(".csv", ".lot.csv");
        csv(file.resolveSibling(stem), ';', true, List.of(row("lot", "AF-2618"),
                row("supplier", "Arnwick Fasteners (invented)"), row("part", "AF-M8-40"), row("lot size", 5000),
                row("received", "2026-11-17"), row("inspector", "D. Varga (invented)")));
    }

    /** Kestrune lot KC-0907: 175 housings by defect class, one with bore porosity (critical). */
    static void kestruneCritical(Path file) throws IOException {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "critical", "major", "minor", "defect", "note"));
        for (int i = 1; i <= 175; i++) {
            String unit = String.format("KC0907-%03d", i);
            if (i == 41) {
                rows.add(row(unit, 1, 0, 0, "bore porosity", "pores in the seal bore, sent to the laboratory"));
            } else if (i == 12) {
                rows.add(row(unit, 0, 1, 0, "flange out of flat", null));
            } else if (i == 5 || i == 60 || i == 140) {
                rows.add(row(unit, 0, 0, i == 60 ? 2 : 1, "casting flash", null));
            } else {
                rows.add(row(unit, 0, 0, 0, null, null));
            }
        }
        workbook(file, "Sample", rows, lot("KC-0907", "Kestrune Castings (invented)", "KC-114", 400,
                LocalDate.of(2026, 11, 10), "M. Osei (invented)"));
    }

    /** Mirelle lot MS-1130: 84 O-rings, surface nonconformities counted per ring (Poisson plan, c = 3). */
    static void mirelleDefects(Path file) throws IOException {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "minor", "defect"));
        for (int i = 1; i <= 84; i++) {
            int count = i == 23 ? 2 : i == 70 ? 1 : 0;
            rows.add(row(String.format("MS1130-%02d", i), count, count > 0 ? "surface blemish" : null));
        }
        csv(file, ',', false, rows);
        String stem = file.getFileName().toString().replace(".csv", ".lot.csv");
        csv(file.resolveSibling(stem), ',', false, List.of(row("lot", "MS-1130"),
                row("supplier", "Mirelle Seals (invented)"), row("part", "MS-22"), row("lot size", 10000),
                row("received", "2026-11-30"), row("inspector", "D. Varga (invented)")));
    }

    /** Mirelle lot MS-1204: a count typed as a word, which sentencing refuses by its cell. */
    static void mirelleMalformed(Path file) throws IOException {
        List<List<Object>> rows = new ArrayList<>();
        rows.add(row("unit", "minor", "defect"));
        for (int i = 1; i <= 84; i++) {
            rows.add(row(String.format("MS1204-%02d", i), i == 8 ? "two" : 0, i == 8 ? "surface blemish" : null));
        }
        workbook(file, "Sample", rows, lot("MS-1204", "Mirelle Seals (invented)", "MS-22", 10000,
                LocalDate.of(2026, 12, 4), "D. Varga (invented)"));
    }
}
