package lotgate.web;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;
import java.util.regex.Pattern;
import lotgate.files.InputFileException;
import lotgate.jobs.Checks;
import lotgate.jobs.ClassCriteria;
import lotgate.jobs.DesignSinglePlan;
import lotgate.jobs.DesignStagedPlan;
import lotgate.jobs.DesignVariablesPlan;
import lotgate.jobs.JobException;
import lotgate.jobs.PlanCurves;
import lotgate.jobs.SaveTarget;
import lotgate.jobs.SavedPlans;
import lotgate.jobs.ShowPlan;
import lotgate.jobs.TypedValues;
import lotgate.plan.ClassPlan;
import lotgate.plan.DefectClass;
import lotgate.plan.SavedPlan;
import lotgate.report.Percent;
import lotgate.report.results.DesignRendering;
import lotgate.report.results.PlanFileRendering;
import lotgate.report.results.StagedDesignRendering;
import lotgate.report.results.VariablesDesignRendering;
import lotgate.sampling.CurvePoint;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.DoublePlanDesigner;
import lotgate.sampling.MultiplePlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.OperatingCharacteristic;
import lotgate.sampling.Plan;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.SinglePlan;
import lotgate.sampling.Stage;
import lotgate.sampling.VariablesPlan;

/**
 * The plan design answers: a design as the user types, saving, listing and opening saved plans. The
 * form's fields are the design command's options by name, and a refusal says what the command would.
 */
final class DesignApi {
    private static final Pattern PLAN_NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9_-]{0,79}");
    private static final int CURVE_STEPS = 120;
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

    /** A designed plan as the page shows it: one drawn plan, or one per defect class. */
    private record Designed(String label, String text, List<Map<String, String>> tiles, List<Drawn> drawn,
            OcModel model, int lotSize, SavedPlan saved) {
    }

    /** A plan whose curves the page draws, with its defect class (null: the lot's one plan) and design points. */
    private record Drawn(DefectClass defectClass, Plan plan, Double aql, Double ltpd) {
    }

    Reply design(Map<String, String> fields) {
        return answer(() -> designed(fields, null));
    }

    Reply save(Map<String, String> fields) {
        return answer(() -> {
            Path file = planFile(settings.plans(), fields.get("name"));
            java.nio.file.Files.createDirectories(settings.plans());
            Map<String, Object> members = designed(fields, new SaveTarget(file, text(fields, "description"),
                    "yes".equals(fields.get("replace"))));
            members.put("file", settings.plans().getFileName().resolve(file.getFileName()).toString());
            return members;
        });
    }

    Reply list() {
        List<Map<String, String>> plans = new ArrayList<>();
        for (SavedPlans.Entry entry : SavedPlans.list(settings.plans())) {
            Map<String, String> plan = new LinkedHashMap<>();
            plan.put("name", entry.name());
            plan.put("file", settings.plans().getFileName().resolve(entry.file().getFileName()).toString());
            plan.put("kind", entry.family() ? "family" : "plan");
            plan.put("summary", entry.summary());
            plan.put("description", entry.description());
            plans.add(plan);
        }
        return JsonText.ok(Map.of("plans", plans));
    }

    Reply open(String name) {
        return answer(() -> {
            Path file = planFile(settings.plans(), name);
            ShowPlan.Result shown = ShowPlan.run(new ShowPlan.Request(file));
            SavedPlan saved = shown.plan();
            List<Drawn> drawn = new ArrayList<>();
            for (ClassPlan criteria : saved.classes()) {
                RiskPoints points = criteria.designedFor();
                drawn.add(new Drawn(saved.unclassified() ? null : criteria.defectClass(), criteria.plan(),
                        points == null ? null : points.aql(), points == null ? null : points.ltpd()));
            }
            List<Map<String, String>> tiles = saved.unclassified() ? tiles(saved.plan(), saved.achieved())
                    : classTiles(saved.sampleSize(), drawn);
            return designed(new Designed(saved.name(), PlanFileRendering.text(shown).replace(file.toString(),
                    file.getFileName().toString()), tiles, drawn, saved.model(), saved.lotSize(), saved));
        });
    }

    /** Something that yields the members of a successful answer, or refuses. */
    private interface Answer {
        Object get() throws Exception;
    }

    @SuppressWarnings("unchecked")
    private static Reply answer(Answer answer) {
        try {
            Object members = answer.get();
            return JsonText.ok((Map<String, ?>) members);
        } catch (FieldError e) {
            return e.reply();
        } catch (JobException e) {
            return JsonText.refused(400, fieldOf(e.field()), e.getMessage());
        } catch (NoPlan e) {
            return JsonText.refused(422, null, e.getMessage());
        } catch (InputFileException e) {
            return JsonText.refused(400, null, e.getMessage());
        } catch (java.io.IOException e) {
            return JsonText.refused(500, null, "cannot write to the plans folder " + e.getMessage());
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    /** The form field a job's refusal is about: its option or request component, written as the form's name. */
    static String fieldOf(String jobField) {
        if (jobField == null || jobField.isEmpty()) {
            return null;
        }
        String name = jobField.startsWith("--") ? jobField.substring(2) : jobField;
        int space = name.indexOf(' ');
        if (space > 0) {
            name = name.substring(0, space);
        }
        name = name.replaceAll("([a-z])([A-Z])", "$1-$2").toLowerCase(Locale.ROOT);
        return switch (name) {
            case "save" -> "name";
            case "stage" -> "stages";
            default -> name;
        };
    }

    private static Map<String, Object> designed(Designed designed) {
        Map<String, Object> members = new LinkedHashMap<>();
        members.put("label", designed.label());
        members.put("tiles", designed.tiles());
        members.put("text", designed.text());
        List<Drawn> drawn = designed.drawn();
        List<PlanCurves.Request> requests = new ArrayList<>();
        for (Drawn plan : drawn) {
            requests.add(new PlanCurves.Request(plan.plan(), designed.model(), designed.lotSize(), plan.ltpd(),
                    CURVE_STEPS));
        }
        // Several classes on one quality axis: the widest range any of them asks for.
        double upTo = 0;
        if (requests.size() > 1) {
            for (PlanCurves.Request request : requests) {
                upTo = Math.max(upTo, PlanCurves.range(request));
            }
        }
        List<Map<String, Object>> series = new ArrayList<>();
        List<Double> x = new ArrayList<>();
        for (int i = 0; i < drawn.size(); i++) {
            PlanCurves.Result curves = upTo > 0 ? PlanCurves.run(requests.get(i), upTo)
                    : PlanCurves.run(requests.get(i));
            series.add(series(drawn.get(i), designed, curves, i == 0 ? x : null));
        }
        Map<String, Object> curveMembers = new LinkedHashMap<>();
        curveMembers.put("x", x);
        curveMembers.put("xLabel", designed.model().countsUnits() ? "incoming quality (fraction nonconforming)"
                : "incoming quality (nonconformities per unit)");
        curveMembers.put("step", designed.model() instanceof OcModel.Hypergeometric);
        curveMembers.put("series", series);
        members.put("curves", curveMembers);
        List<Map<String, Object>> marks = new ArrayList<>();
        Drawn only = drawn.get(0);
        if (drawn.size() == 1 && only.aql() != null) {
            marks.add(Map.of("x", only.aql(), "label", "AQL " + Percent.level(only.aql())));
        }
        if (drawn.size() == 1 && only.ltpd() != null) {
            marks.add(Map.of("x", only.ltpd(), "label", "LTPD " + Percent.level(only.ltpd())));
        }
        members.put("marks", marks);
        if (designed.saved() != null) {
            members.put("fingerprint", designed.saved().shortFingerprint());
        }
        return members;
    }

    /** One curve's values at the table's quality levels ({@code y}, null where it has none) and their labels. */
    private static Map<String, Object> curve(List<CurvePoint> table, Function<CurvePoint, Double> value,
            Function<Double, String> label) {
        List<Double> y = table.stream().map(value).toList();
        return Map.of("y", y, "labels", y.stream().map(label).toList());
    }

    private static String units(double count) {
        return String.format(Locale.ROOT, "%.1f units", count);
    }

    /**
     * One drawn plan's curves over the common axis (its quality values added to {@code x} when given), named
     * after its class, with its design points on the OC curve.
     */
    private static Map<String, Object> series(Drawn drawn, Designed designed, PlanCurves.Result curves, List<Double> x) {
        List<CurvePoint> table = curves.points();
        if (x != null) {
            table.forEach(point -> x.add(point.quality()));
        }
        Map<String, Object> series = new LinkedHashMap<>();
        series.put("name", drawn.defectClass() == null ? designed.label()
                : drawn.defectClass().label() + ": " + label(drawn.plan()));
        series.put("oc", curve(table, CurvePoint::acceptance, Percent::probability));
        series.put("aoq", curve(table, CurvePoint::aoq, Percent::level));
        if (designed.lotSize() > 0) {
            series.put("ati", curve(table, point -> Double.isNaN(point.ati()) ? null : point.ati(),
                    ati -> ati == null ? "" : units(ati)));
        }
        series.put("asn", curve(table, CurvePoint::asn, DesignApi::units));
        List<Map<String, Object>> points = new ArrayList<>();
        if (drawn.defectClass() != null) {
            designPoint(points, drawn, designed.model(), "AQL", drawn.aql());
            designPoint(points, drawn, designed.model(), "LTPD", drawn.ltpd());
        }
        series.put("points", points);
        return series;
    }

    /** A class's design point on its OC curve, marked on the chart with its P(accept). */
    private static void designPoint(List<Map<String, Object>> points, Drawn drawn, OcModel model, String name,
            Double quality) {
        if (quality != null) {
            double accept = OperatingCharacteristic.acceptance(drawn.plan(), model, quality);
            points.add(Map.of("x", quality, "y", accept, "label", drawn.defectClass().label() + " " + name + " "
                    + Percent.level(quality) + ": P(accept) " + Percent.probability(accept)));
        }
    }

    /** The form read and designed by the job for its scheme; saved when a target is given. */
    private Map<String, Object> designed(Map<String, String> fields, SaveTarget save) {
        String scheme = text(fields, "scheme");
        scheme = scheme == null ? "single" : scheme;
        Integer lotSize = count(fields, "lot-size", 1);
        String modelName = text(fields, "model");
        if (modelName != null && !List.of("binomial", "hypergeometric", "poisson").contains(modelName)) {
            throw new FieldError("model", "Invalid value for option '--model': expected one of [binomial,"
                    + " hypergeometric, poisson] (case-insensitive) but was '" + modelName + "'");
        }
        OcModel model = Checks.model(modelName, lotSize);
        int n0 = lotSize == null ? 0 : lotSize;
        Double aql = level(fields, "aql");
        Double ltpd = level(fields, "ltpd");
        double alpha = risk(fields, "alpha", 0.05);
        double beta = risk(fields, "beta", 0.10);
        switch (scheme) {
            case "single" -> {
                String classes = text(fields, "classes");
                if (classes != null) {
                    return classed(classes, model, n0, alpha, beta, save);
                }
                if (aql == null || ltpd == null) {
                    throw new FieldError(aql == null ? "aql" : "ltpd", "give --aql and --ltpd (or criteria per"
                            + " defect class with --class)");
                }
                Integer c = count(fields, "acceptance", 0);
                Integer n = count(fields, "sample-size", 1);
                DesignSinglePlan.Result result = DesignSinglePlan.run(new DesignSinglePlan.Request(model, n0,
                        List.of(new DesignSinglePlan.Criteria(DefectClass.ANY, null, aql, alpha, ltpd, beta, c, n)),
                        save));
                if (result.noPlanReason() != null) {
                    throw new NoPlan(result.noPlanReason());
                }
                SinglePlan plan = result.classes().get(0).found().plan();
                return designed(new Designed(label(plan), DesignRendering.text(result),
                        tiles(plan, result.classes().get(0).found().risks()), List.of(new Drawn(null, plan, aql, ltpd)),
                        model, n0, result.saved()));
            }
            case "double", "multiple", "sequential" -> {
                DesignStagedPlan.Result result = DesignStagedPlan.run(staged(scheme, fields, model, n0, aql, alpha,
                        ltpd, beta, save));
                if (result.noPlanReason() != null) {
                    throw new NoPlan(result.noPlanReason());
                }
                return designed(new Designed(label(result.plan()), StagedDesignRendering.text(result),
                        tiles(result.plan(), result.risks()), List.of(new Drawn(null, result.plan(), aql, ltpd)), model,
                        n0, result.saved()));
            }
            case "variables" -> {
                DesignVariablesPlan.Result result = DesignVariablesPlan.run(new DesignVariablesPlan.Request(model, n0,
                        aql, alpha, ltpd, beta, measure(fields, "lower"), measure(fields, "upper"),
                        measure(fields, "sigma"), text(fields, "limits"), text(fields, "characteristic"),
                        text(fields, "unit"), level(fields, "lower-aql"), level(fields, "lower-ltpd"),
                        count(fields, "sample-size", 1), measure(fields, "k"), save));
                if (result.noPlanReason() != null) {
                    throw new NoPlan(result.noPlanReason());
                }
                VariablesPlan plan = result.design().plan();
                return designed(new Designed(label(plan), VariablesDesignRendering.text(result),
                        tiles(plan, result.design().risks()), List.of(new Drawn(null, plan, aql, ltpd)), model, n0,
                        result.saved()));
            }
            default -> throw new FieldError("scheme", "--scheme " + scheme + ": give single, double, multiple,"
                    + " sequential or variables");
        }
    }

    /**
     * The request for a plan in stages or a sequential plan, from the fields its scheme shows: the double plan's
     * design space or given stages, where its ASN is minimised and whether it is curtailed, the sequential
     * plan's truncation and lines. The checks are the design command's, in its words.
     */
    private static DesignStagedPlan.Request staged(String scheme, Map<String, String> fields, OcModel model, int lotSize,
            Double aql, double alpha, Double ltpd, double beta, SaveTarget save) {
        boolean isDouble = scheme.equals("double");
        List<Stage> stages = scheme.equals("sequential") ? List.of() : stages(text(fields, "stages"));
        if (scheme.equals("multiple") && stages.size() < 2) {
            throw new FieldError("stages", "--scheme multiple needs its stages: give 2 to "
                    + MultiplePlan.MOST_STAGES + " --stage options, e.g. --stage 20:-:3 --stage 20:1:4"
                    + " --stage 20:3:4");
        }
        String ratio = text(fields, "second-ratio");
        Integer firstRejection = count(fields, "first-rejection", 1);
        Double asnAt = level(fields, "asn-at");
        DoublePlanDesigner.Space space = null;
        if (isDouble && stages.isEmpty()) {
            try {
                space = new DoublePlanDesigner.Space(TypedValues.secondRatio(ratio == null ? "1" : ratio),
                        firstRejection);
            } catch (IllegalArgumentException e) {
                throw new FieldError("second-ratio", e.getMessage());
            }
        } else if (isDouble && (firstRejection != null || asnAt != null || (ratio != null && !ratio.equals("1")))) {
            throw new FieldError("stages", "--first-rejection, --asn-at and --second-ratio shape a design; with"
                    + " --stage the plan is given");
        }
        Integer truncateAt = typed(fields, "truncate-at", TypedValues::truncation);
        return new DesignStagedPlan.Request(DesignStagedPlan.Scheme.valueOf(scheme.toUpperCase(Locale.ROOT)), model,
                lotSize, aql, alpha, ltpd, beta, stages, space, asnAt, truncateAt, "yes".equals(fields.get("plain-wald")),
                "yes".equals(fields.get("curtailed")), save);
    }

    /** A plan with criteria per defect class, one line of the classes field each; the chart draws every class. */
    private Map<String, Object> classed(String classes, OcModel model, int lotSize, double alpha, double beta,
            SaveTarget save) {
        List<DesignSinglePlan.Criteria> criteria = new ArrayList<>();
        for (String line : classes.split("\\R")) {
            if (line.isBlank()) {
                continue;
            }
            try {
                criteria.add(ClassCriteria.parse(line.trim(), alpha, beta));
            } catch (IllegalArgumentException e) {
                throw new FieldError("classes", e.getMessage());
            }
        }
        DesignSinglePlan.Result result = DesignSinglePlan.run(new DesignSinglePlan.Request(model, lotSize, criteria,
                save));
        if (result.noPlanReason() != null) {
            throw new NoPlan(result.noPlanReason());
        }
        List<Drawn> drawn = new ArrayList<>();
        for (DesignSinglePlan.ClassOutcome outcome : result.classes()) {
            drawn.add(new Drawn(outcome.defectClass(), outcome.found().plan(), outcome.points().aql(),
                    outcome.points().ltpd()));
        }
        return designed(new Designed("classes, n = " + result.sampleSize(), DesignRendering.text(result),
                classTiles(result.sampleSize(), drawn), drawn, model, lotSize, result.saved()));
    }

    /** The tiles of a plan per defect class: the lot's sample, then each class's plan. */
    private static List<Map<String, String>> classTiles(int sampleSize, List<Drawn> drawn) {
        List<Map<String, String>> tiles = new ArrayList<>();
        tiles.add(tile("n", Integer.toString(sampleSize)));
        for (Drawn plan : drawn) {
            tiles.add(tile(plan.defectClass().label(), plan.plan() instanceof SinglePlan single
                    ? "n " + single.n() + ", c " + single.c() : label(plan.plan())));
        }
        return tiles;
    }

    private static String label(Plan plan) {
        if (plan instanceof SinglePlan single) {
            return "n = " + single.n() + ", c = " + single.c();
        }
        if (plan instanceof DoublePlan d) {
            return "double n1 = " + d.n1() + ", c1 = " + d.c1() + ", r1 = " + d.r1() + "; n2 = " + d.n2() + ", c2 = "
                    + d.c2();
        }
        if (plan instanceof SequentialPlan) {
            return "sequential, at most " + plan.maxSampleSize() + " units";
        }
        if (plan instanceof MultiplePlan m) {
            return "multiple, " + m.stages().size() + " stages";
        }
        return plan.scheme() + " plan, n = " + plan.maxSampleSize();
    }

    private static List<Map<String, String>> tiles(Plan plan, lotgate.sampling.PlanRisks risks) {
        List<Map<String, String>> tiles = new ArrayList<>();
        if (plan instanceof SinglePlan single) {
            tiles.add(tile("n", Integer.toString(single.n())));
            tiles.add(tile("c", Integer.toString(single.c())));
        } else if (plan instanceof DoublePlan d) {
            tiles.add(tile("n1", Integer.toString(d.n1())));
            tiles.add(tile("c1", Integer.toString(d.c1())));
            tiles.add(tile("r1", Integer.toString(d.r1())));
            tiles.add(tile("n2", Integer.toString(d.n2())));
            tiles.add(tile("c2", Integer.toString(d.c2())));
        } else if (plan instanceof VariablesPlan v) {
            tiles.add(tile("n", Integer.toString(v.maxSampleSize())));
        } else {
            tiles.add(tile("most units", Integer.toString(plan.maxSampleSize())));
        }
        if (risks != null) {
            tiles.add(tile("producer's risk", Percent.probability(risks.producerRisk())));
            tiles.add(tile("consumer's risk", Percent.probability(risks.consumerRisk())));
        }
        return tiles;
    }

    private static Map<String, String> tile(String key, String value) {
        Map<String, String> tile = new LinkedHashMap<>();
        tile.put("k", key);
        tile.put("v", value);
        return tile;
    }

    /** The stages of a multiple or given double plan, written N:C:R and separated by spaces. */
    private static List<Stage> stages(String text) {
        try {
            return text == null ? new ArrayList<>() : TypedValues.stages(List.of(text.trim().split("[\\s,;]+")));
        } catch (IllegalArgumentException e) {
            throw new FieldError("stages", e.getMessage());
        }
    }

    private static String text(Map<String, String> fields, String name) {
        String value = fields.get(name);
        return value == null || value.isBlank() ? null : value.trim();
    }

    private static String invalid(String name, IllegalArgumentException e) {
        return "Invalid value for option '--" + name + "': " + e.getMessage();
    }

    /** A field's value read by the options' parser, or null when the field is blank; a refusal goes beside it. */
    private static <T> T typed(Map<String, String> fields, String name, Function<String, T> read) {
        String value = text(fields, name);
        try {
            return value == null ? null : read.apply(value);
        } catch (IllegalArgumentException e) {
            throw new FieldError(name, invalid(name, e));
        }
    }

    private static Double level(Map<String, String> fields, String name) {
        return typed(fields, name, TypedValues::fraction);
    }

    private static double risk(Map<String, String> fields, String name, double otherwise) {
        Double risk = typed(fields, name, TypedValues::risk);
        return risk == null ? otherwise : risk;
    }

    private static Integer count(Map<String, String> fields, String name, int least) {
        return typed(fields, name, value -> TypedValues.wholeNumber(value, least));
    }

    private static Double measure(Map<String, String> fields, String name) {
        return typed(fields, name, TypedValues::number);
    }

    /** No plan meets the request: the design command's words, exit code 5 there. */
    private static final class NoPlan extends RuntimeException {
        private static final long serialVersionUID = 1L;

        NoPlan(String reason) {
            super(DesignRendering.noPlanText(reason).strip(), null, false, false);
        }
    }
}
