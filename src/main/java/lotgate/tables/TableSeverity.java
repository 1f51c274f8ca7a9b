package lotgate.tables;

import java.util.Locale;

/** The three severities of inspection that the tables give plans for. */
public enum TableSeverity {
    NORMAL, TIGHTENED, REDUCED;

    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static TableSeverity parse(String text) {
        for (TableSeverity severity : values()) {
            if (severity.word().equals(text.trim().toLowerCase(Locale.ROOT))) {
                return severity;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not a severity; use normal, tightened or reduced");
    }
}
