package lotgate.plan;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Map;
import lotgate.files.AtomicWrite;
import lotgate.files.InputFileException;
import lotgate.files.JsonTree;

/**
 * A plan family (format "lotgate-plan-family", version 1): the normal, tightened and reduced variants
 * of a plan, each a saved plan file named with its fingerprint, and the switching rules that choose
 * between them. Paths are relative to the family file's folder.
 *
 * @param switching the rules' numbers as a JSON object (edition and counts), read by the history
 */
public record PlanFamily(Path file, Map<String, SavedPlan> variants, Map<String, Path> files, JsonNode switching) {
    public static final String FORMAT = "lotgate-plan-family";
    private static final String[] SEVERITIES = {"normal", "tightened", "reduced"};

    /** Whether a JSON file is a plan family rather than a plan. */
    public static boolean isFamily(Path file) {
        try {
            if (!Files.isRegularFile(file) || Files.size(file) > (1 << 20)) {
                return false;
            }
            return FORMAT.equals(JsonTree.strict(PlanFormat.withoutByteOrderMark(Files.readString(file))).path("format").asText());
        } catch (IOException e) {
            return false;
        }
    }

    public static void write(Path file, Map<String, Path> plans, JsonNode switching) {
        ObjectNode root = JsonNodeFactory.instance.objectNode();
        root.put("format", FORMAT);
        root.put("formatVersion", 1);
        ObjectNode variants = root.putObject("variants");
        Path folder = file.toAbsolutePath().getParent();
        for (String severity : SEVERITIES) {
            Path plan = plans.get(severity);
            if (plan == null) {
                continue;
            }
            SavedPlan saved = PlanFormat.read(plan);
            ObjectNode entry = variants.putObject(severity);
            entry.put("file", folder.relativize(plan.toAbsolutePath()).toString());
            entry.put("fingerprint", saved.fingerprint());
        }
        root.set("switching", switching);
        AtomicWrite.writeString(file, JsonTree.indented(root) + "\n");
    }

    /** Reads a family and every plan it names, checking each plan's fingerprint against the family's. */
    public static PlanFamily read(Path file) {
        JsonNode root;
        try {
            root = JsonTree.strict(PlanFormat.withoutByteOrderMark(Files.readString(file)));
        } catch (NoSuchFileException e) {
            throw new InputFileException(file, "no such plan family file");
        } catch (IOException e) {
            throw new InputFileException(file, "not a valid plan family file (" + e.getMessage().lines().findFirst()
                    .orElse("") + ")");
        }
        if (!FORMAT.equals(root.path("format").asText()) || root.path("formatVersion").asInt() != 1) {
            throw new InputFileException(file, "not a plan family file of version 1");
        }
        JsonNode variants = root.path("variants");
        if (!variants.has("normal")) {
            throw new InputFileException(file, "a plan family needs at least its normal variant");
        }
        Map<String, SavedPlan> plans = new java.util.LinkedHashMap<>();
        Map<String, Path> files = new java.util.LinkedHashMap<>();
        Path folder = file.toAbsolutePath().getParent();
        for (String severity : SEVERITIES) {
            JsonNode entry = variants.get(severity);
            if (entry == null) {
                continue;
            }
            Path plan = folder.resolve(entry.path("file").asText());
            SavedPlan saved = PlanFormat.read(plan);
            if (!saved.fingerprint().equals(entry.path("fingerprint").asText())) {
                throw new InputFileException(file, "the " + severity + " plan " + plan + " is not the plan the family"
                        + " was made with (its fingerprint differs); make the family again with 'lotgate family'");
            }
            plans.put(severity, saved);
            files.put(severity, plan);
        }
        JsonNode switching = root.path("switching");
        return new PlanFamily(file, plans, files, switching.isMissingNode() ? null : switching);
    }

}
