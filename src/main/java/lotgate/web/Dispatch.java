package lotgate.web;

import java.io.InputStream;
import java.nio.ByteBuffer;
import java.util.LinkedHashMap;
import java.util.Map;
import org.eclipse.jetty.http.HttpCookie;
import org.eclipse.jetty.http.HttpHeader;
import org.eclipse.jetty.server.Handler;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.util.Callback;
import org.eclipse.jetty.util.Fields;

/** The one Jetty handler: turns a request into an Exchange, lets the guard and the site answer it. */
final class Dispatch extends Handler.Abstract {
    private final Guard guard;
    private final Site site;

    Dispatch(Guard guard, Site site) {
        super(InvocationType.BLOCKING);
        this.guard = guard;
        this.site = site;
    }

    @Override
    public boolean handle(Request request, Response response, Callback callback) {
        Reply reply;
        try {
            Exchange exchange = exchange(request);
            reply = guard.check(exchange);
            if (reply == null) {
                reply = site.answer(exchange);
            }
        } catch (Exchange.Refusal refusal) {
            reply = refusal.reply();
        } catch (Exception | Error e) {
            reply = Reply.text(500, "internal fault: " + e.getClass().getSimpleName()
                    + " (run the command for the same job with --debug and report it)");
        }
        write(request, response, callback, reply);
        return true;
    }

    private static Exchange exchange(Request request) {
        Map<String, String> query = new LinkedHashMap<>();
        Fields fields = Request.extractQueryParameters(request);
        for (Fields.Field field : fields) {
            query.put(field.getName(), field.getValue());
        }
        Map<String, String> cookies = new LinkedHashMap<>();
        for (HttpCookie cookie : Request.getCookies(request)) {
            cookies.putIfAbsent(cookie.getName(), cookie.getValue());
        }
        InputStream body = Request.asInputStream(request);
        return new Exchange(request.getMethod(), Request.getPathInContext(request), query,
                name -> request.getHeaders().get(name), cookies, request.getLength(), body);
    }

    private static void write(Request request, Response response, Callback callback, Reply reply) {
        response.setStatus(reply.status());
        response.getHeaders().put(HttpHeader.CONTENT_TYPE, reply.contentType());
        Guard.headers().forEach((name, value) -> response.getHeaders().put(name, value));
        if (!reply.headers().containsKey("Cache-Control")) {
            response.getHeaders().put(HttpHeader.CACHE_CONTROL, "no-store");
        }
        reply.headers().forEach((name, value) -> response.getHeaders().put(name, value));
        byte[] body = request.getMethod().equals("HEAD") ? new byte[0] : reply.body();
        response.getHeaders().put(HttpHeader.CONTENT_LENGTH, reply.body().length);
        response.write(true, ByteBuffer.wrap(body), callback);
    }
}
