package lotgate.report.results;

import java.io.PrintWriter;
import lotgate.jobs.MakePlanFamily;

/** A plan family as written, as text. */
public final class FamilyRendering {
    private FamilyRendering() {
    }

    /** The family's variants with their fingerprints and sample sizes, and its switching rules. */
    public static String text(MakePlanFamily.Result result) {
        return Text.of(out -> {
            out.println("Plan family " + result.file() + " written:");
            result.family().variants().forEach((severity, plan) -> out.println("  " + severity + ": "
                    + result.family().files().get(severity) + " (fingerprint " + plan.shortFingerprint() + ", sample "
                    + plan.sampleSize() + ")"));
            java.util.List<String> rules = lotgate.history.SwitchingRules.fromJson(result.switching()).describe();
            out.println("  switching rules (" + rules.get(0) + "):");
            rules.subList(1, rules.size()).forEach(rule -> out.println("    " + rule));
        });
    }
}
