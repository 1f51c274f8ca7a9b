package lotgate.web;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
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
import lotgate.plan.DefectClass;
import lotgate.plan.SavedPlan;
import lotgate.report.Percent;
import lotgate.report.results.DesignRendering;
import lotgate.report.results.PlanFileRendering;
import lotgate.report.results.StagedDesignRendering;
import lotgate.report.results.VariablesDesignRendering;
import lotgate.sampling.CurvePoint;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.MultiplePlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
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

    /** A designed plan as the page shows it. */
    private record Designed(String label, String text, List<Map<String, String>> tiles, Plan plan, OcModel model,
            int lotSize, Double aql, Double ltpd, SavedPlan saved) {
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
            Plan plan = saved.plan();
            Double aql = saved.designedFor() == null ? null : saved.designedFor().aql();
            Double ltpd = saved.designedFor() == null ? null : saved.designedFor().ltpd();
            return designed(new Designed(saved.name(), PlanFileRendering.text(shown).replace(file.toString(), file.getFileName().toString()), tiles(plan, saved.achieved()),
                    plan, saved.model(), saved.lotSize(), aql, ltpd, saved));
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
        PlanCurves.Result curves = PlanCurves.run(new PlanCurves.Request(designed.plan(), designed.model(),
                designed.lotSize(), designed.ltpd(), CURVE_STEPS));
        List<Double> x = new ArrayList<>();
        List<Double> oc = new ArrayList<>();
        List<String> ocText = new ArrayList<>();
        List<Double> aoq = new ArrayList<>();
        List<String> aoqText = new ArrayList<>();
        List<Double> ati = new ArrayList<>();
        List<String> atiText = new ArrayList<>();
        List<Double> asn = new ArrayList<>();
        List<String> asnText = new ArrayList<>();
        for (CurvePoint point : curves.points()) {
            x.add(point.quality());
            oc.add(point.acceptance());
            ocText.add(Percent.probability(point.acceptance()));
            aoq.add(point.aoq());
            aoqText.add(Percent.level(point.aoq()));
            ati.add(Double.isNaN(point.ati()) ? null : point.ati());
            atiText.add(Double.isNaN(point.ati()) ? "" : String.format(Locale.ROOT, "%.1f units", point.ati()));
            asn.add(point.asn());
            asnText.add(String.format(Locale.ROOT, "%.1f units", point.asn()));
        }
        Map<String, Object> curveMembers = new LinkedHashMap<>();
        curveMembers.put("x", x);
        curveMembers.put("xLabel", designed.model().countsUnits() ? "incoming quality (fraction nonconforming)"
                : "incoming quality (nonconformities per unit)");
        curveMembers.put("step", designed.model() instanceof OcModel.Hypergeometric);
        curveMembers.put("oc", Map.of("y", oc, "labels", ocText));
        curveMembers.put("aoq", Map.of("y", aoq, "labels", aoqText));
        if (designed.lotSize() > 0) {
            curveMembers.put("ati", Map.of("y", ati, "labels", atiText));
        }
        if (!(designed.plan() instanceof SinglePlan) && !(designed.plan() instanceof VariablesPlan)) {
            curveMembers.put("asn", Map.of("y", asn, "labels", asnText));
        } else {
            curveMembers.put("asn", Map.of("y", asn, "labels", asnText));
        }
        members.put("curves", curveMembers);
        List<Map<String, Object>> marks = new ArrayList<>();
        if (designed.aql() != null) {
            marks.add(Map.of("x", designed.aql(), "label", "AQL " + Percent.level(designed.aql())));
        }
        if (designed.ltpd() != null) {
            marks.add(Map.of("x", designed.ltpd(), "label", "LTPD " + Percent.level(designed.ltpd())));
        }
        members.put("marks", marks);
        if (designed.saved() != null) {
            members.put("fingerprint", designed.saved().shortFingerprint());
        }
        return members;
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
                return designed(new Designed("n = " + plan.n() + ", c = " + plan.c(), DesignRendering.text(result),
                        tiles(plan, result.classes().get(0).found().risks()), plan, model, n0, aql, ltpd,
                        result.saved()));
            }
            case "double", "multiple", "sequential" -> {
                List<Stage> stages = scheme.equals("sequential") ? List.of() : stages(text(fields, "stages"));
                if (scheme.equals("multiple") && stages.size() < 2) {
                    throw new FieldError("stages", "--scheme multiple needs its stages: give 2 to "
                            + MultiplePlan.MOST_STAGES + " --stage options, e.g. --stage 20:-:3 --stage 20:1:4"
                            + " --stage 20:3:4");
                }
                DesignStagedPlan.Result result = DesignStagedPlan.run(new DesignStagedPlan.Request(
                        DesignStagedPlan.Scheme.valueOf(scheme.toUpperCase(Locale.ROOT)), model, n0, aql, alpha, ltpd,
                        beta, stages, scheme.equals("double") && stages.isEmpty()
                                ? new lotgate.sampling.DoublePlanDesigner.Space(1.0, null) : null,
                        null, null, false, false, save));
                if (result.noPlanReason() != null) {
                    throw new NoPlan(result.noPlanReason());
                }
                return designed(new Designed(label(result.plan()), StagedDesignRendering.text(result),
                        tiles(result.plan(), result.risks()), result.plan(), model, n0, aql, ltpd, result.saved()));
            }
            case "variables" -> {
                Double lower = measure(fields, "lower");
                Double upper = measure(fields, "upper");
                Double sigma = measure(fields, "sigma");
                DesignVariablesPlan.Result result = DesignVariablesPlan.run(new DesignVariablesPlan.Request(model, n0,
                        aql, alpha, ltpd, beta, lower, upper, sigma, null, null, null, null, null, null, null, save));
                if (result.noPlanReason() != null) {
                    throw new NoPlan(result.noPlanReason());
                }
                VariablesPlan plan = result.design().plan();
                return designed(new Designed(label(plan), VariablesDesignRendering.text(result),
                        tiles(plan, result.design().risks()), plan, model, n0, aql, ltpd, result.saved()));
            }
            default -> throw new FieldError("scheme", "--scheme " + scheme + ": give single, double, multiple,"
                    + " sequential or variables");
        }
    }

    /** A plan with criteria per defect class, one line of the classes field each; the chart shows the first class. */
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
        DesignSinglePlan.ClassOutcome first = result.classes().get(0);
        SinglePlan plan = first.found().plan();
        List<Map<String, String>> tiles = new ArrayList<>();
        tiles.add(tile("n", Integer.toString(result.sampleSize())));
        for (DesignSinglePlan.ClassOutcome outcome : result.classes()) {
            tiles.add(tile(outcome.defectClass().label(), "n " + outcome.found().plan().n() + ", c "
                    + outcome.found().plan().c()));
        }
        return designed(new Designed(first.defectClass().label() + " n = " + plan.n() + ", c = " + plan.c(),
                DesignRendering.text(result), tiles, plan, model, lotSize, first.points().aql(), first.points().ltpd(),
                result.saved()));
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

    private static Double level(Map<String, String> fields, String name) {
        String value = text(fields, name);
        try {
            return value == null ? null : TypedValues.fraction(value);
        } catch (IllegalArgumentException e) {
            throw new FieldError(name, invalid(name, e));
        }
    }

    private static double risk(Map<String, String> fields, String name, double otherwise) {
        String value = text(fields, name);
        try {
            return value == null ? otherwise : TypedValues.risk(value);
        } catch (IllegalArgumentException e) {
            throw new FieldError(name, invalid(name, e));
        }
    }

    private static Integer count(Map<String, String> fields, String name, int least) {
        String value = text(fields, name);
        try {
            return value == null ? null : TypedValues.wholeNumber(value, least);
        } catch (IllegalArgumentException e) {
            throw new FieldError(name, invalid(name, e));
        }
    }

    private static Double measure(Map<String, String> fields, String name) {
        String value = text(fields, name);
        if (value == null) {
            return null;
        }
        try {
            return Double.parseDouble(value);
        } catch (NumberFormatException e) {
            throw new FieldError(name, "Invalid value for option '--" + name + "': '" + value + "' is not a"
                    + " number");
        }
    }

    /** No plan meets the request: the design command's words, exit code 5 there. */
    private static final class NoPlan extends RuntimeException {
        private static final long serialVersionUID = 1L;

        NoPlan(String reason) {
            super(DesignRendering.noPlanText(reason).strip(), null, false, false);
        }
    }
}
