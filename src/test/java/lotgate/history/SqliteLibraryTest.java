package lotgate.history;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The SQLite driver's native library, extracted once into the user's cache and checked before each use. */
class SqliteLibraryTest {

    @Test
    void theLibraryIsExtractedOnceAndReusedWhileItMatchesTheJar(@TempDir Path cache) throws Exception {
        Path first = SqliteLibrary.cached(cache);
        assertNotNull(first);
        assertEquals(cache.resolve("sqlite"), first.getParent().getParent());
        FileTime written = FileTime.fromMillis(1_000_000L);
        Files.setLastModifiedTime(first, written);
        Path second = SqliteLibrary.cached(cache);
        assertEquals(first, second);
        assertEquals(written, Files.getLastModifiedTime(second), "a matching library is not written again");
    }

    @Test
    void aDamagedLibraryIsExtractedAgain(@TempDir Path cache) throws Exception {
        Path library = SqliteLibrary.cached(cache);
        byte[] good = Files.readAllBytes(library);
        byte[] bad = good.clone();
        bad[bad.length / 2] ^= 1;
        Files.write(library, bad);
        assertEquals(library, SqliteLibrary.cached(cache));
        assertArrayEquals(good, Files.readAllBytes(library));
        Files.write(library, new byte[10]);
        SqliteLibrary.cached(cache);
        assertArrayEquals(good, Files.readAllBytes(library));
    }

    @Test
    void thePlatformFolderIsTheOneTheDriverItselfWouldChoose() {
        // The reference is the driver's own answer (sqlite-jdbc's OSInfo), which starts a process to find it.
        assertEquals(org.sqlite.util.OSInfo.getNativeLibFolderPathForCurrentOS(), SqliteLibrary.platformFolder());
    }

    @Test
    void noCacheFolderLeavesTheDriverToItself() throws Exception {
        assertEquals(null, SqliteLibrary.cached(null));
    }
}
