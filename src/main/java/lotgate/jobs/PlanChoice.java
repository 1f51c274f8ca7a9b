package lotgate.jobs;

import java.nio.file.Path;
import java.util.Locale;
import lotgate.plan.ClassPlan;
import lotgate.plan.DefectClass;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.PlanWording;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SinglePlan;

/** A plan to study: read from a saved plan file (one defect class of it), or given as n and c with a model. */
public record PlanChoice(String label, Plan plan, OcModel model, int lotSize, SavedPlan saved, ClassPlan criteria) {

    /** The design points of a saved plan, or null for a plan given directly. */
    public RiskPoints designedFor() {
        return criteria == null ? null : criteria.designedFor();
    }

    /** The plan's name with its numbers, or its numbers alone for a plan given directly. */
    public String title() {
        String numbers = PlanWording.brief(plan);
        return saved == null ? numbers : label + " (" + numbers + ")";
    }

    /**
     * A saved plan, or one defect class of it (className null: the only one); {@code modelGiven} is a model
     * named by the user (refused: the file sets its own), and a lot size may add one where the plan has none.
     */
    public static PlanChoice saved(Path file, String className, String modelGiven, Integer lotSizeGiven) {
        SavedPlan saved = PlanFormat.read(file);
        ClassPlan criteria;
        if (className == null) {
            if (saved.classes().size() > 1) {
                throw JobException.invalid("class", "the plan file " + file + " has criteria for "
                        + classList(saved) + "; choose one with --class (or FILE#class in compare)");
            }
            criteria = saved.classes().get(0);
        } else {
            DefectClass wanted = DefectClass.of(className);
            criteria = wanted == null ? null : saved.criteria(wanted);
            if (criteria == null) {
                throw JobException.invalid("class", "the plan file " + file + " has no criteria for '"
                        + className + "'; it has " + classList(saved));
            }
        }
        if (modelGiven != null) {
            throw JobException.invalid("model", "--model: the plan file " + file
                    + " sets its own model (" + saved.model().name() + ")");
        }
        int lotSize = saved.lotSize();
        if (lotSizeGiven != null) {
            if (lotSize > 0 && lotSizeGiven != lotSize) {
                throw JobException.invalid("lotSize", "--lot-size " + lotSizeGiven + ": the plan file "
                        + file + " was designed for lots of " + lotSize);
            }
            lotSize = lotSizeGiven;
        }
        checkFits(criteria.plan(), lotSize);
        String label = saved.unclassified() ? saved.name() : saved.name() + " " + criteria.defectClass().label();
        return new PlanChoice(label, criteria.plan(), saved.model(), lotSize, saved, criteria);
    }

    private static String classList(SavedPlan saved) {
        return String.join(", ", saved.classes().stream().map(c -> c.defectClass().label()).toList());
    }

    /** A plan given as n and c, under a model (null: binomial) and lot size (null: none). */
    public static PlanChoice given(int n, int c, String modelName, Integer lotSize) {
        if (c >= n) {
            throw JobException.invalid("acceptance", "the acceptance number c = " + c
                    + " must be below the sample size n = " + n);
        }
        OcModel model = Checks.model(modelName, lotSize);
        SinglePlan plan = new SinglePlan(n, c);
        int size = lotSize == null ? 0 : lotSize;
        checkFits(plan, size);
        return new PlanChoice("n = " + n + ", c = " + c, plan, model, size, null, null);
    }

    /** A plan file, FILE.json#class for one class of it, or "132,3" as n and c. */
    public static PlanChoice parse(String text, String modelName, Integer lotSize) {
        int hash = text.lastIndexOf('#');
        String fileName = hash > 0 ? text.substring(0, hash) : text;
        if (fileName.toLowerCase(Locale.ROOT).endsWith(".json")) {
            return saved(Path.of(fileName), hash > 0 ? text.substring(hash + 1) : null, null, lotSize);
        }
        String[] parts = text.split(",");
        if (parts.length != 2) {
            throw JobException.invalid("plans", "'" + text + "' is neither a plan file (.json) nor"
                    + " a plan written as n,c such as 132,3");
        }
        try {
            return given(Integer.parseInt(parts[0].trim()), Integer.parseInt(parts[1].trim()), modelName, lotSize);
        } catch (NumberFormatException e) {
            throw JobException.invalid("plans", "'" + text + "': n and c must be whole numbers, as in 132,3");
        } catch (IllegalArgumentException e) {
            throw JobException.invalid("plans", "'" + text + "': " + e.getMessage());
        }
    }

    private static void checkFits(Plan plan, int lotSize) {
        if (lotSize > 0 && plan.maxSampleSize() > lotSize) {
            throw JobException.invalid("lotSize", "the plan inspects " + plan.maxSampleSize()
                    + " units, more than the lot size " + lotSize);
        }
    }
}
