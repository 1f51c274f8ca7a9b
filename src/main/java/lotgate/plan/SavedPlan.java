package lotgate.plan;

import java.time.Instant;
import java.util.List;
import java.util.Objects;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;

/**
 * A plan as saved under plans/: the acceptance criteria per defect class (or one set for every
 * nonconformity alike), the model they were designed under, with the fingerprint that every decision
 * made with the plan quotes.
 *
 * @param lotSize the lot size the plan was designed for, or 0 for none
 * @param classes one entry per defect class, in the order critical, major, minor (or one "any")
 * @param measurement for a variables plan, what it measures and its limits; null for attribute plans
 */
public record SavedPlan(String name, String description, Instant created, OcModel model, int lotSize,
        List<ClassPlan> classes, String fingerprint, Measurement measurement) {

    public static final String SMALLEST_SAMPLE = "smallest-sample";
    public static final String FIXED_ACCEPTANCE = "fixed-acceptance-number";
    public static final String GIVEN = "given";
    /** A double plan with the smallest average sample number that meets both risks. */
    public static final String SMALLEST_ASN = "smallest-asn";
    /** A sequential plan with Wald's lines for the design points. */
    public static final String WALD = "wald";
    /** A plan read from the published attribute sampling tables for a code letter and AQL. */
    public static final String ATTRIBUTE_TABLES = "attribute-tables";
    /** A single plan with the least average total inspection under an LTPD or AOQL protection (Dodge-Romig). */
    public static final String LEAST_INSPECTION = "least-inspection";


    public SavedPlan {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(created, "created");
        Objects.requireNonNull(model, "model");
        Objects.requireNonNull(fingerprint, "fingerprint");
        classes = List.copyOf(classes);
        if (classes.isEmpty()) {
            throw new IllegalArgumentException("a plan needs criteria for at least one defect class");
        }
    }

    /** An attribute plan, which measures nothing. */
    public SavedPlan(String name, String description, Instant created, OcModel model, int lotSize,
            List<ClassPlan> classes, String fingerprint) {
        this(name, description, created, model, lotSize, classes, fingerprint, null);
    }

    /** Whether the plan counts every nonconformity alike (one class, "any"). */
    public boolean unclassified() {
        return classes.size() == 1 && classes.get(0).defectClass() == DefectClass.ANY;
    }

    /** The criteria for a defect class, or null if the plan has none for it. */
    public ClassPlan criteria(DefectClass defectClass) {
        return classes.stream().filter(c -> c.defectClass() == defectClass).findFirst().orElse(null);
    }

    /** The number of units a lot's sample must hold: the largest sample of any class. */
    public int sampleSize() {
        return classes.stream().mapToInt(c -> c.plan().maxSampleSize()).max().orElseThrow();
    }

    private ClassPlan only() {
        if (classes.size() != 1) {
            throw new IllegalStateException("plan " + name + " has criteria for several defect classes");
        }
        return classes.get(0);
    }

    /** The sampling plan of a plan with a single class. */
    public Plan plan() {
        return only().plan();
    }

    public RiskPoints designedFor() {
        return only().designedFor();
    }

    public String method() {
        return only().method();
    }

    public PlanRisks achieved() {
        return only().achieved();
    }

    /** The first 12 hexadecimal digits of the fingerprint, enough for a person to compare. */
    public String shortFingerprint() {
        int colon = fingerprint.indexOf(':');
        String hex = fingerprint.substring(colon + 1);
        return hex.substring(0, Math.min(12, hex.length()));
    }
}
