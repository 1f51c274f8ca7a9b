package lotgate.files;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.UUID;
import java.util.function.Consumer;

/**
 * Output files written first under hidden names beside their targets and moved into place together later, so
 * that nothing appears until the work they belong to is committed, and nothing is left when it is not.
 */
public final class StagedFiles implements AutoCloseable {
    private record Staged(Path temporary, Path target) {
    }

    private final List<Staged> staged = new ArrayList<>();

    /** Writes a file through the writer under a hidden name beside the target, keeping the target's ending. */
    public void stage(Path target, Consumer<Path> writer) {
        Path absolute = target.toAbsolutePath();
        Path temporary = absolute.resolveSibling("." + UUID.randomUUID() + "-" + absolute.getFileName());
        staged.add(new Staged(temporary, target));
        try {
            writer.accept(temporary);
        } catch (OutputFileException e) {
            throw new OutputFileException(target, e.getCause() == null ? e : e.getCause());
        }
    }

    /** Moves every staged file into place, in the order staged. */
    public void publish() {
        List<Staged> moving = new ArrayList<>(staged);
        for (Staged file : moving) {
            try {
                try {
                    Files.move(file.temporary(), file.target().toAbsolutePath(), StandardCopyOption.ATOMIC_MOVE,
                            StandardCopyOption.REPLACE_EXISTING);
                } catch (AtomicMoveNotSupportedException e) {
                    Files.move(file.temporary(), file.target().toAbsolutePath(), StandardCopyOption.REPLACE_EXISTING);
                }
            } catch (IOException e) {
                throw new OutputFileException(file.target(), e);
            }
            staged.remove(file);
        }
    }

    /** Removes the staged files that were not published. */
    @Override
    public void close() {
        for (Staged file : staged) {
            try {
                Files.deleteIfExists(file.temporary());
            } catch (IOException ignored) {
                // A stray hidden file is better than hiding the failure that got us here.
            }
        }
        staged.clear();
    }
}
