package lotgate.tables;

import lotgate.plan.Words;

/** The sampling schemes the tables are kept for here: single and double. */
public enum TableScheme {
    SINGLE, DOUBLE;

    public String word() {
        return Words.of(this);
    }

    public static TableScheme parse(String text) {
        return Words.orRefused(Words.read(values(), text), "'" + text + "' is not a scheme the tables are kept for"
                + " here; use single or double");
    }
}
