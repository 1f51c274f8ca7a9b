package lotgate.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lotgate.history.SwitchingRules;
import lotgate.plan.PlanFamily;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** Makes a plan family: normal, tightened and reduced plans with the switching rules that choose between them. */
@Command(name = "family", mixinStandardHelpOptions = true, sortOptions = false, usageHelpAutoWidth = true,
        header = "Group normal, tightened and reduced plans into a plan family.",
        description = {"Writes a plan family file naming each variant plan with its fingerprint and the switching"
                + " rules' numbers. 'lotgate sentence FAMILY SHEET' then applies the variant that the supplier's"
                + " history calls for, and says why.", ""})
final class FamilyCommand implements Runnable {
    @Parameters(index = "0", paramLabel = "FAMILY", description = "The family file to write (e.g. plans/bolts-family.json).")
    Path file;

    @Option(names = "--normal", required = true, paramLabel = "PLAN", description = "The plan for normal inspection.")
    Path normal;

    @Option(names = "--tightened", required = true, paramLabel = "PLAN", description = "The plan for tightened inspection.")
    Path tightened;

    @Option(names = "--reduced", paramLabel = "PLAN", description = "The plan for reduced inspection (optional).")
    Path reduced;

    @Option(names = "--switching", paramLabel = "EDITION", defaultValue = "current",
            description = "The switching rules' edition: current (default) or older; see the README.")
    String edition;

    @Option(names = "--rule", paramLabel = "NAME=NUMBER",
            description = "A site's own number for one rule, repeatable: tightenRejected, tightenWithin,"
                    + " normalAfterAccepted, reduceAfterAccepted, reduceDefectiveLimit, discontinueRejected,"
                    + " discontinueLotsOnTightened (-1 turns a limit off).")
    List<String> rules = new java.util.ArrayList<>();

    @Option(names = "--replace", description = "Overwrite an existing family file.")
    boolean replace;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        if (!file.getFileName().toString().endsWith(".json")) {
            throw new ParameterException(spec.commandLine(), file + ": a plan family file name must end in .json");
        }
        if (Files.exists(file) && !replace) {
            throw new ParameterException(spec.commandLine(), file + ": the file exists; add --replace to overwrite it");
        }
        var json = switchingRules().toJson();
        Map<String, Path> plans = new LinkedHashMap<>();
        plans.put("normal", normal);
        plans.put("tightened", tightened);
        if (reduced != null) {
            plans.put("reduced", reduced);
        }
        PlanFamily.write(file, plans, json);
        PlanFamily family = PlanFamily.read(file);
        PrintWriter out = spec.commandLine().getOut();
        out.println("Plan family " + file + " written:");
        family.variants().forEach((severity, plan) -> out.println("  " + severity + ": " + family.files().get(severity)
                + " (fingerprint " + plan.shortFingerprint() + ", sample " + plan.sampleSize() + ")"));
        out.println("  switching rules: " + json);
        out.flush();
    }

    private SwitchingRules switchingRules() {
        SwitchingRules base;
        try {
            base = SwitchingRules.edition(edition);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "--switching: " + e.getMessage());
        }
        var json = base.toJson();
        for (String rule : rules) {
            String[] pair = rule.split("=");
            if (pair.length != 2 || !json.has(pair[0].trim()) || pair[0].trim().equals("edition")) {
                throw new ParameterException(spec.commandLine(), "--rule " + rule + ": give NAME=NUMBER with a rule"
                        + " named in --help");
            }
            try {
                json.put(pair[0].trim(), Integer.parseInt(pair[1].trim()));
            } catch (NumberFormatException e) {
                throw new ParameterException(spec.commandLine(), "--rule " + rule + ": the number is not a whole number");
            }
        }
        json.put("edition", rules.isEmpty() ? base.edition() : base.edition() + " with site rules");
        try {
            return SwitchingRules.fromJson(json);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "--rule: " + e.getMessage());
        }
    }
}
