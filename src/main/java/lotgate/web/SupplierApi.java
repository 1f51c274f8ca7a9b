package lotgate.web;

/** Supplier answers: the ranking, one supplier's audit, its report downloads, and the store's state. */
final class SupplierApi {
    private final Workbench.Settings settings;

    SupplierApi(Workbench.Settings settings) {
        this.settings = settings;
    }

    Reply ranking() {
        return Reply.text(503, "not ready " + settings.store());
    }

    Reply audit(String name) {
        return Reply.text(503, "not ready");
    }

    Reply store() {
        return Reply.text(503, "not ready");
    }

    Reply report(String name, String as) {
        return Reply.text(404, "no such report");
    }
}
