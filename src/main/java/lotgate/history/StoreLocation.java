package lotgate.history;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.Properties;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Where a store lives, as a user names it (a SQLite file path or a JDBC URL): the URL to connect
 * to, the text shown to people (its password masked), whether it is durable, and the file to check
 * for existence.
 */
public final class StoreLocation {
    private static final Pattern PASSWORD_PARAMETER = Pattern.compile("(?i)([?&;]password=)([^&;\\s]*)");
    private static final Pattern USER_INFO = Pattern.compile("^(jdbc:[a-z]+://[^/@:]*:)([^/@]*)(@)");
    private static final String MASK = "***";

    private final String given;
    private final String url;
    private final boolean postgres;
    /** The SQLite file, or null for PostgreSQL. */
    private final Path file;
    /** The password in the URL, if any, so that it is never shown (even inside a driver's message). */
    private final String password;

    private StoreLocation(String given, String url, boolean postgres, Path file, String password) {
        this.given = given;
        this.url = url;
        this.postgres = postgres;
        this.file = file;
        this.password = password;
    }

    /** Reads a location; refuses another database and a store that would not outlive the process. */
    public static StoreLocation of(String location) {
        String password = passwordIn(location);
        String shown = masked(location);
        if (location.startsWith("jdbc:postgresql:")) {
            return new StoreLocation(location, location, true, null, password);
        }
        if (location.startsWith("jdbc:sqlite:")) {
            String rest = location.substring("jdbc:sqlite:".length());
            int query = rest.indexOf('?');
            String path = query < 0 ? rest : rest.substring(0, query);
            String lower = rest.toLowerCase(Locale.ROOT);
            if (path.isBlank() || path.equals(":memory:") || path.startsWith("file::memory:")
                    || lower.contains("mode=memory") || path.startsWith(":resource:")) {
                throw new StoreException("store " + shown + " is held in memory and would be lost when lotgate ends;"
                        + " name a SQLite file or a PostgreSQL database");
            }
            if (path.startsWith("file:")) {
                path = path.substring("file:".length());
            }
            return new StoreLocation(location, location, false, Path.of(path).toAbsolutePath(), password);
        }
        if (location.startsWith("jdbc:")) {
            throw new StoreException("store " + shown + ": lotgate stores history in SQLite (a file path or"
                    + " jdbc:sqlite:) or PostgreSQL (jdbc:postgresql:)");
        }
        if (location.isBlank()) {
            throw new StoreException("the store's location is empty; name a SQLite file or a PostgreSQL database");
        }
        Path path = Path.of(location).toAbsolutePath();
        return new StoreLocation(location, "jdbc:sqlite:" + path, false, path, null);
    }

    /** The location as shown to people: a password in it replaced by ***. */
    public static String masked(String location) {
        if (location == null) {
            return null;
        }
        String shown = PASSWORD_PARAMETER.matcher(location).replaceAll("$1" + Matcher.quoteReplacement(MASK));
        return USER_INFO.matcher(shown).replaceFirst("$1" + Matcher.quoteReplacement(MASK) + "$3");
    }

    private static String passwordIn(String location) {
        Matcher parameter = PASSWORD_PARAMETER.matcher(location);
        if (parameter.find() && !parameter.group(2).isEmpty()) {
            return java.net.URLDecoder.decode(parameter.group(2), java.nio.charset.StandardCharsets.UTF_8);
        }
        Matcher user = USER_INFO.matcher(location);
        return user.find() && !user.group(2).isEmpty() ? user.group(2) : null;
    }

    public String url() {
        return url;
    }

    public boolean postgres() {
        return postgres;
    }

    /** The SQLite file, or null for a PostgreSQL store. */
    public Path file() {
        return file;
    }

    /** The location as the user gave it, its password masked. */
    public String shown() {
        return masked(given);
    }

    /** A text (such as a driver's message) with this location's password masked wherever it appears. */
    public String scrub(String text) {
        if (text == null) {
            return null;
        }
        String scrubbed = text;
        if (password != null && password.length() >= 3) {
            scrubbed = scrubbed.replace(password, MASK);
        }
        return masked(scrubbed).replace(given, shown());
    }

    /**
     * The connection properties for PostgreSQL: the password from the environment (PGPASSWORD) when the
     * URL gives none; without either, the driver reads the PostgreSQL password file (PGPASSFILE, else
     * ~/.pgpass).
     */
    Properties postgresProperties(Map<String, String> environment) {
        Properties properties = new Properties();
        String fromEnvironment = environment.get("PGPASSWORD");
        if (password == null && fromEnvironment != null && !fromEnvironment.isEmpty()) {
            properties.setProperty("password", fromEnvironment);
        }
        return properties;
    }

    @Override
    public String toString() {
        return shown();
    }
}
