package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The lookup and least-inspection commands: their outputs, what they save, and their refusals. */
class TableCommandsTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path folder;

    private static JsonNode json(Cli.Result result) throws Exception {
        assertEquals(0, result.exitCode(), result.err());
        return JSON.readTree(result.out());
    }

    @Test
    void aSearchThatReachesItsLimitExitsAsNoPlanMeetsTheRequest() {
        // The search's own limit takes tens of seconds to reach; its refusal is the job's, passed on as it is.
        picocli.CommandLine cli = Main.commandLine("least-inspection");
        java.io.StringWriter err = new java.io.StringWriter();
        cli.setErr(new java.io.PrintWriter(err, true));
        picocli.CommandLine.ParseResult parsed = cli.parseArgs("least-inspection", "-N", "1000000", "--ltpd", "1%",
                "-p", "0.9%", "--scheme", "double");
        lotgate.jobs.JobException stopped = new lotgate.jobs.JobException(lotgate.jobs.JobException.Kind.NO_PLAN,
                "scheme", "--scheme double: the search stopped after evaluating 812 plans without proving one the least"
                        + "; use the single plan");
        int code = Outcomes.failure(stopped, cli.getSubcommands().get("least-inspection"), parsed);
        assertEquals(5, code);
        assertEquals("lotgate: --scheme double: the search stopped after evaluating 812 plans without proving one the"
                + " least; use the single plan\n", err.toString());
        assertEquals(ExitCode.NO_PLAN, Outcomes.exitCode(lotgate.jobs.JobException.Kind.NO_PLAN));
    }

    @Test
    void leastInspectionHelpNamesTheModelItUsesWhenNoneIsGiven() {
        String help = Cli.run("least-inspection", "--help").out().replaceAll("\\s+", " ");
        assertTrue(help.contains("hypergeometric (the lot of --lot-size units itself, type A; the default)"), help);
        String plan = Cli.run("least-inspection", "-N", "5000", "--ltpd", "5%", "-p", "0.5%").out();
        assertTrue(plan.contains("hypergeometric model"), plan);
        // Elsewhere the binomial model stays the default, and the help says so.
        assertTrue(Cli.run("design", "--help").out().replaceAll("\\s+", " ").contains("type B; the default"));
    }

    @Test
    void lookupShowsTheCodeLetterThePlanAndTheRisksTheTablesDoNotPrint() {
        Cli.Result result = Cli.run("lookup", "--lot-size", "200", "--aql", "1.5");
        assertEquals(0, result.exitCode(), result.err());
        // The example: G, n = 32, Ac 1 (MIL-STD-105E, from memory); 11.62% passes one time in ten and a lot at
        // the AQL is rejected about one time in twelve (SciPy 1.10.1: 0.11619507645219035, 0.083018085736344505).
        assertTrue(result.out().contains("sample size code letter G (Table I)"), result.out());
        assertTrue(result.out().contains("inspect n = 32 units."), result.out());
        assertTrue(result.out().contains("Accept the lot with up to Ac = 1 nonconforming unit; reject it at Re = 2 or"
                + " more."), result.out());
        assertTrue(result.out().contains("8.302% (a lot at the AQL is rejected about one time in 12)"), result.out());
        assertTrue(result.out().contains("11.62% (such a lot passes one time in ten)"), result.out());
    }

    @Test
    void lookupInJsonNamesTheLetterAndThePlanAsDesignDoes() throws Exception {
        JsonNode single = json(Cli.run("lookup", "-N", "2000", "--aql", "0.65%", "--severity", "reduced", "-f",
                "json"));
        // MIL-STD-105E Table II-C (from memory): K, 50, Ac 1, Re 3.
        assertEquals("K", single.path("codeLetter").asText());
        assertEquals(50, single.path("n").asInt());
        assertEquals(1, single.path("c").asInt());
        assertEquals(3, single.path("rejectionNumber").asInt());
        // SciPy 1.10.1: P(X >= 3 | 50, 0.65%) and P(X = 2).
        assertEquals(0.0042855683342902543, single.path("producerRisk").asDouble(), 1e-13);
        assertEquals(0.037846056325686273, single.path("reinstateAtAql").asDouble(), 1e-13);
        JsonNode twice = json(Cli.run("lookup", "-N", "2000", "--aql", "0.65", "--scheme", "double", "-f", "json"));
        assertEquals(2, twice.path("stages").size());
        assertEquals(80, twice.path("stages").get(1).path("n").asInt());
        assertEquals(3, twice.path("stages").get(0).path("r").asInt());
        assertEquals(3, twice.path("stages").get(1).path("c").asInt());
        assertEquals(4, twice.path("stages").get(1).path("r").asInt());
    }

    @Test
    void lookupSaysWhenEveryUnitIsInspected() {
        Cli.Result result = Cli.run("lookup", "-N", "10", "--aql", "0.65");
        assertEquals(0, result.exitCode());
        assertTrue(result.out().contains("points down to the first plan below it, at code letter F."), result.out());
        assertTrue(result.out().contains("inspect every unit of the lot (100% inspection)"), result.out());
    }

    @Test
    void lookupRefusesABadLevelAnAqlOutsideTheSeriesAndABadSeverity() {
        Cli.Result level = Cli.run("lookup", "-N", "2000", "--aql", "0.65", "--level", "IV");
        assertEquals(2, level.exitCode());
        assertEquals("lotgate: --level: 'IV' is not an inspection level; use I, II, III (general) or S-1, S-2, S-3,"
                + " S-4 (special) (see 'lotgate lookup --help')\n", level.err());
        Cli.Result aql = Cli.run("lookup", "-N", "2000", "--aql", "0.5");
        assertEquals(2, aql.exitCode());
        assertEquals("lotgate: --aql: AQL 0.5% is not in the tables' preferred series: 0.010, 0.015, 0.025, 0.040,"
                + " 0.065, 0.10, 0.15, 0.25, 0.40, 0.65, 1.0, 1.5, 2.5, 4.0, 6.5, 10, 15, 25, 40, 65, 100, 150, 250, 400,"
                + " 650, 1000 (see 'lotgate lookup --help')\n", aql.err());
        Cli.Result severity = Cli.run("lookup", "-N", "2000", "--aql", "0.65", "--severity", "strict");
        assertEquals(2, severity.exitCode());
        assertEquals("lotgate: --severity: 'strict' is not a severity; use normal, tightened or reduced (see"
                + " 'lotgate lookup --help')\n", severity.err());
        Cli.Result word = Cli.run("lookup", "-N", "2000", "--aql", "low");
        assertEquals(2, word.exitCode());
        assertTrue(word.err().contains("'low' is not an AQL; write it in percent as the tables print it, e.g. 0.65"),
                word.err());
        Cli.Result noLot = Cli.run("lookup", "--aql", "0.65");
        assertEquals(2, noLot.exitCode());
        assertEquals("lotgate: give the lot size with --lot-size N: the tables' code letter depends on it (see"
                + " 'lotgate lookup --help')\n", noLot.err());
    }

    @Test
    void lookupSavesAnOrdinaryPlanThatShowReads() {
        Path plan = folder.resolve("clips.json");
        Cli.Result saved = Cli.run("lookup", "-N", "2000", "--aql", "0.65", "--save", plan.toString());
        assertEquals(0, saved.exitCode(), saved.err());
        assertTrue(saved.out().contains("Saved " + plan), saved.out());
        Cli.Result shown = Cli.run("show", plan.toString());
        assertEquals(0, shown.exitCode(), shown.err());
        assertTrue(shown.out().contains("125"), shown.out());
    }

    @Test
    void leastInspectionGivesThePlanWithItsAti() throws Exception {
        Cli.Result text = Cli.run("least-inspection", "--lot-size", "5000", "--ltpd", "5%", "--process-average",
                "0.5%");
        assertEquals(0, text.exitCode(), text.err());
        // Exact rationals, Python 3.11 (src/test/python/tables_reference.py): n = 131, c = 3, ATI 149.079...
        assertTrue(text.out().contains("Inspect n = 131 units. Accept the lot with up to c = 3 nonconforming units;"), text.out());
        assertTrue(text.out().contains("149.1 units per lot (of 5000)"), text.out());
        assertTrue(text.out().contains("'design' for the same protection"), text.out());
        JsonNode node = json(Cli.run("least-inspection", "-N", "5000", "--ltpd", "5%", "-p", "0.5%", "-f", "json"));
        assertEquals(131, node.path("n").asInt());
        assertEquals(3, node.path("c").asInt());
        assertEquals(4, node.path("rejectionNumber").asInt());
        assertEquals(149.07929926040518, node.path("ati").asDouble(), 1e-9);
        assertEquals("hypergeometric", node.path("model").asText());
    }

    @Test
    void leastInspectionSavesAndRefuses() {
        Path plan = folder.resolve("least.json");
        Cli.Result saved = Cli.run("least-inspection", "-N", "5000", "--aoql", "2%", "-p", "0.5%", "--model",
                "binomial", "--save", plan.toString());
        assertEquals(0, saved.exitCode(), saved.err());
        assertTrue(Files.exists(plan));
        Cli.Result both = Cli.run("least-inspection", "-N", "5000", "--aoql", "2%", "--ltpd", "5%", "-p", "0.5%");
        assertEquals(2, both.exitCode());
        assertEquals("lotgate: give either --ltpd (lot quality protection) or --aoql (average outgoing quality"
                + " protection) (see 'lotgate least-inspection --help')\n", both.err());
        Cli.Result average = Cli.run("least-inspection", "-N", "5000", "--ltpd", "5%");
        assertEquals(2, average.exitCode());
        assertEquals("lotgate: give the supplier's --process-average: the plan inspects least at that quality (see"
                + " 'lotgate least-inspection --help')\n", average.err());
        assertFalse(Files.exists(folder.resolve("none.json")));
    }

    @Test
    void leastInspectionDoubleGivesTheDoublePlanBesideTheSingleOne() throws Exception {
        Cli.Result text = Cli.run("least-inspection", "-N", "5000", "--ltpd", "5%", "-p", "0.5%", "--scheme",
                "double");
        assertEquals(0, text.exitCode(), text.err());
        assertTrue(text.out().contains("First sample:  inspect n1 = 51 units. Accept with up to c1 = 0 nonconforming"
                + " units; reject at r1 = 5 or more."), text.out());
        assertTrue(text.out().contains("88.8 units per lot (of 5000)"), text.out());
        assertTrue(text.out().contains("The single least-inspection plan for the same protection is n = 131, c = 3:"),
                text.out());
        JsonNode node = json(Cli.run("least-inspection", "-N", "5000", "--ltpd", "5%", "-p", "0.5%", "--scheme",
                "double", "-f", "json"));
        assertEquals("double", node.path("scheme").asText());
        JsonNode stages = node.path("stages");
        assertEquals(2, stages.size());
        assertEquals(List.of(51, 0, 5), List.of(stages.get(0).path("n").asInt(), stages.get(0).path("c").asInt(),
                stages.get(0).path("r").asInt()));
        assertEquals(List.of(134, 4, 5), List.of(stages.get(1).path("n").asInt(), stages.get(1).path("c").asInt(),
                stages.get(1).path("r").asInt()));
        // Exact rationals, Python 3.11.2 (src/test/python/double_least_inspection_reference.py): ATI
        // 88.822472388459289, P(accept | LTPD 5%) 0.099382429780347503, and n2 = 133 accepts 0.10038 (not enough).
        assertEquals(88.822472388459289, node.path("ati").asDouble(), 1e-9);
        for (String field : List.of("asn", "acceptanceAtAverage", "firstSampleAcceptanceAtAverage", "ltpd10", "ltpd5",
                "aoql", "aoqlAt", "plansCompared")) {
            assertTrue(node.path(field).isNumber(), field + " in " + node);
        }
        JsonNode single = node.path("singleComparison");
        assertEquals(131, single.path("n").asInt());
        assertEquals(3, single.path("c").asInt());
        // Exact rationals, Python 3.11 (src/test/python/tables_reference.py): the single plan's ATI 149.079...
        assertEquals(149.07929926040518 - 88.822472388459289, single.path("atiSaved").asDouble(), 1e-8);
    }

    @Test
    void theSavedDoubleLeastInspectionPlanSentencesALot() throws Exception {
        Path plan = folder.resolve("least-double.json");
        Cli.Result saved = Cli.run("least-inspection", "-N", "5000", "--ltpd", "5%", "-p", "0.5%", "--scheme",
                "double", "--save", plan.toString());
        assertEquals(0, saved.exitCode(), saved.err());
        Cli.Result decided = Cli.run("sentence", plan.toString(), sheet("first.csv", 51).toString(), "--lot", "D-1",
                "--no-record");
        assertEquals(0, decided.exitCode(), decided.err());
        assertTrue(decided.out().startsWith("ACCEPT lot D-1"), decided.out());
        assertTrue(decided.out().contains("double plan: n1 = 51, c1 = 0, r1 = 5; n2 = 134, c2 = 4"), decided.out());
    }

    @Test
    void leastInspectionDoubleRefusesAnAoqlProtectionAndAnUnknownScheme() {
        Cli.Result aoql = Cli.run("least-inspection", "-N", "5000", "--aoql", "2%", "-p", "0.5%", "--scheme", "double",
                "--save", folder.resolve("none.json").toString());
        assertEquals(2, aoql.exitCode());
        assertEquals("lotgate: --scheme double: the double least-inspection plan is designed for LTPD protection; give"
                + " --ltpd instead of --aoql (see 'lotgate least-inspection --help')\n", aoql.err());
        Cli.Result unknown = Cli.run("least-inspection", "-N", "5000", "--ltpd", "2%", "-p", "0.5%", "--scheme",
                "triple");
        assertEquals(2, unknown.exitCode());
        assertEquals("lotgate: --scheme triple: least-inspection plans are single or double (see 'lotgate"
                + " least-inspection --help')\n", unknown.err());
        assertEquals("", unknown.out());
        assertFalse(Files.exists(folder.resolve("none.json")));
    }

    private Path sheet(String name, int units, int... failing) throws Exception {
        StringBuilder text = new StringBuilder("unit,result\n");
        for (int i = 1; i <= units; i++) {
            final int unit = i;
            text.append("C").append(i).append(',')
                    .append(java.util.Arrays.stream(failing).anyMatch(f -> f == unit) ? "fail" : "pass").append('\n');
        }
        Path file = folder.resolve(name);
        Files.writeString(file, text.toString());
        return file;
    }

    private Cli.Result sentence(Path family, String store, Path sheet, String lot) {
        return Cli.run("sentence", family.toString(), sheet.toString(), "--lot", lot, "--supplier",
                "Invented Clips Ltd (invented)", "--part", "CL-1", "--lot-size", "2000", "--store", store,
                "--create-store");
    }

    @Test
    void theSavedFamilySentencesALotAtOnceAndReducedInspectionReinstatesNormalBetweenAcAndRe() throws Exception {
        Path family = folder.resolve("clips.json");
        Cli.Result saved = Cli.run("lookup", "-N", "2000", "--aql", "0.65", "--save-family", family.toString());
        assertEquals(0, saved.exitCode(), saved.err());
        String store = folder.resolve("history.sqlite").toString();
        // Normal inspection, K: 125 units, Ac 2 (MIL-STD-105E Table II-A, from memory): two failures accept.
        Cli.Result first = sentence(family, store, sheet("l1.csv", 125, 23, 97), "L-1");
        assertEquals(0, first.exitCode(), first.err());
        assertTrue(first.out().startsWith("ACCEPT"), first.out());
        // Ten accepted lots with steady production earn reduced inspection (the switching rules, from memory).
        for (int lot = 2; lot <= 10; lot++) {
            assertEquals(0, sentence(family, store, sheet("l" + lot + ".csv", 125), "L-" + lot).exitCode());
        }
        // Reduced, K: 50 units, Ac 1, Re 3 (Table II-C, from memory): two failures accept the lot and reinstate
        // normal inspection.
        Cli.Result between = sentence(family, store, sheet("l11.csv", 50, 5, 40), "L-11");
        assertEquals(0, between.exitCode(), between.err());
        assertTrue(between.out().startsWith("ACCEPT"), between.out());
        assertTrue(between.out().contains("above the acceptance number 1 and below the rejection number 3: the lot is"
                + " accepted, and normal inspection is reinstated for the next lot"), between.out());
        assertTrue(between.out().contains("SWITCH: reduced to normal inspection for the next lot: lot L-11 accepted on"
                + " reduced inspection with a count between the acceptance and rejection numbers"), between.out());
        // The next lot is judged on the normal plan again: 125 units.
        Cli.Result next = sentence(family, store, sheet("l12.csv", 125), "L-12");
        assertEquals(0, next.exitCode(), next.err());
        assertTrue(next.out().contains("normal"), next.out());
        // Three failures in the reduced sample reject; shown with the plan alone (a trial, not recorded).
        Cli.Result rejected = Cli.run("sentence", folder.resolve("clips-reduced.json").toString(),
                sheet("l13.csv", 50, 1, 2, 3).toString(), "--lot", "L-13", "--no-record");
        assertEquals(1, rejected.exitCode(), rejected.out() + rejected.err());
    }
}
