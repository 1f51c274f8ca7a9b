package lotgate.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine.IVersionProvider;

/** The tool's version, from the build, quoted in every saved plan and decision. */
public final class Version implements IVersionProvider {

    /** The version string, such as "0.1.0". */
    public static String number() {
        try (InputStream in = Version.class.getResourceAsStream("/lotgate/version.properties")) {
            Properties properties = new Properties();
            if (in != null) {
                properties.load(in);
            }
            return properties.getProperty("version", "development");
        } catch (IOException e) {
            return "development";
        }
    }

    @Override
    public String[] getVersion() {
        return new String[] {"lotgate " + number()};
    }
}
