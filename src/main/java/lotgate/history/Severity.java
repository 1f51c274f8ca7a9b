package lotgate.history;

import java.util.Locale;

/** The inspection severity a supplier's part is under, set by the switching rules. */
public enum Severity {
    NORMAL, TIGHTENED, REDUCED, DISCONTINUED;

    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static Severity of(String label) {
        for (Severity severity : values()) {
            if (severity.label().equals(label)) {
                return severity;
            }
        }
        throw new IllegalArgumentException("unknown severity '" + label + "'");
    }
}
