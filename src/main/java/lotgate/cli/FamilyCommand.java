package lotgate.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import lotgate.jobs.MakePlanFamily;
import lotgate.report.results.FamilyRendering;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** Makes a plan family: normal, tightened and reduced plans with the switching rules that choose between them. */
@Command(name = "family", header = "Group normal, tightened and reduced plans into a plan family.",
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

    @Mixin
    SharedOptions.Switching switching;

    @Option(names = "--rule", paramLabel = "NAME=NUMBER",
            description = "A site's own number for one rule, repeatable: tightenRejected, tightenWithin,"
                    + " normalAfterAccepted, reduceAfterAccepted, reduceDefectiveLimit, discontinueRejected,"
                    + " discontinueLotsOnTightened (-1 turns a limit off).")
    List<String> rules = new java.util.ArrayList<>();

    @Mixin
    SharedOptions.Replace replace;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        MakePlanFamily.Result result = MakePlanFamily.run(new MakePlanFamily.Request(file, normal, tightened, reduced,
                switching.rules, rules, replace.on));
        PrintWriter out = spec.commandLine().getOut();
        out.print(FamilyRendering.text(result));
        out.flush();
    }
}
