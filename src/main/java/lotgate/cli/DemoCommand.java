package lotgate.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * Walks through an invented receiving-inspection scenario with lotgate's own commands, printing each
 * command line before its output so that a new user can repeat any step.
 */
@Command(name = "demo", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
        header = "Run an invented receiving-inspection scenario from start to finish.",
        description = {"Designs, saves, charts and compares receiving-inspection plans for an invented scenario."
                + " All companies, parts and numbers in it are invented.", ""})
final class DemoCommand implements Runnable {

    @Option(names = "--out", paramLabel = "FOLDER", defaultValue = "demo-output",
            description = "Folder for the demo's plans and charts (default ${DEFAULT-VALUE}); rerunning replaces them.")
    Path folder;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        PrintWriter out = spec.commandLine().getOut();
        String plans = folder.resolve("plans").toString();
        String charts = folder.resolve("charts").toString();
        out.println("""
                lotgate demo: an invented scenario (every company, part and number in it is invented)

                Velloran Pumps, an invented maker of process pumps, receives parts at its Hollin Bay plant
                from three invented suppliers. Its supplier quality engineer designs one receiving-inspection
                plan per part, saves it for the inspectors, and studies what each plan does.
                """);
        step(out, "1. Arnwick Fasteners ships M8 flange bolts (part AF-M8-40) in lots of 5000. Lots at 1%"
                        + " nonconforming should pass 95% of the time; lots at 5% should pass at most 10% of the time.",
                "design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "5000",
                "--save", plans + "/arnwick-af-m8-40.json", "--replace",
                "--description", "Invented demo: Arnwick Fasteners M8 flange bolt AF-M8-40, lots of 5000");
        step(out, "   Its curves, with the OC, AOQ and ATI charts in one file:",
                "curve", plans + "/arnwick-af-m8-40.json", "--steps", "10",
                "--chart", charts + "/arnwick-af-m8-40.png", "--oc-chart", charts + "/arnwick-af-m8-40-oc.svg",
                "--aoq-chart", charts + "/arnwick-af-m8-40-aoq.svg");
        step(out, "2. A zero-acceptance alternative for the same bolts meets the LTPD point with fewer units:",
                "design", "--aql", "1%", "--ltpd", "5%", "--acceptance", "0", "--lot-size", "5000");
        step(out, "   Side by side, the zero-acceptance plan rejects far more good lots (producer's risk):",
                "compare", plans + "/arnwick-af-m8-40.json", "45,0", "--lot-size", "5000",
                "--chart", charts + "/arnwick-compare.png");
        step(out, "3. Kestrune Castings sends impeller housings (part KC-114) in isolated lots of 400: the"
                        + " hypergeometric model counts the lot's actual nonconforming units.",
                "design", "--aql", "1%", "--ltpd", "6%", "--model", "hypergeometric", "--lot-size", "400",
                "--save", plans + "/kestrune-kc-114.json", "--replace",
                "--description", "Invented demo: Kestrune Castings impeller housing KC-114, isolated lots of 400");
        step(out, "",
                "curve", plans + "/kestrune-kc-114.json", "--steps", "10",
                "--chart", charts + "/kestrune-kc-114.png");
        step(out, "4. Mirelle Seals' O-rings (part MS-22) are judged by surface nonconformities per unit: the"
                        + " Poisson model, with levels per unit (1.5% = 1.5 per 100 units).",
                "design", "--aql", "1.5%", "--ltpd", "8%", "--model", "poisson", "--lot-size", "10000",
                "--save", plans + "/mirelle-ms-22.json", "--replace",
                "--description", "Invented demo: Mirelle Seals O-ring MS-22, surface nonconformities per unit");
        step(out, "5. The engineer checks a saved plan before handing it to the inspectors:",
                "show", plans + "/arnwick-af-m8-40.json");
        out.println("Demo done. Plans are in " + plans + " and charts in " + charts + ".");
        out.println("Open " + charts + "/arnwick-af-m8-40.png to see the OC, AOQ and ATI curves together.");
        out.flush();
    }

    private void step(PrintWriter out, String story, String... args) {
        if (!story.isEmpty()) {
            out.println(story);
        }
        List<String> shown = new ArrayList<>();
        for (String arg : args) {
            shown.add(arg.contains(" ") ? "\"" + arg + "\"" : arg);
        }
        out.println("$ lotgate " + String.join(" ", shown));
        out.println();
        CommandLine cli = Main.commandLine();
        cli.setOut(out);
        cli.setErr(spec.commandLine().getErr());
        int code = cli.execute(args);
        out.println();
        if (code != ExitCode.OK) {
            throw new Main.Failure(code, "the demo step 'lotgate " + String.join(" ", args) + "' failed");
        }
    }
}
