package lotgate.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The demo's invented scenario as command lines, each with the story told before it and the exit code it
 * should end with. All companies, parts and numbers in it are invented.
 */
final class DemoTour {
    /** One command line of the tour; a quiet one's output is not shown (its report is the point). */
    record Step(String story, int expected, boolean quiet, String... args) {
    }

    private final String plans;
    private final String charts;
    private final List<Step> steps = new ArrayList<>();

    DemoTour(String plans, String charts) {
        this.plans = plans;
        this.charts = charts;
    }

    /** Designing, charting, comparing and saving the plans. */
    List<Step> designing() {
        steps.clear();
        step("1. Arnwick Fasteners ships M8 flange bolts (part AF-M8-40) in lots of 5000. Lots at 1%"
                        + " nonconforming should pass 95% of the time; lots at 5% should pass at most 10% of the time.",
                "design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "5000",
                "--save", plans + "/arnwick-af-m8-40.json", "--replace",
                "--description", "Invented demo: Arnwick Fasteners M8 flange bolt AF-M8-40, lots of 5000");
        step("   Its curves, with the OC, AOQ and ATI charts in one file:",
                "curve", plans + "/arnwick-af-m8-40.json", "--steps", "10",
                "--curves-chart", charts + "/arnwick-af-m8-40.png", "--oc-chart", charts + "/arnwick-af-m8-40-oc.svg",
                "--aoq-chart", charts + "/arnwick-af-m8-40-aoq.svg");
        step("2. A zero-acceptance alternative for the same bolts meets the LTPD point with fewer units:",
                "design", "--aql", "1%", "--ltpd", "5%", "--acceptance", "0", "--lot-size", "5000");
        step("   Side by side, the zero-acceptance plan rejects far more good lots (producer's risk):",
                "compare", plans + "/arnwick-af-m8-40.json", "45,0", "--lot-size", "5000",
                "--oc-chart", charts + "/arnwick-compare.png");
        step("3. Kestrune Castings sends impeller housings (part KC-114) in isolated lots of 400: the"
                        + " hypergeometric model counts the lot's actual nonconforming units.",
                "design", "--aql", "1%", "--ltpd", "6%", "--model", "hypergeometric", "--lot-size", "400",
                "--save", plans + "/kestrune-kc-114.json", "--replace",
                "--description", "Invented demo: Kestrune Castings impeller housing KC-114, isolated lots of 400");
        step("",
                "curve", plans + "/kestrune-kc-114.json", "--steps", "10",
                "--curves-chart", charts + "/kestrune-kc-114.png");
        step("4. Mirelle Seals' O-rings (part MS-22) are judged by surface nonconformities per unit: the"
                        + " Poisson model, with levels per unit (1.5% = 1.5 per 100 units).",
                "design", "--aql", "1.5%", "--ltpd", "8%", "--model", "poisson", "--lot-size", "10000",
                "--save", plans + "/mirelle-ms-22.json", "--replace",
                "--description", "Invented demo: Mirelle Seals O-ring MS-22, surface nonconformities per unit");
        step("5. The engineer checks a saved plan before handing it to the inspectors:",
                "show", plans + "/arnwick-af-m8-40.json");
        step("6. Kestrune's housings are judged per defect class: bore porosity is critical (zero acceptance),"
                        + " dimensions major, casting flash minor.",
                "design", "--model", "hypergeometric", "--lot-size", "400", "--class", "critical:c=0,aql=0.1%,ltpd=1%",
                "--class", "major:aql=1%,ltpd=6%", "--class", "minor:aql=4%,ltpd=15%",
                "--save", plans + "/kestrune-kc-114-classes.json", "--replace",
                "--description", "Invented demo: Kestrune Castings impeller housing KC-114 by defect class");
        return List.copyOf(steps);
    }

    /** Importing last year's lots, sentencing this year's, and auditing the suppliers. */
    List<Step> receiving(String sheets, String reports, String store) {
        steps.clear();
        step("7. The quality engineer loads last year's receiving records (49 invented lots) into a fresh"
                        + " history store:",
                "import", sheets + "/lots-2025.csv", "--store", store, "--create-store");
        step("8. For Arnwick's bolts, a tightened and a reduced plan join the normal one as a plan family:",
                "design", "--aql", "0.65%", "--ltpd", "4%", "--lot-size", "5000",
                "--save", plans + "/arnwick-af-m8-40-tightened.json", "--replace", "--format", "csv");
        step("", "design", "--aql", "1%", "--ltpd", "8%", "--lot-size", "5000",
                "--save", plans + "/arnwick-af-m8-40-reduced.json", "--replace", "--format", "csv");
        step("", "family", plans + "/arnwick-family.json", "--normal", plans + "/arnwick-af-m8-40.json",
                "--tightened", plans + "/arnwick-af-m8-40-tightened.json", "--reduced",
                plans + "/arnwick-af-m8-40-reduced.json", "--replace");
        step("9. At the receiving dock, the inspector sentences Arnwick lot AF-2611 from its inspection workbook"
                        + " (the lot details are on its 'lot' sheet). The family applies the plan for Arnwick's current"
                        + " severity, normal; a report and a decision record are written too:",
                "sentence", plans + "/arnwick-family.json", sheets + "/arnwick-af2611.xlsx", "--store", store,
                "--report", reports + "/AF-2611.html", "--report", reports + "/AF-2611.xlsx",
                "--record", reports + "/AF-2611.json");
        step("10. Lot AF-2618 comes as a semicolon-separated CSV with its details beside it; six bolts fail"
                        + " (exit code 1: rejected). It is the second rejected lot in five, so Arnwick's next lot goes"
                        + " on tightened inspection:", ExitCode.REJECTED,
                "sentence", plans + "/arnwick-family.json", sheets + "/arnwick-af2618.csv", "--store", store,
                "--report", reports + "/AF-2618.html");
        step("11. Kestrune lot KC-0907 holds a housing with bore porosity, a critical nonconformity:",
                ExitCode.REJECTED, "sentence", plans + "/kestrune-kc-114-classes.json",
                sheets + "/kestrune-kc0907.xlsx", "--store", store, "--report", reports + "/KC-0907.html");
        step("12. Mirelle's O-rings are counted in nonconformities: two rings carry three blemishes in all."
                        + " Mirelle earned reduced inspection last year, but its plan is a single plan, not a family, so"
                        + " lotgate applies it and says so:",
                "sentence", plans + "/mirelle-ms-22.json", sheets + "/mirelle-ms1130.csv", "--store", store);
        step("13. A sheet with a count typed as a word is refused by its cell (exit code 3), and nothing is"
                        + " recorded:", ExitCode.BAD_INPUT,
                "sentence", plans + "/mirelle-ms-22.json", sheets + "/mirelle-ms1204-malformed.xlsx", "--store", store);
        step("14. Quorrin Plastics' snap clips (part QP-7, lots of 2000) are pull-tested to destruction, so"
                        + " every clip inspected is lost. For the same risks as the bolts the engineer weighs the single"
                        + " plan against a double plan (designed for the smallest average sample number at the AQL)"
                        + " and an item-by-item sequential plan:",
                "design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "2000", "--save", plans + "/quorrin-qp-7.json",
                "--replace", "--description", "Invented demo: Quorrin Plastics snap clip QP-7, single plan",
                "--format", "csv");
        step("", "design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "2000", "--scheme", "double",
                "--save", plans + "/quorrin-qp-7-double.json", "--replace",
                "--description", "Invented demo: Quorrin Plastics snap clip QP-7, double plan");
        step("", "design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "2000", "--scheme", "sequential",
                "--save", plans + "/quorrin-qp-7-sequential.json", "--replace",
                "--description", "Invented demo: Quorrin Plastics snap clip QP-7, sequential plan");
        step("    What each costs on average and at most, on one table, one OC chart and one ASN chart:",
                "compare", plans + "/quorrin-qp-7.json", plans + "/quorrin-qp-7-double.json",
                plans + "/quorrin-qp-7-sequential.json", "--oc-chart", charts + "/quorrin-compare-oc.png",
                "--asn-chart", charts + "/quorrin-compare-asn.png");
        step("15. Quorrin lot QP-2611 under the double plan. After the first sample of 69 clips (sheet rows 2"
                        + " to 70) one clip has failed: no decision yet (exit code 9), nothing is recorded:",
                ExitCode.NOT_DECIDED, "sentence", plans + "/quorrin-qp-7-double.json", sheets + "/quorrin-qp2611.csv",
                "--rows", "2-70", "--store", store);
        step("    With the second sample on the sheet the lot is accepted and recorded, with its sampling chart:",
                "sentence", plans + "/quorrin-qp-7-double.json", sheets + "/quorrin-qp2611.csv", "--store", store,
                "--sampling-chart", charts + "/quorrin-qp2611-double.png", "--report", reports + "/QP-2611.html");
        step("    The same clips, in the order tested, under the sequential plan (a trial, not recorded): it"
                        + " would have stopped after 96 clips:",
                "sentence", plans + "/quorrin-qp-7-sequential.json", sheets + "/quorrin-qp2611.csv", "--no-record",
                "--sampling-chart", charts + "/quorrin-qp2611-sequential.png");
        step("    And under the single plan, on its 132 clips (a trial, not recorded):",
                "sentence", plans + "/quorrin-qp-7.json", sheets + "/quorrin-qp2611.csv", "--rows", "2-133",
                "--no-record", "--format", "csv");
        step("16. Kestrune's housings also have a measured characteristic: the bore diameter, 41.950 to 42.050"
                        + " mm. A variables plan (sigma unknown, both limits combined by the M-method) needs far fewer"
                        + " housings than counting bores out of tolerance would:",
                "design", "--scheme", "variables", "--aql", "1%", "--ltpd", "6%", "--lower", "41.95", "--upper", "42.05",
                "--unit", "mm", "--characteristic", "bore diameter", "--save", plans + "/kestrune-kc-114-bore.json",
                "--replace", "--description", "Invented demo: Kestrune Castings impeller housing KC-114, bore diameter");
        step("    Lot KC-0911's 42 bores, measured in order:",
                "sentence", plans + "/kestrune-kc-114-bore.json", sheets + "/kestrune-kc0911-bore.csv", "--store", store,
                "--report", reports + "/KC-0911.html");
        step("    Lot KC-0915 comes from a worn reamer: its bores are skewed, and lotgate says the k-method's"
                        + " normality does not hold:",
                "sentence", plans + "/kestrune-kc-114-bore.json", sheets + "/kestrune-kc0915-bore.csv", "--store", store,
                "--report", reports + "/KC-0915.html");
        step("17. The supplier audit: Arnwick's year, with its switches of severity, in a workbook and a page:",
                "supplier", "Arnwick Fasteners (invented)", "--store", store,
                "--report", reports + "/arnwick-audit.xlsx", "--report", reports + "/arnwick-audit.html");
        step("18. Mirelle's year: ten accepted lots in a row earned reduced inspection:",
                "supplier", "Mirelle Seals (invented)", "--store", store,
                "--report", reports + "/mirelle-audit.xlsx", "--report", reports + "/mirelle-audit.html");
        for (String other : new String[] {"Kestrune Castings (invented)", "Quorrin Plastics (invented)"}) {
            quietly("supplier", other, "--store", store, "--report", reports + "/"
                    + other.substring(0, other.indexOf(' ')).toLowerCase(Locale.ROOT) + "-audit.html");
        }
        step("19. All suppliers ranked; Quorrin's four lots leave it a wide interval (the audits of Kestrune,"
                        + " with its mean and s charts of the bores, and of Quorrin are in the reports folder too):",
                "suppliers", "--store", store, "--report", reports + "/ranking.html");
        step("20. Quorrin's new purchase order asks for attribute sampling at general inspection level II, AQL 0.65."
                        + " The engineer looks the plan up in the published tables for lots of 2000, sees the risks the"
                        + " tables do not print, and saves the normal, tightened and reduced plans with the switching"
                        + " rules as one family:",
                "lookup", "--lot-size", "2000", "--level", "II", "--aql", "0.65", "--save-family",
                plans + "/quorrin-qp-7-tables.json", "--replace-family", "--family-description",
                "Invented demo: Quorrin Plastics snap clip QP-7, purchase order level II, AQL 0.65");
        step("    Lot QP-2612 is sentenced with the family at once; the history says which plan applies:",
                "sentence", plans + "/quorrin-qp-7-tables.json", sheets + "/quorrin-qp2612.csv", "--store", store);
        step("21. Arnwick's bolts are also inspected in the plant with rectification (rejected lots screened"
                        + " 100%). The plan that inspects least at Arnwick's process average of 0.5%, with an LTPD of 5%"
                        + " for lots of 5000:",
                "least-inspection", "--lot-size", "5000", "--ltpd", "5%", "--process-average", "0.5%", "--save",
                plans + "/arnwick-af-m8-40-least.json", "--replace", "--description",
                "Invented demo: Arnwick Fasteners M8 flange bolt AF-M8-40, least inspection with rectification");
        step("22. Nothing in the history was altered or removed:", "verify", "--store", store);
        return List.copyOf(steps);
    }

    private void step(String story, String... args) {
        step(story, ExitCode.OK, args);
    }

    private void step(String story, int expected, String... args) {
        steps.add(new Step(story, expected, false, args));
    }

    private void quietly(String... args) {
        steps.add(new Step("", ExitCode.OK, true, args));
    }
}
