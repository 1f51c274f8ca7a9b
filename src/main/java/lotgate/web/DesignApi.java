package lotgate.web;

import java.nio.file.Path;
import java.util.Map;
import java.util.regex.Pattern;

/** The plan design answers: a design as the user types, saving, listing and opening saved plans. */
final class DesignApi {
    private static final Pattern PLAN_NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9_-]{0,79}");
    private final Workbench.Settings settings;

    DesignApi(Workbench.Settings settings) {
        this.settings = settings;
    }

    /**
     * The plan file a name stands for: always directly inside the plans folder. A name that holds
     * anything but letters, digits, '-' and '_' (a path, a dot, a slash) is refused.
     */
    static Path planFile(Path plans, String name) {
        if (name == null || name.isBlank()) {
            throw new FieldError("name", "give the plan a name");
        }
        if (!PLAN_NAME.matcher(name).matches()) {
            throw new FieldError("name", "the plan name '" + name + "' may hold only letters, digits, '-' and '_'"
                    + " (up to 80; it names a file in the plans folder)");
        }
        return plans.resolve(name + ".json");
    }

    Reply design(Map<String, String> fields) {
        return Reply.text(503, "not ready");
    }

    Reply save(Map<String, String> fields) {
        try {
            planFile(settings.plans(), fields.get("name"));
        } catch (FieldError e) {
            return e.reply();
        }
        return Reply.text(503, "not ready");
    }

    Reply list() {
        return JsonText.ok(Map.of("plans", java.util.List.of()));
    }

    Reply open(String name) {
        try {
            planFile(settings.plans(), name);
        } catch (FieldError e) {
            return e.reply();
        }
        return Reply.text(503, "not ready");
    }
}
