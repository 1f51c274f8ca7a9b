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
     * The sheet in the body, of the kind the browser's file name ends with (xlsx, xls or csv), after the first
     * {@code lotBytes} bytes, which are the lot details file {@code lotName} when one is sent (else null).
     *
     * @throws Exchange.Refusal 413 when the body is larger than the limit, 400 for another kind or a bad length
     */
    Sheet receive(Exchange exchange, String browserName, String lotName, String lotBytes) throws IOException {
        String kind = kindOf(browserName);
        if (kind == null) {
            throw new Exchange.Refusal(400, "the inspection sheet must be an .xlsx, .xls or .csv file");
        }
        String lotKind = lotName == null ? null : kindOf(lotName);
        if (lotName != null && lotKind == null) {
            throw new Exchange.Refusal(400, "the lot details file must be an .xlsx, .xls or .csv file");
        }
        long lotLength = 0;
        if (lotName != null) {
            try {
                lotLength = Long.parseLong(lotBytes == null ? "" : lotBytes);
            } catch (NumberFormatException e) {
                lotLength = -1;
            }
            if (lotLength < 0 || lotLength > limit) {
                throw new Exchange.Refusal(400, "the lot details file's length is not given right");
            }
        }
        if (exchange.contentLength() > limit) {
            throw tooLarge();
        }
        Path folder = Files.createTempDirectory("lotgate-upload-");
        Sheet sheet = new Sheet(folder, folder.resolve("sheet." + kind),
                lotName == null ? null : folder.resolve("lot-details." + lotKind));
        try (InputStream in = exchange.body()) {
            long[] total = {0};
            if (sheet.lotFile() != null) {
                copy(in, sheet.lotFile(), lotLength, total);
            }
            copy(in, sheet.file(), Long.MAX_VALUE, total);
        } catch (IOException | RuntimeException e) {
            sheet.close();
            throw e;
        }
        return sheet;
    }

    /** Copies up to {@code most} bytes (all that are left when MAX_VALUE) into the file, the whole body held to the limit. */
    private void copy(InputStream in, Path file, long most, long[] total) throws IOException {
        try (OutputStream out = Files.newOutputStream(file)) {
            byte[] buffer = new byte[64 * 1024];
            long left = most;
            int read;
            while (left > 0 && (read = in.read(buffer, 0, (int) Math.min(buffer.length, left))) >= 0) {
                total[0] += read;
                if (total[0] > limit) {
                    throw tooLarge();
                }
                out.write(buffer, 0, read);
                left -= read;
            }
            if (most != Long.MAX_VALUE && left > 0) {
                throw new Exchange.Refusal(400, "the lot details file's length is not given right");
            }
        }
    }

    private Exchange.Refusal tooLarge() {
        return new Exchange.Refusal(413, "the sheet is larger than the workbench accepts ("
                + size(limit) + "; start it with a larger --upload-limit)");
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

    /** A received sheet and its lot details file (or null); closing it deletes their folder. */
    record Sheet(Path folder, Path file, Path lotFile) implements AutoCloseable {
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
