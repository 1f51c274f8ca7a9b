package lotgate.history;

/** The history store cannot be opened, read or written; the message names the store. */
public class StoreException extends RuntimeException {
    public StoreException(String message, Throwable cause) {
        super(message, cause);
    }

    public StoreException(String message) {
        super(message);
    }

    /** The store named does not exist (and was not to be created); the message names where it was looked for. */
    public static final class Missing extends StoreException {
        public Missing(String message) {
            super(message);
        }
    }

    /**
     * The lot is already recorded and its record is not superseded: the database's one-record-per-lot
     * constraint refused a second one. The message names the record and how to correct it.
     */
    public static final class DuplicateLot extends StoreException {
        private final long existing;

        public DuplicateLot(String message, long existing) {
            super(message);
            this.existing = existing;
        }

        /** The sequence number of the record that holds the lot. */
        public long existing() {
            return existing;
        }
    }
}
