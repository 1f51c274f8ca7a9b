package lotgate.plan;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.HexFormat;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import lotgate.files.AtomicWrite;
import lotgate.files.InputFileException;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SinglePlan;

/**
 * Reads and writes plan files (format "lotgate-plan", version 1) and computes their fingerprint:
 * the SHA-256 of the canonical form, which is the file's JSON without the fingerprint field, with
 * object keys sorted, no white space, and numbers as Jackson writes Java doubles and ints.
 */
public final class PlanFormat {
    public static final String FORMAT = "lotgate-plan";
    public static final int VERSION = 1;
    /** A plan file is a few hundred bytes; anything this large is not one. */
    private static final long LARGEST_FILE = 1 << 20;
    /** Relative agreement required between recorded and recomputed risks. */
    private static final double RISK_TOLERANCE = 1e-9;

    private static final ObjectMapper JSON = JsonMapper.builder()
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .disable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .enable(SerializationFeature.INDENT_OUTPUT)
            .build();
    private static final Set<String> TOP_FIELDS = Set.of("format", "formatVersion", "name", "description", "created",
            "plan", "model", "lotSize", "designedFor", "achieved", "fingerprint");

    private PlanFormat() {
    }

    /** A new saved plan with its fingerprint computed. */
    public static SavedPlan seal(String name, String description, Instant created, Plan plan, OcModel model,
            int lotSize, RiskPoints designedFor, String method) {
        PlanRisks achieved = PlanRisks.of(plan, model, designedFor);
        SavedPlan unsealed = new SavedPlan(name, description, created, plan, model, lotSize, designedFor, method,
                achieved, "");
        String fingerprint = fingerprintOf(toJson(unsealed));
        return new SavedPlan(name, description, created, plan, model, lotSize, designedFor, method, achieved,
                fingerprint);
    }

    public static void write(Path file, SavedPlan plan) {
        String text = toText(plan);
        AtomicWrite.writeString(file, text);
    }

    /** The file's text: indented JSON ending in a newline. */
    public static String toText(SavedPlan plan) {
        try {
            return JSON.writeValueAsString(toJson(plan)) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    static ObjectNode toJson(SavedPlan saved) {
        ObjectNode root = JsonNodeFactory.instance.objectNode();
        root.put("format", FORMAT);
        root.put("formatVersion", VERSION);
        root.put("name", saved.name());
        root.put("description", saved.description());
        root.put("created", saved.created().toString());
        ObjectNode plan = root.putObject("plan");
        plan.put("scheme", saved.plan().scheme());
        if (saved.plan() instanceof SinglePlan single) {
            plan.put("n", single.n());
            plan.put("c", single.c());
        }
        root.put("model", saved.model().name());
        if (saved.lotSize() > 0) {
            root.put("lotSize", saved.lotSize());
        }
        ObjectNode design = root.putObject("designedFor");
        design.put("aql", saved.designedFor().aql());
        design.put("alpha", saved.designedFor().alpha());
        design.put("ltpd", saved.designedFor().ltpd());
        design.put("beta", saved.designedFor().beta());
        design.put("method", saved.method());
        ObjectNode achieved = root.putObject("achieved");
        achieved.put("producerRisk", saved.achieved().producerRisk());
        achieved.put("consumerRisk", saved.achieved().consumerRisk());
        if (!saved.fingerprint().isEmpty()) {
            root.put("fingerprint", saved.fingerprint());
        }
        return root;
    }

    /** SHA-256 over the canonical form of a plan file's JSON, as "sha256:" and 64 hexadecimal digits. */
    static String fingerprintOf(JsonNode root) {
        ObjectNode copy = root.deepCopy();
        copy.remove("fingerprint");
        try {
            byte[] canonical = JsonMapper.builder().build().writeValueAsBytes(sorted(copy));
            byte[] digest = MessageDigest.getInstance("SHA-256").digest(canonical);
            return "sha256:" + HexFormat.of().formatHex(digest);
        } catch (JsonProcessingException | NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    private static Object sorted(JsonNode node) {
        if (node.isObject()) {
            Map<String, Object> map = new TreeMap<>();
            node.fields().forEachRemaining(e -> map.put(e.getKey(), sorted(e.getValue())));
            return map;
        }
        if (node.isArray()) {
            List<Object> list = new java.util.ArrayList<>();
            node.forEach(element -> list.add(sorted(element)));
            return list;
        }
        return node;
    }

    /**
     * Loads and fully validates a plan file.
     *
     * @throws InputFileException naming the file and the field when it is missing, unreadable,
     *                            malformed, of another version, inconsistent or altered
     */
    public static SavedPlan read(Path file) {
        JsonNode root;
        try {
            if (Files.size(file) > LARGEST_FILE) {
                throw new InputFileException(file, "too large to be a plan file (over 1 MiB)");
            }
            root = JSON.readTree(Files.readString(file, StandardCharsets.UTF_8));
        } catch (NoSuchFileException e) {
            throw new InputFileException(file, "no such plan file");
        } catch (JsonProcessingException e) {
            String where = e.getLocation() == null ? ""
                    : " at line " + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr();
            throw new InputFileException(file, "not a valid plan file: malformed JSON" + where + " ("
                    + e.getOriginalMessage().lines().findFirst().orElse("") + ")");
        } catch (IOException e) {
            throw new InputFileException(file, "cannot be read (" + e.getMessage() + ")");
        }
        return new Reader(file, root).read();
    }

    /** Validation of one file, so that every message names the file and the field. */
    private static final class Reader {
        private final Path file;
        private final JsonNode root;

        Reader(Path file, JsonNode root) {
            this.file = file;
            this.root = root;
        }

        private InputFileException invalid(String problem) {
            return new InputFileException(file, problem);
        }

        SavedPlan read() {
            if (root == null || !root.isObject()) {
                throw invalid("not a plan file: the content is not a JSON object");
            }
            if (!FORMAT.equals(root.path("format").asText(null))) {
                throw invalid("not a plan file: field 'format' must be \"" + FORMAT + "\"");
            }
            JsonNode version = root.get("formatVersion");
            if (version == null || !version.canConvertToExactIntegral()) {
                throw invalid("field 'formatVersion' must be a whole number");
            }
            if (version.asInt() > VERSION) {
                throw invalid("written in plan format version " + version.asInt() + " by a newer lotgate; this one"
                        + " reads versions up to " + VERSION);
            }
            if (version.asInt() < 1) {
                throw invalid("field 'formatVersion' must be 1 or more, got " + version.asInt());
            }
            for (Iterator<String> it = root.fieldNames(); it.hasNext();) {
                String field = it.next();
                if (!TOP_FIELDS.contains(field)) {
                    throw invalid("unknown field '" + field + "'");
                }
            }
            String fingerprint = text(root, "fingerprint");
            String name = text(root, "name");
            String description = text(root, "description");
            Instant created;
            try {
                created = Instant.parse(text(root, "created"));
            } catch (DateTimeParseException e) {
                throw invalid("field 'created' must be a UTC time such as 2026-01-31T08:00:00Z");
            }
            int lotSize = root.has("lotSize") ? wholeNumber(root, "lotSize", 1) : 0;
            OcModel model = model(lotSize);
            Plan plan = plan(lotSize);
            JsonNode design = object(root, "designedFor");
            RiskPoints points;
            try {
                points = new RiskPoints(number(design, "designedFor.aql"), number(design, "designedFor.alpha"),
                        number(design, "designedFor.ltpd"), number(design, "designedFor.beta"));
            } catch (IllegalArgumentException e) {
                throw invalid("field 'designedFor': " + e.getMessage());
            }
            String method = text(design, "designedFor.method");
            if (!Set.of(SavedPlan.SMALLEST_SAMPLE, SavedPlan.FIXED_ACCEPTANCE, SavedPlan.GIVEN).contains(method)) {
                throw invalid("field 'designedFor.method' must be " + SavedPlan.SMALLEST_SAMPLE + ", "
                        + SavedPlan.FIXED_ACCEPTANCE + " or " + SavedPlan.GIVEN + ", got \"" + method + "\"");
            }
            String expected = fingerprintOf(root);
            if (!expected.equals(fingerprint)) {
                throw invalid("the fingerprint does not match the content: the file was changed after it was"
                        + " saved; save it again with 'lotgate design ... --save'");
            }
            JsonNode achievedNode = object(root, "achieved");
            PlanRisks achieved = PlanRisks.of(plan, model, points);
            checkRisk("achieved.producerRisk", number(achievedNode, "achieved.producerRisk"), achieved.producerRisk());
            checkRisk("achieved.consumerRisk", number(achievedNode, "achieved.consumerRisk"), achieved.consumerRisk());
            return new SavedPlan(name, description, created, plan, model, lotSize, points, method, achieved,
                    fingerprint);
        }

        private void checkRisk(String field, double recorded, double recomputed) {
            if (Math.abs(recorded - recomputed) > RISK_TOLERANCE * Math.max(recomputed, 1e-300)
                    && Math.abs(recorded - recomputed) > 1e-15) {
                throw invalid("field '" + field + "' is " + recorded + " but the plan gives " + recomputed
                        + ": the file is inconsistent");
            }
        }

        private OcModel model(int lotSize) {
            String name = text(root, "model");
            if (!Set.of("binomial", "hypergeometric", "poisson").contains(name)) {
                throw invalid("field 'model' must be binomial, hypergeometric or poisson, got \"" + name + "\"");
            }
            if (name.equals("hypergeometric") && lotSize == 0) {
                throw invalid("field 'lotSize' is required with the hypergeometric model");
            }
            return OcModel.of(name, lotSize);
        }

        private Plan plan(int lotSize) {
            JsonNode plan = object(root, "plan");
            String scheme = text(plan, "plan.scheme");
            if (!scheme.equals("single")) {
                throw invalid("field 'plan.scheme' must be single, got \"" + scheme + "\"");
            }
            int n = wholeNumber(plan, "plan.n", 1);
            int c = wholeNumber(plan, "plan.c", 0);
            if (c >= n) {
                throw invalid("field 'plan.c' must be below plan.n = " + n + ", got " + c);
            }
            if (lotSize > 0 && n > lotSize) {
                throw invalid("field 'plan.n' = " + n + " exceeds the lot size " + lotSize);
            }
            return new SinglePlan(n, c);
        }

        private JsonNode field(JsonNode parent, String path) {
            String leaf = path.substring(path.lastIndexOf('.') + 1);
            JsonNode value = parent.get(leaf);
            if (value == null || value.isNull()) {
                throw invalid("field '" + path + "' is missing");
            }
            return value;
        }

        private JsonNode object(JsonNode parent, String path) {
            JsonNode value = field(parent, path);
            if (!value.isObject()) {
                throw invalid("field '" + path + "' must be an object");
            }
            return value;
        }

        private String text(JsonNode parent, String path) {
            JsonNode value = field(parent, path);
            if (!value.isTextual()) {
                throw invalid("field '" + path + "' must be a string");
            }
            return value.asText();
        }

        private double number(JsonNode parent, String path) {
            JsonNode value = field(parent, path);
            if (!value.isNumber()) {
                throw invalid("field '" + path + "' must be a number");
            }
            return value.asDouble();
        }

        private int wholeNumber(JsonNode parent, String path, int least) {
            JsonNode value = field(parent, path);
            if (!value.isIntegralNumber() || !value.canConvertToInt() || value.asInt() < least) {
                throw invalid("field '" + path + "' must be a whole number of at least " + least + ", got " + value);
            }
            return value.asInt();
        }
    }
}
