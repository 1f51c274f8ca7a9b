package lotgate.inspection;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;

/**
 * How an inspection sheet's table is laid out: which header names stand for which column (the default names
 * are the roles' own: unit, result, critical, major, minor, defect, note, value; a site may map its own), which
 * row holds them (searched for, or given), how a CSV sheet separates its values (decided, or given), and which
 * words a result column holds.
 */
public record Columns(Map<Role, String> names, int headerRow, Character delimiter, ResultWords resultWords) {

    /** What a column of an inspection sheet holds. */
    public enum Role {
        UNIT, RESULT, CRITICAL, MAJOR, MINOR, DEFECT, NOTE, VALUE;

        public String label() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /**
     * The header name of each role, the header's sheet row (1 for the first; 0: searched for), the CSV separator
     * given (null: decided from the header row) and the result words.
     */
    public Columns {
        if (headerRow < 0 || headerRow > Cell.MAX_ROW) {
            throw new IllegalArgumentException("header row " + headerRow + " is not a row of a sheet (1 to "
                    + Cell.MAX_ROW + ")");
        }
        names = Collections.unmodifiableMap(new EnumMap<>(names));
        Objects.requireNonNull(resultWords, "resultWords");
    }

    /** These columns with the header on the given sheet row (1 for the first; 0: searched for). */
    public Columns withHeaderRow(int row) {
        return new Columns(names, row, delimiter, resultWords);
    }

    /** These columns, a CSV sheet's values separated by the character given rather than a decided one. */
    public Columns withDelimiter(char given) {
        return new Columns(names, headerRow, given, resultWords);
    }

    /** These columns with the result words given. */
    public Columns withResultWords(ResultWords given) {
        return new Columns(names, headerRow, delimiter, given);
    }

    /** The roles' own names as headers, the header searched for, the separator decided, the standard words. */
    public static Columns standard() {
        Map<Role, String> names = new EnumMap<>(Role.class);
        for (Role role : Role.values()) {
            names.put(role, role.label());
        }
        return new Columns(names, 0, null, ResultWords.standard());
    }

    /**
     * The standard names with a site's own mapping, such as "unit=Serial,result=Outcome".
     *
     * @throws IllegalArgumentException naming the bad pair
     */
    public static Columns mapped(String mapping) {
        Map<Role, String> names = new EnumMap<>(standard().names());
        for (String pair : mapping.split(",")) {
            if (pair.isBlank()) {
                continue;
            }
            int equals = pair.indexOf('=');
            if (equals < 0) {
                throw new IllegalArgumentException("'" + pair.trim() + "' is not role=header, as in result=Outcome");
            }
            String roleName = pair.substring(0, equals).trim().toLowerCase(Locale.ROOT);
            Role role = null;
            for (Role candidate : Role.values()) {
                if (candidate.label().equals(roleName)) {
                    role = candidate;
                }
            }
            if (role == null) {
                throw new IllegalArgumentException("unknown column role '" + roleName
                        + "'; use unit, result, critical, major, minor, defect, note or value");
            }
            String header = pair.substring(equals + 1).trim();
            if (header.isEmpty()) {
                throw new IllegalArgumentException("no header name given for " + roleName);
            }
            names.put(role, header);
        }
        return new Columns(names, 0, null, ResultWords.standard());
    }

    /** The role a header names (case and surrounding spaces ignored), or null. */
    Role roleOf(String header) {
        String wanted = normal(header);
        for (Map.Entry<Role, String> entry : names.entrySet()) {
            if (normal(entry.getValue()).equals(wanted)) {
                return entry.getKey();
            }
        }
        return null;
    }

    public String nameOf(Role role) {
        return names.get(role);
    }

    private static String normal(String text) {
        return text.trim().toLowerCase(Locale.ROOT);
    }
}
