package lotgate.inspection;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;

/**
 * What identifies a lot: its id, supplier, part, size, the day it was received and who inspected it.
 * Each may be null when not given; the lot size is 0 when unknown.
 */
public record LotDetails(String lot, String supplier, String part, int lotSize, LocalDate received,
        String inspector) {

    /** The name of the optional key/value sheet in a workbook. */
    public static final String SHEET = "lot";

    public static LotDetails none() {
        return new LotDetails(null, null, null, 0, null, null);
    }

    /** These details, with any left empty filled from the other. */
    public LotDetails orElse(LotDetails other) {
        return new LotDetails(lot != null ? lot : other.lot, supplier != null ? supplier : other.supplier,
                part != null ? part : other.part, lotSize > 0 ? lotSize : other.lotSize,
                received != null ? received : other.received, inspector != null ? inspector : other.inspector);
    }

    /** The side file that holds a CSV sheet's lot details: inspection.csv has inspection.lot.csv. */
    public static Path sideFile(Path csv) {
        String name = csv.getFileName().toString();
        String stem = name.substring(0, name.length() - ".csv".length());
        return csv.resolveSibling(stem + ".lot.csv");
    }

    /**
     * The details in a workbook's "lot" sheet, or in a CSV's side file (given explicitly, or found
     * beside it); none where there is no such sheet or file.
     */
    public static LotDetails read(SheetSource source, Path sideFile) {
        SheetSource from = source;
        String sheet = null;
        if (source instanceof CsvSheets) {
            Path side = sideFile != null ? sideFile : sideFile(source.file());
            if (!Files.exists(side)) {
                if (sideFile != null) {
                    throw new SheetException(sideFile, "no such lot details file");
                }
                return none();
            }
            from = SheetSource.open(side);
        } else {
            if (sideFile != null) {
                from = SheetSource.open(sideFile);
            } else {
                List<String> names = source.sheetNames();
                sheet = names.stream().filter(n -> n.equalsIgnoreCase(SHEET)).findFirst().orElse(null);
                if (sheet == null) {
                    return none();
                }
            }
        }
        return parse(from, sheet);
    }

    private static LotDetails parse(SheetSource source, String sheet) {
        String[] values = new String[6];
        LocalDate[] received = {null};
        String sheetName = sheet == null ? source.sheetNames().get(0) : sheet;
        source.read(sheet, (row, cells) -> {
            Cell key = cells.get(0);
            if (key.column() != 0) {
                throw new SheetException(source.file(), source.where(sheetName, row, key.column())
                        + ": lot details are a key in column A and its value in column B");
            }
            String name = key.text().trim().toLowerCase(Locale.ROOT).replaceAll("[\\s_-]", "");
            int index = switch (name) {
                case "lot", "lotid" -> 0;
                case "supplier" -> 1;
                case "part" -> 2;
                case "lotsize" -> 3;
                case "received" -> 4;
                case "inspector" -> 5;
                case "key" -> -1;
                default -> throw new SheetException(source.file(), source.where(sheetName, row, 0) + ": unknown lot"
                        + " detail '" + key.text().trim() + "'; use lot, supplier, part, lot size, received, inspector");
            };
            if (index < 0 || cells.size() < 2) {
                return;
            }
            Cell value = cells.get(1);
            values[index] = value.text().trim();
            if (index == 4) {
                try {
                    received[0] = Days.of(value, "received");
                } catch (IllegalArgumentException e) {
                    throw new SheetException(source.file(), source.where(sheetName, row, value.column()) + ": "
                            + e.getMessage());
                }
            }
            if (index == 3 && (value.kind() == Cell.Kind.DATE || !values[3].matches("\\d{1,10}"))) {
                throw new SheetException(source.file(), source.where(sheetName, row, value.column())
                        + ": lot size '" + values[3] + "' is not a whole number of 1 or more");
            }
        });
        LocalDate day = received[0];
        long size = values[3] == null ? 0 : Long.parseLong(values[3]);
        if (size > Integer.MAX_VALUE || (values[3] != null && size < 1)) {
            throw new SheetException(source.file(), "lot size " + values[3] + " is outside 1 to " + Integer.MAX_VALUE);
        }
        return new LotDetails(values[0], values[1], values[2], (int) size, day, values[5]);
    }
}
