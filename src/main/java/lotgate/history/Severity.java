package lotgate.history;

import lotgate.plan.Words;

/** The inspection severity a supplier's part is under, set by the switching rules. */
public enum Severity {
    NORMAL, TIGHTENED, REDUCED, DISCONTINUED;

    public String label() {
        return Words.of(this);
    }

    public static Severity of(String label) {
        return Words.orRefused(Words.named(values(), label), "unknown severity '" + label + "'");
    }
}
