package lotgate.inspection;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import java.util.zip.ZipOutputStream;

/** Hand-crafted .xlsx packages for tests: one entry rewritten (or added), the others kept. */
final class Packages {
    private Packages() {
    }

    static Path withEntry(Path xlsx, String entry, byte[] content, Path out) throws IOException {
        try (ZipFile zip = new ZipFile(xlsx.toFile());
                ZipOutputStream target = new ZipOutputStream(Files.newOutputStream(out))) {
            for (var e = zip.entries(); e.hasMoreElements();) {
                ZipEntry item = e.nextElement();
                target.putNextEntry(new ZipEntry(item.getName()));
                if (item.getName().equals(entry)) {
                    target.write(content);
                } else {
                    zip.getInputStream(item).transferTo(target);
                }
                target.closeEntry();
            }
            if (zip.getEntry(entry) == null) {
                target.putNextEntry(new ZipEntry(entry));
                target.write(content);
                target.closeEntry();
            }
        }
        return out;
    }
}
