package lotgate.web;

import java.io.IOException;
import java.io.PrintWriter;
import java.net.InetAddress;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.CountDownLatch;

/**
 * The workbench command's whole run, behind one method of plain JDK types, so that the command's class
 * can be loaded (as every command is at start) without loading any class of the server.
 */
public final class Serve {
    private Serve() {
    }

    /**
     * Starts the workbench, prints its address on one line, opens a browser when asked, and blocks until
     * the process is interrupted (SIGINT or SIGTERM), when it stops the server cleanly.
     *
     * @param token the access token for an address beyond loopback, or null for a fresh random one
     * @throws IOException when it cannot listen on that address and port
     */
    public static void run(InetAddress host, int port, String token, String store, Path plans, Path reports,
            long uploadLimit, boolean openBrowser, PrintWriter out, PrintWriter err) throws IOException {
        String access = host.isLoopbackAddress() ? null : token != null ? token : Workbench.newToken();
        Workbench.Settings settings = new Workbench.Settings(host, port, access, store, plans, uploadLimit, reports);
        Workbench workbench;
        try {
            workbench = Workbench.start(settings);
        } catch (IOException e) {
            throw e;
        } catch (Exception e) {
            throw new IOException(e.getMessage(), e);
        }
        CountDownLatch stopped = new CountDownLatch(1);
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            try {
                workbench.close();
            } catch (Exception e) {
                // Stopping anyway.
            }
            try {
                stopped.await();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "workbench-stop"));
        out.println("lotgate workbench: " + workbench.openingAddress() + " (Ctrl+C stops it)");
        out.flush();
        if (openBrowser) {
            openBrowser(workbench.openingAddress().toString(), err);
        }
        try {
            workbench.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } finally {
            stopped.countDown();
        }
    }

    private static void openBrowser(String address, PrintWriter err) {
        String os = System.getProperty("os.name", "").toLowerCase(Locale.ROOT);
        String[] command = os.contains("win") ? new String[] {"rundll32", "url.dll,FileProtocolHandler", address}
                : os.contains("mac") ? new String[] {"open", address} : new String[] {"xdg-open", address};
        try {
            new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        } catch (IOException e) {
            err.println("lotgate: no browser could be opened; open " + address + " yourself");
            err.flush();
        }
    }
}
