package lotgate.cli;

import java.nio.file.Path;
import lotgate.plan.ClassPlan;
import lotgate.plan.DefectClass;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SinglePlan;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;

/** A plan to study: read from a saved plan file, or given as n and c with a model. */
record PlanChoice(String label, Plan plan, OcModel model, int lotSize, SavedPlan saved, ClassPlan criteria) {

    /** The design points of a saved plan, or null for a plan given directly. */
    RiskPoints designedFor() {
        return criteria == null ? null : criteria.designedFor();
    }

    /**
     * A saved plan, or one defect class of it; a --lot-size may add a lot size for AOQ and ATI where
     * the plan has none.
     */
    static PlanChoice saved(CommandSpec spec, Path file, String className, ModelOptions models) {
        SavedPlan saved = PlanFormat.read(file);
        ClassPlan criteria;
        if (className == null) {
            if (saved.classes().size() > 1) {
                throw new ParameterException(spec.commandLine(), "the plan file " + file + " has criteria for "
                        + classList(saved) + "; choose one with --class (or FILE#class in compare)");
            }
            criteria = saved.classes().get(0);
        } else {
            DefectClass wanted = DefectClass.of(className);
            criteria = wanted == null ? null : saved.criteria(wanted);
            if (criteria == null) {
                throw new ParameterException(spec.commandLine(), "the plan file " + file + " has no criteria for '"
                        + className + "'; it has " + classList(saved));
            }
        }
        if (models.model != null) {
            throw new ParameterException(spec.commandLine(), "--model: the plan file " + file
                    + " sets its own model (" + saved.model().name() + ")");
        }
        int lotSize = saved.lotSize();
        if (models.lotSize != null) {
            if (lotSize > 0 && models.lotSize != lotSize) {
                throw new ParameterException(spec.commandLine(), "--lot-size " + models.lotSize + ": the plan file "
                        + file + " was designed for lots of " + lotSize);
            }
            lotSize = models.lotSize;
        }
        checkFits(spec, criteria.plan(), lotSize);
        String label = saved.unclassified() ? saved.name() : saved.name() + " " + criteria.defectClass().label();
        return new PlanChoice(label, criteria.plan(), saved.model(), lotSize, saved, criteria);
    }

    private static String classList(SavedPlan saved) {
        return String.join(", ", saved.classes().stream().map(c -> c.defectClass().label()).toList());
    }

    /** A plan given as n and c, under the model and lot size from the options. */
    static PlanChoice given(CommandSpec spec, int n, int c, ModelOptions models) {
        if (c >= n) {
            throw new ParameterException(spec.commandLine(), "the acceptance number c = " + c
                    + " must be below the sample size n = " + n);
        }
        OcModel model = models.resolve(spec);
        SinglePlan plan = new SinglePlan(n, c);
        checkFits(spec, plan, models.lotSizeOrZero());
        return new PlanChoice("n = " + n + ", c = " + c, plan, model, models.lotSizeOrZero(), null, null);
    }

    /** A plan file, FILE.json#class for one class of it, or "132,3" as n and c. */
    static PlanChoice parse(CommandSpec spec, String text, ModelOptions models) {
        int hash = text.lastIndexOf('#');
        String fileName = hash > 0 ? text.substring(0, hash) : text;
        if (fileName.toLowerCase(java.util.Locale.ROOT).endsWith(".json")) {
            return saved(spec, Path.of(fileName), hash > 0 ? text.substring(hash + 1) : null, models.withoutModel());
        }
        String[] parts = text.split(",");
        if (parts.length != 2) {
            throw new ParameterException(spec.commandLine(), "'" + text + "' is neither a plan file (.json) nor"
                    + " a plan written as n,c such as 132,3");
        }
        try {
            return given(spec, Integer.parseInt(parts[0].trim()), Integer.parseInt(parts[1].trim()), models);
        } catch (NumberFormatException e) {
            throw new ParameterException(spec.commandLine(), "'" + text + "': n and c must be whole numbers,"
                    + " as in 132,3");
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "'" + text + "': " + e.getMessage());
        }
    }

    private static void checkFits(CommandSpec spec, Plan plan, int lotSize) {
        if (lotSize > 0 && plan.maxSampleSize() > lotSize) {
            throw new ParameterException(spec.commandLine(), "the plan inspects " + plan.maxSampleSize()
                    + " units, more than the lot size " + lotSize);
        }
    }
}
