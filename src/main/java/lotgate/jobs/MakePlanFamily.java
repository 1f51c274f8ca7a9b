package lotgate.jobs;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lotgate.history.SwitchingRules;
import lotgate.plan.PlanFamily;

/** Making a plan family: normal, tightened and reduced plans with the switching rules that choose between them. */
public final class MakePlanFamily {

    /**
     * The family file to write, the normal, tightened and reduced (or null) plan files, the switching rules'
     * edition, a site's own numbers for rules as NAME=NUMBER, and whether an existing file may be replaced.
     */
    public record Request(Path file, Path normal, Path tightened, Path reduced, String edition, List<String> rules,
            boolean replace) {
        public Request {
            rules = List.copyOf(rules);
        }
    }

    /** The family as written and read back, with its switching rules. */
    public record Result(Path file, PlanFamily family, ObjectNode switching) {
    }

    private MakePlanFamily() {
    }

    /** Checks the request, writes the family file and reads it back. */
    public static Result run(Request request) {
        Path file = request.file();
        if (!file.getFileName().toString().endsWith(".json")) {
            throw JobException.invalid("file", file + ": a plan family file name must end in .json");
        }
        if (Files.exists(file) && !request.replace()) {
            throw JobException.invalid("file", file + ": the file exists; add --replace to overwrite it");
        }
        ObjectNode json = switchingRules(request).toJson();
        Map<String, Path> plans = new LinkedHashMap<>();
        plans.put("normal", request.normal());
        plans.put("tightened", request.tightened());
        if (request.reduced() != null) {
            plans.put("reduced", request.reduced());
        }
        PlanFamily.write(file, plans, json);
        return new Result(file, PlanFamily.read(file), json);
    }

    private static SwitchingRules switchingRules(Request request) {
        SwitchingRules base;
        try {
            base = SwitchingRules.edition(request.edition());
        } catch (IllegalArgumentException e) {
            throw JobException.invalid("edition", "--switching: " + e.getMessage());
        }
        ObjectNode json = base.toJson();
        for (String rule : request.rules()) {
            String[] pair = rule.split("=");
            if (pair.length != 2 || !json.has(pair[0].trim()) || pair[0].trim().equals("edition")) {
                throw JobException.invalid("rules", "--rule " + rule + ": give NAME=NUMBER with a rule named in"
                        + " --help");
            }
            try {
                json.put(pair[0].trim(), Integer.parseInt(pair[1].trim()));
            } catch (NumberFormatException e) {
                throw JobException.invalid("rules", "--rule " + rule + ": the number is not a whole number");
            }
        }
        json.put("edition", request.rules().isEmpty() ? base.edition() : base.edition() + " with site rules");
        try {
            return SwitchingRules.fromJson(json);
        } catch (IllegalArgumentException e) {
            throw JobException.invalid("rules", "--rule: " + e.getMessage());
        }
    }
}
