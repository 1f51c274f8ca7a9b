package lotgate.jobs;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lotgate.history.SwitchingRules;
import lotgate.plan.PlanFamily;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SinglePlan;
import lotgate.tables.AttributeTables;
import lotgate.tables.InspectionLevel;
import lotgate.tables.TableLookup;
import lotgate.tables.TableRisks;
import lotgate.tables.TableScheme;
import lotgate.tables.TableSeverity;

/**
 * Looking a plan up in the published attribute sampling tables for a lot size, inspection level, AQL, severity
 * and scheme, with the risks the tables do not print; saving it, or the whole normal/tightened/reduced family
 * with the switching rules.
 */
public final class PlanFromTables {
    /** AQLs above this (in percent) are nonconformities per hundred units only, in the tables. */
    static final double LARGEST_PERCENT_NONCONFORMING = 10;

    /**
     * Where to save a plan family: the family file, its variants beside it named after it (NAME-normal.json,
     * NAME-tightened.json, NAME-reduced.json), what it is for, and whether existing files may be replaced.
     */
    public record FamilyTarget(Path file, String description, boolean replace) {
        public FamilyTarget {
            description = description == null ? "" : description;
        }

        /** The plan file of one severity, beside the family file. */
        public Path variant(TableSeverity severity) {
            String name = file.getFileName().toString();
            String stem = name.endsWith(".json") ? name.substring(0, name.length() - ".json".length()) : name;
            return file.resolveSibling(stem + "-" + severity.word() + ".json");
        }
    }

    /**
     * The lot size (null: not given), the inspection level, AQL in percent as the tables print it, severity and
     * scheme as typed, the OC model's name (null: binomial up to an AQL of 10, Poisson above), where to save the
     * plan (or null) and where to save the family (or null).
     */
    public record Request(Integer lotSize, String level, double aqlPercent, String severity, String scheme,
            String model, SaveTarget save, FamilyTarget family) {
    }

    /** One plan of the family as the tables give it, with its risks (null where every unit is inspected). */
    public record Variant(TableSeverity severity, TableLookup lookup, TableRisks risks) {
    }

    /**
     * What was asked, the plan found with its risks (null where the sample reaches the lot), the model they are
     * computed under, the AQL as a fraction, the plan as saved (or null), and the family's variants and
     * switching rules when it was saved (else empty and null).
     */
    public record Result(Request request, InspectionLevel level, TableSeverity severity, double aql, OcModel model,
            TableLookup lookup, TableRisks risks, SavedPlan saved, List<Variant> family, ObjectNode switching) {
        public Result {
            family = List.copyOf(family);
        }

        public int lotSize() {
            return request.lotSize();
        }
    }

    private PlanFromTables() {
    }

    /** Checks the request, looks the plan up, computes its risks, and saves the plan or family when asked. */
    public static Result run(Request request) {
        AttributeTables tables = AttributeTables.standard();
        int lotSize = Checks.requiredLotSize(request.lotSize(), "the tables' code letter",
                "the tables start at a lot of 2 units");
        InspectionLevel level = parse("level", "--level", () -> InspectionLevel.parse(request.level()));
        TableSeverity severity = parse("severity", "--severity", () -> TableSeverity.parse(request.severity()));
        TableScheme scheme = parse("scheme", "--scheme", () -> TableScheme.parse(request.scheme()));
        int aqlIndex = parse("aql", "--aql", () -> tables.aqlIndex(request.aqlPercent()));
        double percent = Double.parseDouble(tables.aqls().get(aqlIndex));
        OcModel model = model(request, percent, lotSize);
        double aql = new java.math.BigDecimal(tables.aqls().get(aqlIndex)).movePointLeft(2).doubleValue();
        if (request.save() != null) {
            request.save().check();
        }
        if (request.family() != null) {
            checkFamily(request.family());
            if (request.save() != null) {
                throw JobException.invalid("family", "give --save or --save-family, not both");
            }
        }
        TableLookup lookup = lookup(tables, lotSize, level, aqlIndex, severity, scheme);
        TableRisks risks = risks(lookup, model, aql, lotSize);
        SavedPlan saved = null;
        if (request.save() != null) {
            savable(lookup, "--save");
            saved = request.save().save((name, now) -> seal(name, request.save().description(), now, lookup, risks,
                    model, aql, lotSize));
        }
        List<Variant> family = new ArrayList<>();
        ObjectNode switching = null;
        if (request.family() != null) {
            for (TableSeverity each : TableSeverity.values()) {
                TableLookup variant = each == severity ? lookup
                        : lookup(tables, lotSize, level, aqlIndex, each, scheme);
                savable(variant, "--save-family");
                family.add(new Variant(each, variant, risks(variant, model, aql, lotSize)));
            }
            switching = SwitchingRules.CURRENT.toJson();
            writeFamily(request.family(), family, model, aql, lotSize, switching);
        }
        return new Result(request, level, severity, aql, model, lookup, risks, saved, family, switching);
    }

    private interface Parse<T> {
        T get();
    }

    private static <T> T parse(String field, String option, Parse<T> parse) {
        try {
            return parse.get();
        } catch (IllegalArgumentException e) {
            throw JobException.invalid(field, option + ": " + e.getMessage());
        }
    }

    private static OcModel model(Request request, double percent, int lotSize) {
        String name = request.model();
        if (name == null) {
            name = percent > LARGEST_PERCENT_NONCONFORMING ? "poisson" : "binomial";
        }
        if (!name.equals("poisson") && percent > LARGEST_PERCENT_NONCONFORMING) {
            throw JobException.invalid("model", "--model " + name + ": in the tables an AQL above 10 is in"
                    + " nonconformities per hundred units; use --model poisson (the default there)");
        }
        return Checks.model(name, lotSize);
    }

    private static TableLookup lookup(AttributeTables tables, int lotSize, InspectionLevel level, int aqlIndex,
            TableSeverity severity, TableScheme scheme) {
        try {
            return tables.plan(lotSize, level, aqlIndex, severity, scheme);
        } catch (IllegalArgumentException e) {
            throw JobException.invalid("scheme", "--scheme " + scheme.word() + ": " + e.getMessage());
        }
    }

    /** The plan's risks, or null when its sample reaches the lot and every unit is inspected instead. */
    private static TableRisks risks(TableLookup lookup, OcModel model, double aql, int lotSize) {
        if (lookup.hundredPercent()) {
            return null;
        }
        return TableRisks.of(lookup.plan(), model, aql, lotSize);
    }

    private static void savable(TableLookup lookup, String option) {
        String field = option.equals("--save") ? "save" : "family";
        if (lookup.hundredPercent()) {
            throw JobException.invalid(field, option + ": the table's"
                    + " sample of " + lookup.plan().maxSampleSize() + " units (code letter " + lookup.usedLetter()
                    + ") reaches the lot of " + lookup.lotSize() + ": every unit is inspected, there is no plan to"
                    + " save");
        }
        if (lookup.plan() instanceof SinglePlan single && single.c() >= single.n()) {
            throw JobException.invalid(field, option + ": the table's plan n = " + single.n() + ", Ac = "
                    + single.c() + " counts more nonconformities than units, which a plan file cannot hold yet");
        }
    }

    private static void checkFamily(FamilyTarget family) {
        if (!family.file().getFileName().toString().endsWith(".json")) {
            throw JobException.invalid("family", "--save-family " + family.file() + ": a plan family file name must"
                    + " end in .json");
        }
        List<Path> files = new ArrayList<>(List.of(family.file()));
        for (TableSeverity severity : TableSeverity.values()) {
            files.add(family.variant(severity));
        }
        for (Path file : files) {
            if (Files.isDirectory(file)) {
                throw JobException.invalid("family", "--save-family: " + file + " is a folder");
            }
            if (Files.exists(file) && !family.replace()) {
                throw JobException.invalid("family", "--save-family: " + file + " exists; add --replace to overwrite"
                        + " the family and its plans");
            }
        }
    }

    private static void writeFamily(FamilyTarget target, List<Variant> family, OcModel model, double aql,
            int lotSize, ObjectNode switching) {
        Instant now = Instant.now().truncatedTo(ChronoUnit.SECONDS);
        Map<String, Path> plans = new LinkedHashMap<>();
        String familyName = new SaveTarget(target.file(), "", true).planName();
        for (Variant variant : family) {
            Path file = target.variant(variant.severity());
            String name = familyName + "-" + variant.severity().word();
            String description = (target.description().isEmpty() ? "" : target.description() + "; ")
                    + variant.severity().word() + " inspection";
            PlanFormat.write(file, seal(name, description, now, variant.lookup(), variant.risks(), model, aql,
                    lotSize));
            plans.put(variant.severity().word(), file);
        }
        PlanFamily.write(target.file(), plans, switching);
    }

    /**
     * The plan as a plan file: designed for the AQL at its exact producer's risk there, and for the quality it
     * accepts 10% of the time (its LTPD at a consumer's risk of 10%).
     */
    private static SavedPlan seal(String name, String description, Instant now, TableLookup lookup, TableRisks risks,
            OcModel model, double aql, int lotSize) {
        Plan plan = lookup.plan();
        RiskPoints points;
        try {
            points = new RiskPoints(aql, Math.max(risks.producerRisk(), 1e-300), risks.ltpd10(), 0.10);
        } catch (IllegalArgumentException e) {
            throw JobException.invalid("save", "the table's plan at code letter " + lookup.usedLetter()
                    + " cannot be saved: " + e.getMessage());
        }
        String text = description.isEmpty() ? tableNote(lookup) : description + " (" + tableNote(lookup) + ")";
        return PlanFormat.seal(name, text, now, plan, model, lotSize, points, SavedPlan.ATTRIBUTE_TABLES);
    }

    private static String tableNote(TableLookup lookup) {
        return "code letter " + lookup.usedLetter() + ", " + lookup.source();
    }
}
