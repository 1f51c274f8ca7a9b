package lotgate.tables;

import lotgate.plan.Words;

/** The three severities of inspection that the tables give plans for. */
public enum TableSeverity {
    NORMAL, TIGHTENED, REDUCED;

    public String word() {
        return Words.of(this);
    }

    public static TableSeverity parse(String text) {
        return Words.orRefused(Words.read(values(), text), "'" + text + "' is not a severity; use normal, tightened"
                + " or reduced");
    }
}
