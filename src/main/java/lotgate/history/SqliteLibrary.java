package lotgate.history;

import java.io.IOException;
import java.io.InputStream;
import java.net.JarURLConnection;
import java.net.URL;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Locale;
import java.util.jar.JarEntry;
import java.util.zip.CRC32;

/**
 * Keeps the SQLite driver's native library extracted once per user, in the user's cache folder,
 * instead of letting the driver copy it to a temporary file on every run (a third of a second).
 *
 * <p>The folder is {@code $XDG_CACHE_HOME/lotgate/sqlite/} (by default {@code ~/.cache/lotgate/sqlite/}),
 * {@code ~/Library/Caches/lotgate/sqlite/} on macOS and {@code %LOCALAPPDATA%\lotgate\sqlite\} on
 * Windows, with one sub-folder per library named after its checksum and size in the jar. Before each
 * use the cached file is compared with the jar's own CRC-32 of the library, and extracted again when
 * they differ. A SHA-256 of the megabyte would cost more than the extraction it saves in a fresh JVM.
 * When the folder cannot be used, or the user set {@code org.sqlite.lib.path} already, the driver
 * loads its library as it always does.
 */
final class SqliteLibrary {
    private static boolean prepared;

    private SqliteLibrary() {
    }

    /** Points the driver at the cached library, extracting it first when needed; never fails. */
    static synchronized void prepare() {
        if (prepared) {
            return;
        }
        prepared = true;
        if (System.getProperty("org.sqlite.lib.path") != null) {
            return;
        }
        try {
            Path library = cached(cacheFolder());
            if (library != null) {
                System.setProperty("org.sqlite.lib.path", library.getParent().toString());
                System.setProperty("org.sqlite.lib.name", library.getFileName().toString());
            }
        } catch (IOException | RuntimeException e) {
            // The driver's own extraction still works: the cache only saves time.
        }
    }

    /** The user's cache folder for lotgate, or null when the environment names none. */
    static Path cacheFolder() {
        String os = System.getProperty("os.name", "").toLowerCase(Locale.ROOT);
        String home = System.getProperty("user.home");
        if (os.startsWith("windows")) {
            String local = System.getenv("LOCALAPPDATA");
            return local == null || local.isBlank() ? null : Path.of(local, "lotgate");
        }
        if (os.startsWith("mac")) {
            return home == null ? null : Path.of(home, "Library", "Caches", "lotgate");
        }
        String xdg = System.getenv("XDG_CACHE_HOME");
        if (xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute()) {
            return Path.of(xdg, "lotgate");
        }
        return home == null ? null : Path.of(home, ".cache", "lotgate");
    }

    /** The library extracted under the folder and checked against the jar, or null when that cannot be. */
    static Path cached(Path folder) throws IOException {
        if (folder == null) {
            return null;
        }
        String name = System.mapLibraryName("sqlitejdbc").replace(".jnilib", ".dylib");
        String resource = "/org/sqlite/native/" + platformFolder() + "/" + name;
        URL url = org.sqlite.JDBC.class.getResource(resource);
        if (url == null || !(url.openConnection() instanceof JarURLConnection jar)) {
            return null;
        }
        JarEntry entry = jar.getJarEntry();
        long size = entry.getSize();
        long crc = entry.getCrc();
        if (size < 0 || crc < 0) {
            return null;
        }
        Path dir = folder.resolve("sqlite").resolve(String.format(Locale.ROOT, "%08x-%d", crc, size));
        Path library = dir.resolve(name);
        if (Files.isRegularFile(library) && Files.size(library) == size && crc(Files.readAllBytes(library)) == crc) {
            return library;
        }
        byte[] content;
        try (InputStream in = url.openStream()) {
            content = in.readAllBytes();
        }
        if (content.length != size || crc(content) != crc) {
            return null;
        }
        createPrivately(folder);
        Files.createDirectories(dir);
        Path part = Files.createTempFile(dir, name, ".part");
        try {
            Files.write(part, content);
            Files.move(part, library, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(part);
        }
        return library;
    }

    /**
     * The driver's folder name for this platform. The driver's own answer starts a process on Linux
     * (to rule out Android) that costs a short command 10 ms; on the common desktop and server
     * platforms the name follows from the system properties and the C library's loader.
     */
    static String platformFolder() {
        String os = System.getProperty("os.name", "");
        String arch = System.getProperty("os.arch", "");
        boolean android = System.getProperty("java.vm.vendor", "").contains("Android");
        if (os.equals("Linux") && !android) {
            String folder = arch.equals("amd64") || arch.equals("x86_64") ? "x86_64"
                    : arch.equals("aarch64") ? "aarch64" : null;
            if (folder != null && !Files.exists(Path.of("/lib/ld-musl-" + folder + ".so.1"))) {
                return "Linux/" + folder;
            }
        }
        return org.sqlite.util.OSInfo.getNativeLibFolderPathForCurrentOS();
    }

    private static void createPrivately(Path folder) throws IOException {
        if (Files.isDirectory(folder)) {
            return;
        }
        Files.createDirectories(folder.getParent());
        try {
            Files.createDirectory(folder, PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rwx------")));
        } catch (UnsupportedOperationException e) {
            Files.createDirectory(folder);
        } catch (java.nio.file.FileAlreadyExistsException | AccessDeniedException e) {
            if (!Files.isDirectory(folder)) {
                throw e;
            }
        }
    }

    private static long crc(byte[] content) {
        CRC32 crc = new CRC32();
        crc.update(content);
        return crc.getValue();
    }
}
