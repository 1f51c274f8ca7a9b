package lotgate.history;

/** The history store cannot be opened, read or written; the message names the store. */
public final class StoreException extends RuntimeException {
    public StoreException(String message, Throwable cause) {
        super(message, cause);
    }

    public StoreException(String message) {
        super(message);
    }
}
