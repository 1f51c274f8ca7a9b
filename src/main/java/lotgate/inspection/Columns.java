package lotgate.inspection;

import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;

/**
 * Which header names stand for which column of an inspection sheet. The default names are the
 * roles' own (unit, result, critical, major, minor, defect, note, value); a site may map its own.
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

    private Columns() {
        for (Role role : Role.values()) {
            names.put(role, role.label());
        }
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
