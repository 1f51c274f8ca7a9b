package lotgate.cli;

import lotgate.jobs.ToolVersion;
import picocli.CommandLine.IVersionProvider;

/** The tool's version for --version. */
public final class Version {
    private Version() {
    }

    /** The version string, such as "0.1.0". */
    public static String number() {
        return ToolVersion.number();
    }

    /** The line '--version' prints. */
    static String line() {
        return "lotgate " + number();
    }

    /** The version for picocli's help (kept apart, so that '--version' alone needs no picocli class). */
    static final class Provider implements IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {line()};
        }
    }
}
