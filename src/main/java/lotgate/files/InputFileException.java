package lotgate.files;

import java.nio.file.Path;

/** An input file is missing, unreadable or invalid; the message names the file and what is wrong. */
public class InputFileException extends RuntimeException {
    private final transient Path file;

    public InputFileException(Path file, String problem) {
        super(file + ": " + problem);
        this.file = file;
    }

    public InputFileException(Path file, String problem, Throwable cause) {
        super(file + ": " + problem, cause);
        this.file = file;
    }

    public Path file() {
        return file;
    }
}
