package lotgate.tables;

import java.util.Locale;

/** The inspection levels of the attribute sampling tables: general I, II, III and special S-1 to S-4. */
public enum InspectionLevel {
    S1("S-1"), S2("S-2"), S3("S-3"), S4("S-4"), I("I"), II("II"), III("III");

    private final String label;

    InspectionLevel(String label) {
        this.label = label;
    }

    /** The level as the tables print it: I, II, III, S-1 ... S-4. */
    public String label() {
        return label;
    }

    public boolean special() {
        return ordinal() <= S4.ordinal();
    }

    /** Reads I, II, III, S-1 ... S-4 (also s1, S1, 1, 2, 3 for the general levels), or throws naming them. */
    public static InspectionLevel parse(String text) {
        String t = text.trim().toUpperCase(Locale.ROOT).replace("-", "").replace(" ", "");
        switch (t) {
            case "1": return I;
            case "2": return II;
            case "3": return III;
            default: break;
        }
        for (InspectionLevel level : values()) {
            if (level.label.replace("-", "").equals(t)) {
                return level;
            }
        }
        throw new IllegalArgumentException("'" + text + "' is not an inspection level; use I, II, III (general) or"
                + " S-1, S-2, S-3, S-4 (special)");
    }
}
