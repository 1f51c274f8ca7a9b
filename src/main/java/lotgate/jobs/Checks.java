package lotgate.jobs;

import java.nio.file.Path;
import java.util.List;
import lotgate.report.ChartFile;
import lotgate.report.Percent;
import lotgate.report.SupplierReport;
import lotgate.sampling.OcModel;
import lotgate.sampling.RiskPoints;

/** Trade checks that several jobs make on the values of their requests. */
public final class Checks {
    private Checks() {
    }

    /** Refuses a --report of a supplier's audit or ranking that is neither .xlsx nor .html: "an audit report". */
    static void supplierReports(List<Path> reports, String kind) {
        for (Path report : reports) {
            if (!SupplierReport.supported(report)) {
                throw JobException.invalid("reports", "--report " + report + ": " + kind + " is a .xlsx or .html"
                        + " file");
            }
        }
    }

    /** Refuses a fraction nonconforming of 100% or more: such levels only make sense as nonconformities per unit. */
    public static void level(OcModel model, String field, double level) {
        if (model.countsUnits() && level >= 1) {
            throw JobException.invalid(field, "option '" + field + "': a fraction nonconforming"
                    + " must be below 100%, got " + Percent.level(level) + " (use --model poisson for"
                    + " nonconformities per unit)");
        }
    }

    /** The top of a curve's range may reach 100% nonconforming (every unit bad), never beyond. */
    public static void curveTop(OcModel model, String field, double level) {
        if (model.countsUnits() && level > 1) {
            throw JobException.invalid(field, "option '" + field + "': a fraction nonconforming"
                    + " cannot exceed 100%, got " + Percent.level(level) + " (use --model poisson for"
                    + " nonconformities per unit)");
        }
    }

    /** The risk points of a plan, checked value by value; {@code missing} says what to give when a level is absent. */
    static RiskPoints points(OcModel model, Double aql, double alpha, Double ltpd, double beta, String missing) {
        if (aql == null || ltpd == null) {
            throw JobException.invalid(aql == null ? "aql" : "ltpd", missing);
        }
        level(model, "--aql", aql);
        level(model, "--ltpd", ltpd);
        if (aql >= ltpd) {
            throw JobException.invalid("aql", "--aql " + Percent.level(aql) + " must be below --ltpd "
                    + Percent.level(ltpd));
        }
        if (alpha + beta >= 1) {
            throw JobException.invalid("alpha", "--alpha plus --beta must be below 100%");
        }
        return new RiskPoints(aql, alpha, ltpd, beta);
    }

    /** The OC model by name (null: binomial) for a lot size (null: none); the hypergeometric model needs one. */
    public static OcModel model(String name, Integer lotSize) {
        if ("hypergeometric".equals(name) && lotSize == null) {
            throw JobException.invalid("lotSize", "the hypergeometric model needs the lot size: add --lot-size N");
        }
        return OcModel.of(name == null ? "binomial" : name, lotSize == null ? 0 : lotSize);
    }

    /**
     * The lot size of a job that cannot do without one, of 2 units or more; {@code dependsOn} names what depends on
     * it and {@code tooSmall} says why a lot of one unit is refused, each in the job's own words.
     */
    static int requiredLotSize(Integer lotSize, String dependsOn, String tooSmall) {
        if (lotSize == null) {
            throw JobException.invalid("lotSize", "give the lot size with --lot-size N: " + dependsOn + " depends on"
                    + " it");
        }
        if (lotSize < 2) {
            throw JobException.invalid("lotSize", "--lot-size " + lotSize + ": " + tooSmall);
        }
        return lotSize;
    }

    /** Refuses a chart file that lotgate cannot draw to (PNG and SVG only). */
    public static void chartName(String field, Path file) {
        if (file != null && !ChartFile.supported(file)) {
            throw JobException.invalid(field, "chart file " + file + " must end in .png or .svg");
        }
    }
}
