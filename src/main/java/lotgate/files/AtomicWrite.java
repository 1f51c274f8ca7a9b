package lotgate.files;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;

/** Writes a file so that readers see either the old content or the whole new content, never a part. */
public final class AtomicWrite {

    /** Writes the content of a file through an output stream. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicWrite() {
    }

    /**
     * Writes to a temporary file beside the target and moves it into place; on any failure the
     * temporary file is removed and the target is left as it was.
     *
     * @throws OutputFileException naming the file when it cannot be written
     */
    public static void write(Path target, Content content) {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        Path temporary = null;
        try {
            if (folder != null) {
                Files.createDirectories(folder);
            }
            temporary = Files.createTempFile(folder, "." + absolute.getFileName(), ".part");
            shareable(temporary, absolute);
            try (OutputStream out = Files.newOutputStream(temporary)) {
                content.writeTo(out);
            }
            try {
                Files.move(temporary, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            temporary = null;
        } catch (IOException | RuntimeException e) {
            throw new OutputFileException(target, e);
        } finally {
            if (temporary != null) {
                try {
                    Files.deleteIfExists(temporary);
                } catch (IOException ignored) {
                    // The original failure is the one worth reporting.
                }
            }
        }
    }

    /**
     * Temporary files are private; the file they become keeps the target's permissions, or is readable
     * by everyone like any file a user saves (plans and records are shared).
     */
    private static void shareable(Path temporary, Path target) throws IOException {
        if (!Files.getFileStore(temporary).supportsFileAttributeView(PosixFileAttributeView.class)) {
            return;
        }
        Set<PosixFilePermission> permissions = Files.exists(target) ? Files.getPosixFilePermissions(target)
                : PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(temporary, permissions);
    }

    public static void writeString(Path target, String text) {
        write(target, out -> out.write(text.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
    }
}
