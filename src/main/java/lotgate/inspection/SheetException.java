package lotgate.inspection;

import java.nio.file.Path;
import lotgate.files.InputFileException;

/** An inspection sheet cannot be read or holds a bad value; the message names file, sheet and cell. */
public class SheetException extends InputFileException {
    public SheetException(Path file, String problem) {
        super(file, problem);
    }

    public SheetException(Path file, String problem, Throwable cause) {
        super(file, problem, cause);
    }
}
