package lotgate.inspection;

import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;

/**
 * How an inspection sheet's table is laid out: which header names stand for which column (the default names
 * are the roles' own: unit, result, critical, major, minor, defect, note, value; a site may map its own), which
 * row holds them (searched for, or given), how a CSV sheet separates its values (decided, or given), and which
 * words a result column holds.
 */
public final class Columns {

    /** What a column of an inspection sheet holds. */
    public enum Role {
        UNIT, RESULT, CRITICAL, MAJOR, MINOR, DEFECT, NOTE, VALUE;

        public String label() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    private final Map<Role, String> names = new EnumMap<>(Role.class);
    private int headerRow;
    private Character delimiter;
    private ResultWords words = ResultWords.standard();

    private Columns() {
        for (Role role : Role.values()) {
            names.put(role, role.label());
        }
    }

    private Columns copy() {
        Columns copy = new Columns();
        copy.names.putAll(names);
        copy.headerRow = headerRow;
        copy.delimiter = delimiter;
        copy.words = words;
        return copy;
    }

    /** These columns with the header on the given sheet row (1 for the first; 0: searched for). */
    public Columns withHeaderRow(int row) {
        if (row < 0 || row > Cell.MAX_ROW) {
            throw new IllegalArgumentException("header row " + row + " is not a row of a sheet (1 to " + Cell.MAX_ROW
                    + ")");
        }
        Columns copy = copy();
        copy.headerRow = row;
        return copy;
    }

    /** These columns, a CSV sheet's values separated by the character given rather than a decided one. */
    public Columns withDelimiter(char given) {
        Columns copy = copy();
        copy.delimiter = given;
        return copy;
    }

    /** These columns with the result words given. */
    public Columns withResultWords(ResultWords given) {
        Columns copy = copy();
        copy.words = given;
        return copy;
    }

    /** The header's sheet row, or 0 when it is searched for. */
    public int headerRow() {
        return headerRow;
    }

    /** The CSV separator given, or null when it is decided from the header row. */
    public Character delimiter() {
        return delimiter;
    }

    public ResultWords resultWords() {
        return words;
    }

    public static Columns standard() {
        return new Columns();
    }

    /**
     * The standard names with a site's own mapping, such as "unit=Serial,result=Outcome".
     *
     * @throws IllegalArgumentException naming the bad pair
     */
    public static Columns mapped(String mapping) {
        Columns columns = new Columns();
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
            columns.names.put(role, header);
        }
        return columns;
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
