package lotgate.tables;

import java.util.Locale;

/** The sampling schemes the tables are kept for here: single and double. */
public enum TableScheme {
    SINGLE, DOUBLE;

    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static TableScheme parse(String text) {
        for (TableScheme scheme : values()) {
            if (scheme.word().equals(text.trim().toLowerCase(Locale.ROOT))) {
                return scheme;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not a scheme the tables are kept for here; use single"
                + " or double");
    }
}
