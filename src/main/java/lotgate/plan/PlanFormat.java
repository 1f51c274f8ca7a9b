package lotgate.plan;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import lotgate.files.AtomicWrite;
import lotgate.files.CanonicalJson;
import lotgate.files.InputFileException;
import lotgate.files.JsonTree;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.MultiplePlan;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.Stage;
import lotgate.sampling.VariablesPlan;
import lotgate.sampling.WaldSequential;

/**
 * Reads and writes plan files (format "lotgate-plan"; writes version 2, reads 1 and 2) and computes
 * their fingerprint: the SHA-256 of the canonical form, which is the file's JSON without the
 * fingerprint field, with object keys sorted, no white space, and numbers as Jackson writes Java
 * doubles and ints. Version 1 held one plan for every nonconformity; version 2 holds a list of
 * criteria per defect class.
 */
public final class PlanFormat {
    public static final String FORMAT = "lotgate-plan";
    public static final int VERSION = 3;
    /** The version written for plans that only hold single plans, so that lotgate 0.1.0 still reads them. */
    static final int SINGLE_ONLY_VERSION = 2;
    /** A plan file is a few hundred bytes; anything this large is not one. */
    private static final long LARGEST_FILE = 1 << 20;
    /** Relative agreement required between recorded and recomputed risks. */
    private static final double RISK_TOLERANCE = 1e-9;

    private static final Set<String> TOP_FIELDS_V1 = Set.of("format", "formatVersion", "name", "description",
            "created", "plan", "model", "lotSize", "designedFor", "achieved", "fingerprint");
    private static final Set<String> TOP_FIELDS_V2 = Set.of("format", "formatVersion", "name", "description",
            "created", "model", "lotSize", "classes", "fingerprint");
    private static final Set<String> TOP_FIELDS_V3 = Set.of("format", "formatVersion", "name", "description",
            "created", "model", "lotSize", "classes", "fingerprint", "measurement");
    private static final Set<String> MEASUREMENT_FIELDS = Set.of("characteristic", "lower", "upper", "unit", "sigma",
            "limits", "lowerDesign");
    private static final Set<String> CLASS_FIELDS = Set.of("class", "plan", "designedFor", "achieved");

    /** What a new plan file holds for one defect class before its risks are computed. */
    public record ClassDraft(DefectClass defectClass, Plan plan, RiskPoints designedFor, String method) {
    }

    private PlanFormat() {
    }

    /** A new saved plan with one set of criteria for every nonconformity, its fingerprint computed. */
    public static SavedPlan seal(String name, String description, Instant created, Plan plan, OcModel model,
            int lotSize, RiskPoints designedFor, String method) {
        return seal(name, description, created, model, lotSize,
                List.of(new ClassDraft(DefectClass.ANY, plan, designedFor, method)));
    }

    /** A new variables plan, with what it measures, its risks and fingerprint computed. */
    public static SavedPlan seal(String name, String description, Instant created, VariablesPlan plan, OcModel model,
            int lotSize, RiskPoints designedFor, String method, Measurement measurement) {
        List<ClassPlan> classes = List.of(new ClassPlan(DefectClass.ANY, plan, designedFor, method,
                PlanRisks.of(plan, model, designedFor)));
        SavedPlan unsealed = new SavedPlan(name, description, created, model, lotSize, classes, "", measurement);
        return new SavedPlan(name, description, created, model, lotSize, classes, fingerprintOf(toJson(unsealed)),
                measurement);
    }

    /** A new saved plan with criteria per defect class, its risks and fingerprint computed. */
    public static SavedPlan seal(String name, String description, Instant created, OcModel model, int lotSize,
            List<ClassDraft> drafts) {
        List<ClassPlan> classes = drafts.stream().map(d -> new ClassPlan(d.defectClass(), d.plan(), d.designedFor(),
                d.method(), PlanRisks.of(d.plan(), model, d.designedFor()))).toList();
        SavedPlan unsealed = new SavedPlan(name, description, created, model, lotSize, classes, "");
        return new SavedPlan(name, description, created, model, lotSize, classes, fingerprintOf(toJson(unsealed)));
    }

    public static void write(Path file, SavedPlan plan) {
        String text = toText(plan);
        AtomicWrite.writeString(file, text);
    }

    /** The file's text: indented JSON ending in a newline. */
    public static String toText(SavedPlan plan) {
        return JsonTree.indented(toJson(plan)) + "\n";
    }

    /** A plan's name, description, creation time, model and lot size (when it has one), as its file holds them. */
    public static void putIdentity(ObjectNode node, SavedPlan saved) {
        node.put("name", saved.name());
        node.put("description", saved.description());
        node.put("created", saved.created().toString());
        node.put("model", saved.model().name());
        if (saved.lotSize() > 0) {
            node.put("lotSize", saved.lotSize());
        }
    }

    static ObjectNode toJson(SavedPlan saved) {
        ObjectNode root = JsonNodeFactory.instance.objectNode();
        root.put("format", FORMAT);
        boolean singleOnly = saved.classes().stream().allMatch(c -> c.plan() instanceof SinglePlan single
                && !single.hasGap())
                && saved.measurement() == null;
        root.put("formatVersion", singleOnly ? SINGLE_ONLY_VERSION : VERSION);
        putIdentity(root, saved);
        var classes = root.putArray("classes");
        for (ClassPlan criteria : saved.classes()) {
            ObjectNode entry = classes.addObject();
            entry.put("class", criteria.defectClass().label());
            entry.set("plan", planJson(criteria.plan()));
            ObjectNode design = entry.putObject("designedFor");
            design.put("aql", criteria.designedFor().aql());
            design.put("alpha", criteria.designedFor().alpha());
            design.put("ltpd", criteria.designedFor().ltpd());
            design.put("beta", criteria.designedFor().beta());
            design.put("method", criteria.method());
            ObjectNode achieved = entry.putObject("achieved");
            achieved.put("producerRisk", criteria.achieved().producerRisk());
            achieved.put("consumerRisk", criteria.achieved().consumerRisk());
        }
        if (saved.measurement() != null) {
            root.set("measurement", measurementJson(saved.measurement()));
        }
        if (!saved.fingerprint().isEmpty()) {
            root.put("fingerprint", saved.fingerprint());
        }
        return root;
    }

    /** What a variables plan measures, as plan files and outputs hold it. */
    public static ObjectNode measurementJson(Measurement measurement) {
        ObjectNode node = JsonNodeFactory.instance.objectNode();
        node.put("characteristic", measurement.characteristic());
        if (measurement.lower() != null) {
            node.put("lower", measurement.lower());
        }
        if (measurement.upper() != null) {
            node.put("upper", measurement.upper());
        }
        node.put("unit", measurement.unit());
        if (measurement.sigma() != null) {
            node.put("sigma", measurement.sigma());
        }
        node.put("limits", measurement.limits());
        if (measurement.lowerDesign() != null) {
            ObjectNode lower = node.putObject("lowerDesign");
            RiskPoints points = measurement.lowerDesign().designedFor();
            lower.put("aql", points.aql());
            lower.put("alpha", points.alpha());
            lower.put("ltpd", points.ltpd());
            lower.put("beta", points.beta());
            lower.put("k", measurement.lowerDesign().k());
        }
        return node;
    }

    /** A plan's stage structure as JSON, as plan files, records and outputs hold it. */
    public static ObjectNode planJson(Plan plan) {
        ObjectNode node = JsonNodeFactory.instance.objectNode();
        node.put("scheme", plan.scheme());
        if (plan instanceof SinglePlan single) {
            node.put("n", single.n());
            node.put("c", single.c());
            if (single.hasGap()) {
                node.put("rejectionNumber", single.rejectionNumber());
            }
        } else if (plan instanceof DoublePlan twice) {
            putStages(node, twice.stages());
        } else if (plan instanceof MultiplePlan multiple) {
            putStages(node, multiple.stages());
        } else if (plan instanceof VariablesPlan variables) {
            node.put("n", variables.n());
            node.put("k", variables.k());
            node.put("sigmaKnown", variables.sigmaKnown());
        } else if (plan instanceof SequentialPlan sequential) {
            node.put("h1", sequential.h1());
            node.put("h2", sequential.h2());
            node.put("s", sequential.slope());
            node.put("truncation", sequential.truncation());
        }
        return node;
    }

    private static void putStages(ObjectNode node, List<Stage> stages) {
        var list = node.putArray("stages");
        for (Stage stage : stages) {
            ObjectNode entry = list.addObject();
            entry.put("n", stage.n());
            if (stage.c() == Stage.NO_ACCEPTANCE) {
                entry.putNull("c");
            } else {
                entry.put("c", stage.c());
            }
            entry.put("r", stage.r());
        }
    }

    /** The plan file's JSON, for embedding in decision records. */
    public static ObjectNode json(SavedPlan plan) {
        return toJson(plan);
    }

    /** SHA-256 over the canonical form of a plan file's JSON, as "sha256:" and 64 hexadecimal digits. */
    static String fingerprintOf(JsonNode root) {
        ObjectNode copy = root.deepCopy();
        copy.remove("fingerprint");
        return "sha256:" + CanonicalJson.sha256(CanonicalJson.text(copy));
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
            String text = withoutByteOrderMark(Files.readString(file, StandardCharsets.UTF_8));
            if (!text.stripLeading().startsWith("{")) {
                throw new InputFileException(file, "not a plan file: a plan file is the JSON that 'lotgate design"
                        + " --save' writes, and this file does not start with '{'");
            }
            root = JsonTree.strict(text);
        } catch (java.nio.charset.CharacterCodingException e) {
            throw new InputFileException(file, "not a plan file: a plan file is UTF-8 JSON text, and this file is not");
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
            JsonNode versionNode = root.get("formatVersion");
            if (versionNode == null || !versionNode.canConvertToExactIntegral()) {
                throw invalid("field 'formatVersion' must be a whole number");
            }
            int version = versionNode.asInt();
            if (version > VERSION) {
                throw invalid("written in plan format version " + version + " by a newer lotgate; this one"
                        + " reads versions up to " + VERSION);
            }
            if (version < 1) {
                throw invalid("field 'formatVersion' must be 1 or more, got " + version);
            }
            Set<String> allowed = version == 1 ? TOP_FIELDS_V1 : version == 2 ? TOP_FIELDS_V2 : TOP_FIELDS_V3;
            for (Iterator<String> it = root.fieldNames(); it.hasNext();) {
                String field = it.next();
                if (!allowed.contains(field)) {
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
            List<ClassPlan> classes = new java.util.ArrayList<>();
            if (version == 1) {
                classes.add(criteria(root, "", DefectClass.ANY, model, lotSize));
            } else {
                JsonNode list = field(root, "classes");
                if (!list.isArray() || list.isEmpty()) {
                    throw invalid("field 'classes' must be a list of at least one defect class");
                }
                for (int i = 0; i < list.size(); i++) {
                    JsonNode entry = list.get(i);
                    String prefix = "classes[" + i + "].";
                    if (!entry.isObject()) {
                        throw invalid("field '" + prefix.substring(0, prefix.length() - 1) + "' must be an object");
                    }
                    for (Iterator<String> it = entry.fieldNames(); it.hasNext();) {
                        String field = it.next();
                        if (!CLASS_FIELDS.contains(field)) {
                            throw invalid("unknown field '" + prefix + field + "'");
                        }
                    }
                    String label = text(entry, prefix + "class");
                    DefectClass defectClass = DefectClass.of(label);
                    if (defectClass == null) {
                        throw invalid("field '" + prefix + "class' must be any, critical, major or minor, got \""
                                + label + "\"");
                    }
                    if (classes.stream().anyMatch(c -> c.defectClass() == defectClass)) {
                        throw invalid("defect class " + label + " appears twice in 'classes'");
                    }
                    classes.add(criteria(entry, prefix, defectClass, model, lotSize));
                }
                if (classes.size() > 1 && classes.stream().anyMatch(c -> c.defectClass() == DefectClass.ANY)) {
                    throw invalid("class 'any' cannot be combined with other defect classes");
                }
            }
            String expected = fingerprintOf(root);
            if (!expected.equals(fingerprint)) {
                throw invalid("the fingerprint does not match the content: the file was changed after it was"
                        + " saved; save it again with 'lotgate design ... --save'");
            }
            for (ClassPlan criteria : classes) {
                String prefix = version == 1 ? "" : "classes[" + classes.indexOf(criteria) + "].";
                JsonNode container = version == 1 ? root : root.get("classes").get(classes.indexOf(criteria));
                JsonNode achievedNode = object(container, prefix + "achieved");
                checkRisk(prefix + "achieved.producerRisk", number(achievedNode, prefix + "achieved.producerRisk"),
                        criteria.achieved().producerRisk());
                checkRisk(prefix + "achieved.consumerRisk", number(achievedNode, prefix + "achieved.consumerRisk"),
                        criteria.achieved().consumerRisk());
            }
            Measurement measurement = root.has("measurement") ? measurement() : null;
            boolean variables = classes.stream().anyMatch(c -> c.plan() instanceof VariablesPlan);
            if (variables && measurement == null) {
                throw invalid("field 'measurement' is missing: a variables plan says what it measures");
            }
            if (!variables && measurement != null) {
                throw invalid("field 'measurement' belongs to variables plans only");
            }
            if (variables && ((VariablesPlan) classes.get(0).plan()).sigmaKnown() != measurement.sigmaKnown()) {
                throw invalid("field 'classes[0].plan.sigmaKnown' must agree with 'measurement.sigma'");
            }
            return new SavedPlan(name, description, created, model, lotSize, classes, fingerprint, measurement);
        }

        private Measurement measurement() {
            JsonNode node = object(root, "measurement");
            for (Iterator<String> it = node.fieldNames(); it.hasNext();) {
                String field = it.next();
                if (!MEASUREMENT_FIELDS.contains(field)) {
                    throw invalid("unknown field 'measurement." + field + "'");
                }
            }
            try {
                Measurement.LimitDesign lowerDesign = null;
                if (node.has("lowerDesign")) {
                    JsonNode lower = object(node, "measurement.lowerDesign");
                    lowerDesign = new Measurement.LimitDesign(new RiskPoints(number(lower, "measurement.lowerDesign.aql"),
                            number(lower, "measurement.lowerDesign.alpha"), number(lower, "measurement.lowerDesign.ltpd"),
                            number(lower, "measurement.lowerDesign.beta")), number(lower, "measurement.lowerDesign.k"));
                }
                return new Measurement(text(node, "measurement.characteristic"),
                        node.has("lower") ? number(node, "measurement.lower") : null,
                        node.has("upper") ? number(node, "measurement.upper") : null, text(node, "measurement.unit"),
                        node.has("sigma") ? number(node, "measurement.sigma") : null, text(node, "measurement.limits"),
                        lowerDesign);
            } catch (IllegalArgumentException e) {
                throw invalid("field 'measurement': " + e.getMessage());
            }
        }

        private ClassPlan criteria(JsonNode container, String prefix, DefectClass defectClass, OcModel model,
                int lotSize) {
            Plan plan = plan(container, prefix, lotSize, defectClass);
            JsonNode design = object(container, prefix + "designedFor");
            RiskPoints points;
            try {
                points = new RiskPoints(number(design, prefix + "designedFor.aql"),
                        number(design, prefix + "designedFor.alpha"), number(design, prefix + "designedFor.ltpd"),
                        number(design, prefix + "designedFor.beta"));
            } catch (IllegalArgumentException e) {
                throw invalid("field '" + prefix + "designedFor': " + e.getMessage());
            }
            String method = text(design, prefix + "designedFor.method");
            Set<String> methods = switch (plan.scheme()) {
                case "single" -> Set.of(SavedPlan.SMALLEST_SAMPLE, SavedPlan.FIXED_ACCEPTANCE, SavedPlan.GIVEN,
                        SavedPlan.ATTRIBUTE_TABLES, SavedPlan.LEAST_INSPECTION);
                case "double" -> Set.of(SavedPlan.SMALLEST_ASN, SavedPlan.GIVEN, SavedPlan.ATTRIBUTE_TABLES,
                        SavedPlan.LEAST_INSPECTION);
                case "sequential" -> Set.of(SavedPlan.WALD);
                case "variables" -> Set.of(SavedPlan.SMALLEST_SAMPLE, SavedPlan.GIVEN);
                default -> Set.of(SavedPlan.GIVEN);
            };
            if (!methods.contains(method)) {
                throw invalid("field '" + prefix + "designedFor.method' must be " + String.join(" or ",
                        methods.stream().sorted().toList()) + " for a " + plan.scheme() + " plan, got \"" + method
                        + "\"");
            }
            if (plan instanceof VariablesPlan && !(model instanceof OcModel.Binomial)) {
                throw invalid("field 'model' must be binomial for a variables plan (a steady process), got \""
                        + model.name() + "\"");
            }
            if (plan instanceof SequentialPlan sequential) {
                try {
                    checkLines(prefix, sequential, WaldSequential.of(points, model));
                } catch (IllegalArgumentException e) {
                    throw invalid("field '" + prefix + "designedFor': " + e.getMessage());
                }
            }
            return new ClassPlan(defectClass, plan, points, method, PlanRisks.of(plan, model, points));
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

        private Plan plan(JsonNode container, String prefix, int lotSize, DefectClass defectClass) {
            JsonNode plan = object(container, prefix + "plan");
            String scheme = text(plan, prefix + "plan.scheme");
            int version = root.get("formatVersion").asInt();
            Set<String> schemes = version < VERSION ? Set.of("single")
                    : Set.of("single", "double", "multiple", "sequential", "variables");
            if (!schemes.contains(scheme)) {
                throw invalid("field '" + prefix + "plan.scheme' must be " + String.join(" or ",
                        schemes.stream().sorted().toList()) + " in format version " + version + ", got \"" + scheme
                        + "\"");
            }
            Set<String> fields = switch (scheme) {
                case "double", "multiple" -> Set.of("scheme", "stages");
                case "sequential" -> Set.of("scheme", "h1", "h2", "s", "truncation");
                case "variables" -> Set.of("scheme", "n", "k", "sigmaKnown");
                default -> Set.of("scheme", "n", "c", "rejectionNumber");
            };
            for (Iterator<String> it = plan.fieldNames(); it.hasNext();) {
                String field = it.next();
                if (!fields.contains(field)) {
                    throw invalid("unknown field '" + prefix + "plan." + field + "' for a " + scheme + " plan");
                }
            }
            if (!scheme.equals("single") && defectClass != DefectClass.ANY) {
                throw invalid("field '" + prefix + "plan.scheme': a " + scheme + " plan cannot hold criteria per defect"
                        + " class (only single plans can)");
            }
            Plan result;
            try {
                result = switch (scheme) {
                    case "double" -> doublePlan(plan, prefix);
                    case "multiple" -> new MultiplePlan(stages(plan, prefix + "plan."));
                    case "variables" -> new VariablesPlan(wholeNumber(plan, prefix + "plan.n", 2),
                            number(plan, prefix + "plan.k"), bool(plan, prefix + "plan.sigmaKnown"));
                    case "sequential" -> new SequentialPlan(number(plan, prefix + "plan.h1"),
                            number(plan, prefix + "plan.h2"), number(plan, prefix + "plan.s"),
                            wholeNumber(plan, prefix + "plan.truncation", 1));
                    default -> singlePlan(plan, prefix);
                };
            } catch (IllegalArgumentException e) {
                throw invalid("field '" + prefix + "plan': " + e.getMessage());
            }
            if (lotSize > 0 && result.maxSampleSize() > lotSize) {
                throw invalid("field '" + prefix + "plan' may inspect " + result.maxSampleSize()
                        + " units, more than the lot size " + lotSize);
            }
            return result;
        }

        private Plan singlePlan(JsonNode plan, String prefix) {
            int n = wholeNumber(plan, prefix + "plan.n", 1);
            int c = wholeNumber(plan, prefix + "plan.c", 0);
            if (c >= n) {
                throw invalid("field '" + prefix + "plan.c' must be below plan.n = " + n + ", got " + c);
            }
            if (plan.has("rejectionNumber")) {
                // Reduced plans of the attribute tables: a count between c and the rejection number accepts.
                int rejection = wholeNumber(plan, prefix + "plan.rejectionNumber", c + 2);
                return new SinglePlan(n, c, rejection);
            }
            return new SinglePlan(n, c);
        }

        private Plan doublePlan(JsonNode plan, String prefix) {
            List<Stage> stages = stages(plan, prefix + "plan.");
            if (stages.size() != 2) {
                throw invalid("field '" + prefix + "plan.stages' must hold 2 stages for a double plan, got "
                        + stages.size());
            }
            Stage first = stages.get(0);
            Stage second = stages.get(1);
            if (first.c() == Stage.NO_ACCEPTANCE) {
                throw invalid("field '" + prefix + "plan.stages[0].c' must be a number for a double plan");
            }
            return new DoublePlan(first.n(), first.c(), first.r(), second.n(), second.c());
        }

        private List<Stage> stages(JsonNode plan, String prefix) {
            JsonNode list = plan.get("stages");
            if (list == null || !list.isArray() || list.isEmpty()) {
                throw invalid("field '" + prefix + "stages' must be a list of stages");
            }
            List<Stage> stages = new java.util.ArrayList<>();
            for (int i = 0; i < list.size(); i++) {
                String where = prefix + "stages[" + i + "]";
                JsonNode entry = list.get(i);
                if (!entry.isObject()) {
                    throw invalid("field '" + where + "' must be an object");
                }
                for (Iterator<String> it = entry.fieldNames(); it.hasNext();) {
                    String field = it.next();
                    if (!Set.of("n", "c", "r").contains(field)) {
                        throw invalid("unknown field '" + where + "." + field + "'");
                    }
                }
                if (!entry.has("c")) {
                    throw invalid("field '" + where + ".c' is missing (null for a stage that cannot accept)");
                }
                int c = entry.get("c").isNull() ? Stage.NO_ACCEPTANCE : wholeNumber(entry, where + ".c", 0);
                try {
                    stages.add(new Stage(wholeNumber(entry, where + ".n", 1), c, wholeNumber(entry, where + ".r", 1)));
                } catch (IllegalArgumentException e) {
                    throw invalid("field '" + where + "': " + e.getMessage());
                }
            }
            return stages;
        }

        /** The slope of Wald's lines depends only on the two quality levels; the intercepts carry the risks. */
        private void checkLines(String prefix, SequentialPlan plan, WaldSequential lines) {
            if (Math.abs(plan.slope() - lines.slope()) > 1e-12 * lines.slope()) {
                throw invalid("field '" + prefix + "plan.s' is " + plan.slope() + " but Wald's lines for the AQL and"
                        + " LTPD have slope " + lines.slope() + ": the file is inconsistent");
            }
        }

        private boolean bool(JsonNode parent, String path) {
            return typed(parent, path, JsonNode::isBoolean, "true or false").asBoolean();
        }

        private JsonNode field(JsonNode parent, String path) {
            String leaf = path.substring(path.lastIndexOf('.') + 1);
            leaf = leaf.contains("]") ? leaf.substring(leaf.indexOf(']') + 1) : leaf;
            JsonNode value = parent.get(leaf);
            if (value == null || value.isNull()) {
                throw invalid("field '" + path + "' is missing");
            }
            return value;
        }

        private JsonNode object(JsonNode parent, String path) {
            return typed(parent, path, JsonNode::isObject, "an object");
        }

        private String text(JsonNode parent, String path) {
            return typed(parent, path, JsonNode::isTextual, "a string").asText();
        }

        private double number(JsonNode parent, String path) {
            return typed(parent, path, JsonNode::isNumber, "a number").asDouble();
        }

        /** The field, refused unless it is of the kind named. */
        private JsonNode typed(JsonNode parent, String path, java.util.function.Predicate<JsonNode> kind,
                String what) {
            JsonNode value = field(parent, path);
            if (!kind.test(value)) {
                throw invalid("field '" + path + "' must be " + what);
            }
            return value;
        }

        private int wholeNumber(JsonNode parent, String path, int least) {
            JsonNode value = field(parent, path);
            if (!value.isIntegralNumber() || !value.canConvertToInt() || value.asInt() < least) {
                throw invalid("field '" + path + "' must be a whole number of at least " + least + ", got " + value);
            }
            return value.asInt();
        }
    }

    /** Text saved by some editors starts with a byte-order mark, which JSON does not allow; it is dropped. */
    static String withoutByteOrderMark(String text) {
        return text.startsWith("\uFEFF") ? text.substring(1) : text;
    }
}
