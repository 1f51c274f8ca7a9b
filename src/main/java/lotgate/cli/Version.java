package lotgate.cli;

import lotgate.jobs.ToolVersion;
import picocli.CommandLine.IVersionProvider;

/** The tool's version for --version. */
public final class Version implements IVersionProvider {

    /** The version string, such as "0.1.0". */
    public static String number() {
        return ToolVersion.number();
    }

    @Override
    public String[] getVersion() {
        return new String[] {"lotgate " + number()};
    }
}
