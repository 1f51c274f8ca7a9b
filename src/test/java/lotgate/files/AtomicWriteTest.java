package lotgate.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Writing whole files: missing folders are made, and a file in the way of a folder is named. */
class AtomicWriteTest {
    @TempDir
    Path folder;

    @Test
    void missingFoldersAreMade() throws IOException {
        Path target = folder.resolve("plans/receiving/bolts.json");
        AtomicWrite.writeString(target, "{}");
        assertEquals("{}", Files.readString(target));
    }

    @Test
    void aFileWhereAFolderShouldBeIsNamed() throws IOException {
        Path file = folder.resolve("afile");
        Files.writeString(file, "text");
        Path target = file.resolve("bolts.json");
        OutputFileException refused = assertThrows(OutputFileException.class,
                () -> AtomicWrite.writeString(target, "{}"));
        assertEquals("cannot write " + target + ": " + file + " is a file, not a folder", refused.getMessage());
        assertEquals("text", Files.readString(file));
        assertFalse(Files.isDirectory(file));
    }
}
