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

    /** The start of a staged file's name, so that a person who finds one left by a killed run sees what it is. */
    static final String PREFIX = ".lotgate-unfinished-";
    private static final java.util.regex.Pattern LEFTOVER = java.util.regex.Pattern.compile(
            java.util.regex.Pattern.quote(PREFIX) + "([0-9]+)-[0-9a-f]{8}-.+");

    /**
     * Writes a file through the writer under a hidden name beside the target, keeping the target's ending,
     * after removing what runs that have ended (killed before they published) left beside it.
     */
    public void stage(Path target, Consumer<Path> writer) {
        Path absolute = target.toAbsolutePath();
        removeLeftovers(absolute.getParent());
        Path temporary = absolute.resolveSibling(PREFIX + ProcessHandle.current().pid() + "-"
                + UUID.randomUUID().toString().substring(0, 8) + "-" + absolute.getFileName());
        staged.add(new Staged(temporary, target));
        try {
            writer.accept(temporary);
        } catch (OutputFileException e) {
            throw new OutputFileException(target, e.getCause() == null ? e : e.getCause());
        }
    }

    /**
     * Removes the staged files in a folder whose run has ended: their process id (in their name) is no
     * longer running. A file of a run still going is left alone.
     *
     * @return the files removed
     */
    public static List<Path> removeLeftovers(Path folder) {
        List<Path> removed = new ArrayList<>();
        if (folder == null || !Files.isDirectory(folder)) {
            return removed;
        }
        try (java.util.stream.Stream<Path> files = Files.list(folder)) {
            for (Path file : (Iterable<Path>) files::iterator) {
                java.util.regex.Matcher name = LEFTOVER.matcher(file.getFileName().toString());
                if (name.matches() && !running(Long.parseLong(name.group(1)))) {
                    Files.deleteIfExists(file);
                    removed.add(file);
                }
            }
        } catch (IOException | NumberFormatException | java.io.UncheckedIOException e) {
            // Leftovers stay named for what they are; the run itself goes on.
        }
        return removed;
    }

    private static boolean running(long pid) {
        return ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false);
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
