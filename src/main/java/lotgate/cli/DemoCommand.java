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
@Command(name = "demo", header = "Run an invented receiving-inspection scenario from start to finish.",
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
        step(out, "6. Kestrune's housings are judged per defect class: bore porosity is critical (zero acceptance),"
                        + " dimensions major, casting flash minor.",
                "design", "--model", "hypergeometric", "--lot-size", "400", "--class", "critical:c=0,aql=0.1%,ltpd=1%",
                "--class", "major:aql=1%,ltpd=6%", "--class", "minor:aql=4%,ltpd=15%",
                "--save", plans + "/kestrune-kc-114-classes.json", "--replace",
                "--description", "Invented demo: Kestrune Castings impeller housing KC-114 by defect class");
        String sheets = copySheets(out);
        String reports = folder.resolve("reports").toString();
        String store = folder.resolve("history.sqlite").toString();
        for (String leftover : new String[] {store, store + "-wal", store + "-shm"}) {
            try {
                java.nio.file.Files.deleteIfExists(Path.of(leftover));
            } catch (java.io.IOException e) {
                throw new Main.Failure(ExitCode.CANNOT_WRITE, "cannot remove the old demo store " + leftover);
            }
        }
        step(out, "7. The quality engineer loads last year's receiving records (49 invented lots) into a fresh"
                        + " history store:",
                "import", sheets + "/lots-2025.csv", "--store", store, "--create-store");
        step(out, "8. For Arnwick's bolts, a tightened and a reduced plan join the normal one as a plan family:",
                "design", "--aql", "0.65%", "--ltpd", "4%", "--lot-size", "5000",
                "--save", plans + "/arnwick-af-m8-40-tightened.json", "--replace", "--format", "csv");
        step(out, "", "design", "--aql", "1%", "--ltpd", "8%", "--lot-size", "5000",
                "--save", plans + "/arnwick-af-m8-40-reduced.json", "--replace", "--format", "csv");
        step(out, "", "family", plans + "/arnwick-family.json", "--normal", plans + "/arnwick-af-m8-40.json",
                "--tightened", plans + "/arnwick-af-m8-40-tightened.json", "--reduced",
                plans + "/arnwick-af-m8-40-reduced.json", "--replace");
        step(out, "9. At the receiving dock, the inspector sentences Arnwick lot AF-2611 from its inspection workbook"
                        + " (the lot details are on its 'lot' sheet). The family applies the plan for Arnwick's current"
                        + " severity, normal; a report and a decision record are written too:",
                "sentence", plans + "/arnwick-family.json", sheets + "/arnwick-af2611.xlsx", "--store", store,
                "--report", reports + "/AF-2611.html", "--report", reports + "/AF-2611.xlsx",
                "--record", reports + "/AF-2611.json");
        step(out, "10. Lot AF-2618 comes as a semicolon-separated CSV with its details beside it; six bolts fail"
                        + " (exit code 1: rejected). It is the second rejected lot in five, so Arnwick's next lot goes"
                        + " on tightened inspection:", ExitCode.REJECTED,
                "sentence", plans + "/arnwick-family.json", sheets + "/arnwick-af2618.csv", "--store", store,
                "--report", reports + "/AF-2618.html");
        step(out, "11. Kestrune lot KC-0907 holds a housing with bore porosity, a critical nonconformity:",
                ExitCode.REJECTED, "sentence", plans + "/kestrune-kc-114-classes.json",
                sheets + "/kestrune-kc0907.xlsx", "--store", store, "--report", reports + "/KC-0907.html");
        step(out, "12. Mirelle's O-rings are counted in nonconformities: two rings carry three blemishes in all."
                        + " Mirelle earned reduced inspection last year, but its plan is a single plan, not a family, so"
                        + " lotgate applies it and says so:",
                "sentence", plans + "/mirelle-ms-22.json", sheets + "/mirelle-ms1130.csv", "--store", store);
        step(out, "13. A sheet with a count typed as a word is refused by its cell (exit code 3), and nothing is"
                        + " recorded:", ExitCode.BAD_INPUT,
                "sentence", plans + "/mirelle-ms-22.json", sheets + "/mirelle-ms1204-malformed.xlsx", "--store", store);
        step(out, "14. Quorrin Plastics' snap clips (part QP-7, lots of 2000) are pull-tested to destruction, so"
                        + " every clip inspected is lost. For the same risks as the bolts the engineer weighs the single"
                        + " plan against a double plan (designed for the smallest average sample number at the AQL)"
                        + " and an item-by-item sequential plan:",
                "design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "2000", "--save", plans + "/quorrin-qp-7.json",
                "--replace", "--description", "Invented demo: Quorrin Plastics snap clip QP-7, single plan",
                "--format", "csv");
        step(out, "", "design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "2000", "--scheme", "double",
                "--save", plans + "/quorrin-qp-7-double.json", "--replace",
                "--description", "Invented demo: Quorrin Plastics snap clip QP-7, double plan");
        step(out, "", "design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "2000", "--scheme", "sequential",
                "--save", plans + "/quorrin-qp-7-sequential.json", "--replace",
                "--description", "Invented demo: Quorrin Plastics snap clip QP-7, sequential plan");
        step(out, "    What each costs on average and at most, on one table, one OC chart and one ASN chart:",
                "compare", plans + "/quorrin-qp-7.json", plans + "/quorrin-qp-7-double.json",
                plans + "/quorrin-qp-7-sequential.json", "--chart", charts + "/quorrin-compare-oc.png",
                "--asn-chart", charts + "/quorrin-compare-asn.png");
        step(out, "15. Quorrin lot QP-2611 under the double plan. After the first sample of 69 clips (sheet rows 2"
                        + " to 70) one clip has failed: no decision yet (exit code 9), nothing is recorded:",
                ExitCode.NOT_DECIDED, "sentence", plans + "/quorrin-qp-7-double.json", sheets + "/quorrin-qp2611.csv",
                "--rows", "2-70", "--store", store);
        step(out, "    With the second sample on the sheet the lot is accepted and recorded, with its sampling chart:",
                "sentence", plans + "/quorrin-qp-7-double.json", sheets + "/quorrin-qp2611.csv", "--store", store,
                "--chart", charts + "/quorrin-qp2611-double.png", "--report", reports + "/QP-2611.html");
        step(out, "    The same clips, in the order tested, under the sequential plan (a trial, not recorded): it"
                        + " would have stopped after 96 clips:",
                "sentence", plans + "/quorrin-qp-7-sequential.json", sheets + "/quorrin-qp2611.csv", "--no-record",
                "--chart", charts + "/quorrin-qp2611-sequential.png");
        step(out, "    And under the single plan, on its 132 clips (a trial, not recorded):",
                "sentence", plans + "/quorrin-qp-7.json", sheets + "/quorrin-qp2611.csv", "--rows", "2-133",
                "--no-record", "--format", "csv");
        step(out, "16. Kestrune's housings also have a measured characteristic: the bore diameter, 41.950 to 42.050"
                        + " mm. A variables plan (sigma unknown, both limits combined by the M-method) needs far fewer"
                        + " housings than counting bores out of tolerance would:",
                "design", "--scheme", "variables", "--aql", "1%", "--ltpd", "6%", "--lower", "41.95", "--upper", "42.05",
                "--unit", "mm", "--characteristic", "bore diameter", "--save", plans + "/kestrune-kc-114-bore.json",
                "--replace", "--description", "Invented demo: Kestrune Castings impeller housing KC-114, bore diameter");
        step(out, "    Lot KC-0911's 42 bores, measured in order:",
                "sentence", plans + "/kestrune-kc-114-bore.json", sheets + "/kestrune-kc0911-bore.csv", "--store", store,
                "--report", reports + "/KC-0911.html");
        step(out, "    Lot KC-0915 comes from a worn reamer: its bores are skewed, and lotgate says the k-method's"
                        + " normality does not hold:",
                "sentence", plans + "/kestrune-kc-114-bore.json", sheets + "/kestrune-kc0915-bore.csv", "--store", store,
                "--report", reports + "/KC-0915.html");
        step(out, "17. The supplier audit: Arnwick's year, with its switches of severity, in a workbook and a page:",
                "supplier", "Arnwick Fasteners (invented)", "--store", store,
                "--report", reports + "/arnwick-audit.xlsx", "--report", reports + "/arnwick-audit.html");
        step(out, "18. Mirelle's year: ten accepted lots in a row earned reduced inspection:",
                "supplier", "Mirelle Seals (invented)", "--store", store,
                "--report", reports + "/mirelle-audit.xlsx", "--report", reports + "/mirelle-audit.html");
        for (String other : new String[] {"Kestrune Castings (invented)", "Quorrin Plastics (invented)"}) {
            quietly("supplier", other, "--store", store, "--report", reports + "/"
                    + other.substring(0, other.indexOf(' ')).toLowerCase(java.util.Locale.ROOT) + "-audit.html");
        }
        step(out, "19. All suppliers ranked; Quorrin's four lots leave it a wide interval (the audits of Kestrune,"
                        + " with its mean and s charts of the bores, and of Quorrin are in the reports folder too):",
                "suppliers", "--store", store, "--report", reports + "/ranking.html");
        step(out, "20. Nothing in the history was altered or removed:", "verify", "--store", store);
        out.println("Demo done. Plans are in " + plans + ", charts in " + charts + ", lot and audit reports in "
                + reports + ", the history in " + folder.resolve("history.sqlite") + ".");
        out.println("Open " + charts + "/arnwick-af-m8-40.png for the OC, AOQ and ATI curves together, "
                + reports + "/KC-0907.html for a lot report, " + charts + "/quorrin-compare-asn.png for what single,"
                + " double and sequential plans cost, and " + reports + "/arnwick-audit.xlsx for the audit.");
        out.println("To do all this in a browser, on the demo's plans and history: lotgate workbench --store "
                + folder.resolve("history.sqlite") + " --plans " + plans + " --reports " + reports);
        out.flush();
    }

    private static final String[] SHEETS = {"arnwick-af2611.xlsx", "arnwick-af2618.csv", "arnwick-af2618.lot.csv",
            "kestrune-kc0907.xlsx", "mirelle-ms1130.csv", "mirelle-ms1130.lot.csv", "mirelle-ms1204-malformed.xlsx",
            "lots-2025.csv", "quorrin-qp2611.csv", "quorrin-qp2611.lot.csv", "kestrune-kc0911-bore.csv",
            "kestrune-kc0911-bore.lot.csv", "kestrune-kc0915-bore.csv", "kestrune-kc0915-bore.lot.csv"};

    /** Copies the invented inspection sheets that travel in the jar into the demo's folder. */
    private String copySheets(PrintWriter out) {
        Path target = folder.resolve("sheets");
        for (String name : SHEETS) {
            try (java.io.InputStream in = DemoCommand.class.getResourceAsStream("/lotgate/demo-data/" + name)) {
                if (in == null) {
                    throw new Main.Failure(ExitCode.INTERNAL, "the demo sheet " + name + " is missing from lotgate");
                }
                byte[] bytes = in.readAllBytes();
                lotgate.files.AtomicWrite.write(target.resolve(name), o -> o.write(bytes));
            } catch (java.io.IOException e) {
                throw new Main.Failure(ExitCode.INTERNAL, "cannot read the demo sheet " + name + ": " + e.getMessage());
            }
        }
        out.println("The invented inspection sheets of eight lots and last year's lot list are copied to " + target
                + " (the same as demo-data/ in the repository).");
        out.println();
        return target.toString();
    }

    /** Runs a step whose output the demo does not show (its report is the point). */
    private void quietly(String... args) {
        PrintWriter nowhere = new PrintWriter(java.io.Writer.nullWriter());
        CommandLine cli = Main.commandLine(args);
        cli.setOut(nowhere);
        cli.setErr(spec.commandLine().getErr());
        int code = cli.execute(args);
        if (code != ExitCode.OK) {
            throw new Main.Failure(code, "the demo step 'lotgate " + String.join(" ", args) + "' failed");
        }
    }

    private void step(PrintWriter out, String story, String... args) {
        step(out, story, ExitCode.OK, args);
    }

    private void step(PrintWriter out, String story, int expected, String... args) {
        if (!story.isEmpty()) {
            out.println(story);
        }
        List<String> shown = new ArrayList<>();
        for (String arg : args) {
            shown.add(arg.contains(" ") ? "\"" + arg + "\"" : arg);
        }
        out.println("$ lotgate " + String.join(" ", shown));
        out.println();
        CommandLine cli = Main.commandLine(args);
        cli.setOut(out);
        cli.setErr(new PrintWriter(new java.io.Writer() {
            @Override
            public void write(char[] text, int offset, int length) {
                out.write(text, offset, length);
            }

            @Override
            public void flush() {
                out.flush();
            }

            @Override
            public void close() {
            }
        }, true));
        int code = cli.execute(args);
        out.println();
        if (code != expected) {
            throw new Main.Failure(code, "the demo step 'lotgate " + String.join(" ", args) + "' failed");
        }
    }
}
