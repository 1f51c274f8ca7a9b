package lotgate.web;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import java.util.Set;
import java.util.stream.Stream;

/**
 * Inspection sheets sent from the browser: each is copied, up to a size limit, into a fresh temporary
 * folder under a name the workbench chooses (the browser's file name never becomes a path), and the
 * folder is deleted when the job is done with it.
 */
final class Uploads {
    private static final Set<String> KINDS = Set.of("xlsx", "xls", "csv");
    private final long limit;

    Uploads(long limit) {
        this.limit = limit;
    }

    long limit() {
        return limit;
    }

    /** Megabytes (MiB) as the workbench writes them in messages. */
    static String size(long bytes) {
        if (bytes >= 1024 * 1024 && bytes % (1024 * 1024) == 0) {
            return bytes / (1024 * 1024) + " MiB";
        }
        if (bytes >= 1024 && bytes % 1024 == 0) {
            return bytes / 1024 + " KiB";
        }
        return bytes + " bytes";
    }

    /**
     * The sheet in the body, of the kind the browser's file name ends with (xlsx, xls or csv).
     *
     * @throws Exchange.Refusal 413 when it is larger than the limit, 400 for another kind
     */
    Sheet receive(Exchange exchange, String browserName) throws IOException {
        String kind = kindOf(browserName);
        if (kind == null) {
            throw new Exchange.Refusal(400, "the inspection sheet must be an .xlsx, .xls or .csv file");
        }
        if (exchange.contentLength() > limit) {
            throw new Exchange.Refusal(413, "the sheet is larger than the workbench accepts ("
                    + size(limit) + "; start it with a larger --upload-limit)");
        }
        Path folder = Files.createTempDirectory("lotgate-upload-");
        Sheet sheet = new Sheet(folder, folder.resolve("sheet." + kind));
        try (InputStream in = exchange.body(); OutputStream out = Files.newOutputStream(sheet.file())) {
            byte[] buffer = new byte[64 * 1024];
            long total = 0;
            int read;
            while ((read = in.read(buffer)) >= 0) {
                total += read;
                if (total > limit) {
                    throw new Exchange.Refusal(413, "the sheet is larger than the workbench accepts ("
                            + size(limit) + "; start it with a larger --upload-limit)");
                }
                out.write(buffer, 0, read);
            }
        } catch (IOException | RuntimeException e) {
            sheet.close();
            throw e;
        }
        return sheet;
    }

    /** xlsx, xls or csv from the end of a file name the browser gave, or null. */
    static String kindOf(String browserName) {
        if (browserName == null) {
            return null;
        }
        int dot = browserName.lastIndexOf('.');
        String kind = dot < 0 ? "" : browserName.substring(dot + 1).toLowerCase(Locale.ROOT);
        return KINDS.contains(kind) ? kind : null;
    }

    /** A received sheet; closing it deletes its folder. */
    record Sheet(Path folder, Path file) implements AutoCloseable {
        @Override
        public void close() {
            try (Stream<Path> files = Files.walk(folder)) {
                for (Path path : files.sorted(Comparator.reverseOrder()).toList()) {
                    Files.deleteIfExists(path);
                }
            } catch (IOException e) {
                folder.toFile().deleteOnExit();
            }
        }
    }
}
