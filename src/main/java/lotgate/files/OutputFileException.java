package lotgate.files;

import java.nio.file.Path;

/** An output file could not be written; the message names the file and the cause. */
public final class OutputFileException extends RuntimeException {
    private final transient Path file;

    public OutputFileException(Path file, Throwable cause) {
        super("cannot write " + file + ": " + describe(cause), cause);
        this.file = file;
    }

    private OutputFileException(String message, Path file, Throwable cause) {
        super(message, cause);
        this.file = file;
    }

    /** The same failure with a note on what was done before it and how to finish (e.g. a record committed). */
    public OutputFileException withNote(String note) {
        return new OutputFileException(getMessage() + "; " + note, file, getCause());
    }

    public Path file() {
        return file;
    }

    private static String describe(Throwable cause) {
        if (cause instanceof java.nio.file.AccessDeniedException) {
            return "permission denied";
        }
        if (cause instanceof java.nio.file.FileAlreadyExistsException taken && taken.getFile() != null) {
            return taken.getFile() + " is a file, not a folder";
        }
        if (cause instanceof java.nio.file.NoSuchFileException) {
            return "no such folder";
        }
        if (cause instanceof java.nio.file.FileSystemException fse && fse.getReason() != null) {
            return fse.getReason();
        }
        String message = cause.getMessage();
        return message == null ? cause.getClass().getSimpleName() : message;
    }
}
