package lotgate.web;

import java.io.IOException;
import java.net.BindException;
import java.net.InetAddress;
import java.net.URI;
import java.nio.file.Path;
import java.security.SecureRandom;
import java.util.HexFormat;
import org.eclipse.jetty.server.HttpConfiguration;
import org.eclipse.jetty.server.HttpConnectionFactory;
import org.eclipse.jetty.server.Server;
import org.eclipse.jetty.server.ServerConnector;
import org.eclipse.jetty.util.thread.QueuedThreadPool;

/**
 * The local web workbench: an HTTP server on one address that serves the plan design, sentencing and
 * supplier pages and calls the same jobs as the commands.
 */
public final class Workbench implements AutoCloseable {
    /** The port tried first; when it is taken the system gives a free one. */
    public static final int DEFAULT_PORT = 7717;
    /** Largest inspection sheet accepted by upload, in bytes (64 MiB). */
    public static final long DEFAULT_UPLOAD_LIMIT = 64L * 1024 * 1024;

    static {
        // Jetty logs through SLF4J; lotgate has no log, so keep SLF4J from warning that none is bound.
        System.setProperty("slf4j.internal.verbosity", "ERROR");
        System.setProperty("log4j.provider", "org.apache.logging.log4j.simple.internal.SimpleProvider");
        System.setProperty("log4j2.simplelogLevel", "OFF");
    }

    private final Server server;
    private final Settings settings;
    private final URI address;

    /**
     * What a workbench serves and where.
     *
     * @param host the address to bind to
     * @param port the port, DEFAULT_PORT, or 0 for any free one
     * @param accessToken the token every request must carry, or null on loopback
     * @param store the history store's location, as the commands' --store
     * @param plans the folder of saved plans
     * @param uploadLimit the largest upload accepted, in bytes
     * @param work a folder for the reports the workbench writes
     */
    public record Settings(InetAddress host, int port, String accessToken, String store, Path plans,
            long uploadLimit, Path work) {
        public Settings {
            if (!host.isLoopbackAddress() && (accessToken == null || accessToken.length() < 16)) {
                throw new IllegalArgumentException("a workbench open beyond loopback needs an access token");
            }
        }

        boolean loopback() {
            return host.isLoopbackAddress();
        }
    }

    private Workbench(Server server, Settings settings, URI address) {
        this.server = server;
        this.settings = settings;
        this.address = address;
    }

    /** Starts a workbench; a taken default port gives way to a free one. */
    public static Workbench start(Settings settings) throws Exception {
        try {
            return startOn(settings, settings.port());
        } catch (IOException e) {
            if (settings.port() == DEFAULT_PORT && isBindFailure(e)) {
                return startOn(settings, 0);
            }
            throw e;
        }
    }

    private static boolean isBindFailure(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof BindException) {
                return true;
            }
        }
        return false;
    }

    private static Workbench startOn(Settings settings, int port) throws Exception {
        QueuedThreadPool threads = new QueuedThreadPool(64, 4);
        threads.setName("workbench");
        threads.setDaemon(true);
        Server server = new Server(threads);
        HttpConfiguration http = new HttpConfiguration();
        http.setSendServerVersion(false);
        http.setSendXPoweredBy(false);
        ServerConnector connector = new ServerConnector(server, new HttpConnectionFactory(http));
        connector.setHost(settings.host().getHostAddress());
        connector.setPort(port);
        server.addConnector(connector);
        server.setStopAtShutdown(false);
        Site site = new Site(settings);
        server.setHandler(new Dispatch(new Guard(settings, site.csrfToken()), site));
        try {
            server.start();
        } catch (Exception e) {
            server.stop();
            throw e;
        }
        String host = settings.host().getHostAddress();
        if (host.contains(":")) {
            host = "[" + host + "]";
        }
        URI address = URI.create("http://" + host + ":" + connector.getLocalPort() + "/");
        return new Workbench(server, settings, address);
    }

    /** The address the workbench answers on, without the token. */
    public URI address() {
        return address;
    }

    /** The address to open in a browser: with the access token where one is needed. */
    public URI openingAddress() {
        return settings.accessToken() == null ? address
                : URI.create(address + "?token=" + settings.accessToken());
    }

    /** Blocks until the server stops. */
    public void join() throws InterruptedException {
        server.join();
    }

    @Override
    public void close() throws Exception {
        server.stop();
    }

    /** A fresh random access token: 32 hexadecimal digits from a strong generator. */
    public static String newToken() {
        byte[] bytes = new byte[16];
        new SecureRandom().nextBytes(bytes);
        return HexFormat.of().formatHex(bytes);
    }
}
