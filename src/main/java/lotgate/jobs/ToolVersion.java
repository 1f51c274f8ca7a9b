package lotgate.jobs;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;

/** The tool's version, from the build, quoted in every saved plan and decision. */
public final class ToolVersion {
    private ToolVersion() {
    }

    /** The version string, such as "0.1.0", or "development" outside a build. */
    public static String number() {
        // The jar's manifest names it, and for classes mapped from the class-data archive the JVM holds that
        // manifest already: reading the resource instead would open lotgate.jar's index of 18,000 entries.
        String fromManifest = ToolVersion.class.getPackage().getImplementationVersion();
        if (fromManifest != null) {
            return fromManifest;
        }
        try (InputStream in = ToolVersion.class.getResourceAsStream("/lotgate/version.properties")) {
            Properties properties = new Properties();
            if (in != null) {
                properties.load(in);
            }
            return properties.getProperty("version", "development");
        } catch (IOException e) {
            return "development";
        }
    }
}
