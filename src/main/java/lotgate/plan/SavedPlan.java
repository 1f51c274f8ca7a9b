package lotgate.plan;

import java.time.Instant;
import java.util.Objects;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.PlanRisks;
import lotgate.sampling.RiskPoints;

/**
 * A plan as saved under plans/: the plan, the model it was designed under, what it was designed for
 * and what it achieves, with the fingerprint that every decision made with it quotes.
 *
 * @param lotSize the lot size the plan was designed for, or 0 for none
 * @param method  how the plan was obtained: {@link #SMALLEST_SAMPLE}, {@link #FIXED_ACCEPTANCE} or {@link #GIVEN}
 */
public record SavedPlan(String name, String description, Instant created, Plan plan, OcModel model, int lotSize,
        RiskPoints designedFor, String method, PlanRisks achieved, String fingerprint) {

    public static final String SMALLEST_SAMPLE = "smallest-sample";
    public static final String FIXED_ACCEPTANCE = "fixed-acceptance-number";
    public static final String GIVEN = "given";

    public SavedPlan {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(created, "created");
        Objects.requireNonNull(plan, "plan");
        Objects.requireNonNull(model, "model");
        Objects.requireNonNull(designedFor, "designedFor");
        Objects.requireNonNull(method, "method");
        Objects.requireNonNull(achieved, "achieved");
        Objects.requireNonNull(fingerprint, "fingerprint");
    }

    /** The first 12 hexadecimal digits of the fingerprint, enough for a person to compare. */
    public String shortFingerprint() {
        int colon = fingerprint.indexOf(':');
        String hex = fingerprint.substring(colon + 1);
        return hex.substring(0, Math.min(12, hex.length()));
    }
}
