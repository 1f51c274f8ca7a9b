package lotgate.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.net.InetAddress;
import java.net.UnknownHostException;
import java.nio.file.Path;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * Starts the local web workbench. The server classes load only here, so the other commands start as
 * fast as before.
 */
@Command(name = "workbench",
        header = "Open the web workbench: design plans, sentence lots and read suppliers' records in a browser.",
        description = {"Serves the workbench on this machine (127.0.0.1) and opens it in the default browser;"
                + " it runs until you press Ctrl+C. The pages call the same jobs as the commands, with the same"
                + " plans folder and history store.",
                "",
                "--bind opens it to other stations of the plant: every request must then carry the access"
                + " token printed at start (or set in $LOTGATE_WORKBENCH_TOKEN).", ""})
final class WorkbenchCommand implements Runnable {
    @Option(names = "--port", paramLabel = "N", defaultValue = "7717",
            description = "The port (default ${DEFAULT-VALUE}; a free one when it is taken; 0 for any free one).")
    int port;

    @Option(names = "--no-browser", description = "Do not open a browser; only print the address.")
    boolean noBrowser;

    @Option(names = "--bind", paramLabel = "ADDRESS",
            description = "Listen on this address instead of 127.0.0.1, e.g. the station's own address: other"
                    + " machines can then reach the workbench, with the access token.")
    String bind;

    @Option(names = "--plans", paramLabel = "FOLDER", defaultValue = "plans",
            description = "The folder of saved plans and plan families (default ${DEFAULT-VALUE}).")
    Path plans;

    @Option(names = "--reports", paramLabel = "FOLDER", defaultValue = "reports",
            description = "Where lot and supplier reports made in the workbench are written (default ${DEFAULT-VALUE}).")
    Path reports;

    @Option(names = "--upload-limit", paramLabel = "MIB", defaultValue = "64",
            description = "The largest inspection sheet accepted, in MiB (default ${DEFAULT-VALUE}).")
    int uploadLimit;

    @Mixin
    RecordingStoreOption storeOption;

    @Spec
    CommandSpec spec;

    /** The environment variable that may set the access token for a workbench open to the network. */
    static final String TOKEN_VARIABLE = "LOTGATE_WORKBENCH_TOKEN";

    @Override
    public void run() {
        if (port < 0 || port > 65535) {
            throw new ParameterException(spec.commandLine(), "--port " + port + " is not a port; give 1 to 65535,"
                    + " or 0 for any free port");
        }
        if (uploadLimit < 1 || uploadLimit > 4096) {
            throw new ParameterException(spec.commandLine(), "--upload-limit " + uploadLimit
                    + " must be between 1 and 4096 MiB");
        }
        InetAddress host = address();
        // The pages record lots: the store must exist, or be created where the other recording commands would.
        storeOption.prepareForRecording();
        String token = null;
        PrintWriter err = spec.commandLine().getErr();
        if (!host.isLoopbackAddress()) {
            String given = System.getenv(TOKEN_VARIABLE);
            if (given != null && !given.isBlank() && given.trim().length() < 16) {
                throw new ParameterException(spec.commandLine(), "$" + TOKEN_VARIABLE
                        + " must be at least 16 characters long");
            }
            token = given != null && !given.isBlank() ? given.trim() : null;
            err.println("lotgate: warning: the workbench listens on " + host.getHostAddress() + ", open to other"
                    + " machines; every request needs the access token, so share the address below only with the"
                    + " stations that should sentence lots and read the history");
            err.flush();
        }
        try {
            lotgate.web.Serve.run(host, port, token, storeOption.location(), plans.toAbsolutePath().normalize(),
                    reports.toAbsolutePath().normalize(), uploadLimit * 1024L * 1024L, !noBrowser,
                    spec.commandLine().getOut(), err);
        } catch (IOException e) {
            throw new ParameterException(spec.commandLine(), "the workbench cannot listen on "
                    + host.getHostAddress() + " port " + port + " (" + e.getMessage() + "); choose another --port"
                    + " or --bind");
        }
    }

    private InetAddress address() {
        if (bind == null) {
            return InetAddress.getLoopbackAddress();
        }
        try {
            return InetAddress.getByName(bind.trim());
        } catch (UnknownHostException e) {
            throw new ParameterException(spec.commandLine(), "--bind " + bind + " is not an address of this machine");
        }
    }
}
