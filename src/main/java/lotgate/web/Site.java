package lotgate.web;

import java.io.IOException;

/** The workbench's pages and its JSON answers, by path. */
final class Site {
    private final Workbench.Settings settings;
    private final String csrfToken = Workbench.newToken();
    private final Assets assets = new Assets();
    private final Uploads uploads;
    private final DesignApi design;
    private final SentenceApi sentence;
    private final SupplierApi suppliers;

    Site(Workbench.Settings settings) throws IOException {
        this.settings = settings;
        this.uploads = new Uploads(settings.uploadLimit());
        this.design = new DesignApi(settings);
        this.sentence = new SentenceApi(settings, uploads);
        this.suppliers = new SupplierApi(settings);
    }

    String csrfToken() {
        return csrfToken;
    }

    Reply answer(Exchange exchange) throws Exception {
        String path = exchange.path();
        boolean get = !exchange.method().equals("POST");
        if (get && path.startsWith("/assets/")) {
            Reply asset = assets.get(path.substring("/assets/".length()));
            return asset != null ? asset : notFound();
        }
        if (get) {
            switch (path) {
                case "/":
                    return Reply.html(Pages.design(csrfToken, settings));
                case "/sentence":
                    return Reply.html(Pages.sentence(csrfToken));
                case "/suppliers":
                    return Reply.html(Pages.suppliers(csrfToken));
                case "/supplier":
                    return Reply.html(Pages.supplier(csrfToken, exchange.query("name")));
                case "/api/design":
                    return design.design(exchange.queryParameters());
                case "/api/plans":
                    return design.list();
                case "/api/plan":
                    return design.open(exchange.query("name"));
                case "/api/suppliers":
                    return suppliers.ranking();
                case "/api/supplier":
                    return suppliers.audit(exchange.query("name"));
                case "/api/store":
                    return suppliers.store();
                case "/download/supplier":
                    return suppliers.report(exchange.query("name"), exchange.query("as"));
                case "/download/lot":
                    return sentence.report(exchange.query("id"), exchange.query("as"));
                default:
                    return notFound();
            }
        }
        switch (path) {
            case "/api/plans":
                return design.save(exchange.form());
            case "/api/sentence":
                return sentence.sentence(exchange);
            case "/api/bench":
                return sentence.bench(exchange.form());
            default:
                return notFound();
        }
    }

    private static Reply notFound() {
        return Reply.text(404, "the workbench has no such page");
    }
}
