package lotgate.web;

import java.util.Map;

/** Sentencing answers: a lot from an uploaded sheet, and unit-by-unit bench entry. */
final class SentenceApi {
    private final Workbench.Settings settings;
    private final Uploads uploads;

    SentenceApi(Workbench.Settings settings, Uploads uploads) {
        this.settings = settings;
        this.uploads = uploads;
    }

    Reply sentence(Exchange exchange) throws java.io.IOException {
        try (Uploads.Sheet sheet = uploads.receive(exchange, exchange.query("file"))) {
            return Reply.text(503, "not ready " + settings.store() + sheet.file().getFileName());
        }
    }

    Reply bench(Map<String, String> fields) {
        return Reply.text(503, "not ready");
    }

    Reply report(String id, String as) {
        return Reply.text(404, "no such report");
    }
}
