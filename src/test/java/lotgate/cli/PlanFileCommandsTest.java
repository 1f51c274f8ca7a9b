package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Saving, showing, charting and comparing plans through the command line. */
class PlanFileCommandsTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path folder;

    private Path save(String name, String... extra) {
        Path file = folder.resolve(name);
        String[] args = Stream.concat(Stream.of("design", "--aql", "1%", "--ltpd", "5%", "--save", file.toString()),
                Arrays.stream(extra)).toArray(String[]::new);
        Cli.Result result = Cli.run(args);
        assertEquals(0, result.exitCode(), result.err());
        return file;
    }

    @Test
    void aSavedPlanIsShownWithItsFingerprint() throws Exception {
        Path file = save("bolts.json", "--description", "Invented bolts");
        Cli.Result shown = Cli.run("show", file.toString(), "--format", "json");
        assertEquals(0, shown.exitCode());
        JsonNode plan = JSON.readTree(shown.out());
        assertEquals(132, plan.get("n").asInt());
        assertEquals("Invented bolts", plan.get("description").asText());
        assertTrue(plan.get("fingerprint").asText().startsWith("sha256:"));
        JsonNode designed = JSON.readTree(Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--save",
                folder.resolve("again.json").toString(), "--format", "json").out());
        assertTrue(designed.get("fingerprint").asText().startsWith("sha256:"));
    }

    @Test
    void anExistingPlanIsNotOverwrittenWithoutReplace() throws Exception {
        Path file = save("bolts.json");
        byte[] before = Files.readAllBytes(file);
        Cli.Result again = Cli.run("design", "--aql", "2%", "--ltpd", "8%", "--save", file.toString());
        assertEquals(ExitCode.USAGE, again.exitCode());
        assertTrue(again.err().contains("the file exists; add --replace"), again.err());
        assertArrayEquals(before, Files.readAllBytes(file));
        assertEquals(0, Cli.run("design", "--aql", "2%", "--ltpd", "8%", "--save", file.toString(), "--replace")
                .exitCode());
    }

    @Test
    void anAlteredPlanFileIsRefusedWithExitCode3() throws Exception {
        Path file = save("bolts.json");
        Files.writeString(file, Files.readString(file).replace("\"c\" : 3", "\"c\" : 4"));
        Cli.Result result = Cli.run("curve", file.toString());
        assertEquals(ExitCode.BAD_INPUT, result.exitCode());
        assertEquals("lotgate: " + file + ": the fingerprint does not match the content: the file was changed after"
                + " it was saved; save it again with 'lotgate design ... --save'" + System.lineSeparator(), result.err());
        assertEquals("", result.out());
    }

    @Test
    void aFailedSaveLeavesNothingBehind() throws Exception {
        Path blocker = folder.resolve("not-a-folder");
        Files.writeString(blocker, "x");
        Cli.Result result = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--save",
                blocker.resolve("plan.json").toString());
        assertEquals(ExitCode.CANNOT_WRITE, result.exitCode());
        assertTrue(result.err().startsWith("lotgate: cannot write " + blocker.resolve("plan.json")), result.err());
        try (Stream<Path> left = Files.list(folder)) {
            assertEquals(1, left.count(), "only the blocking file may remain");
        }
    }

    @Test
    void curveJsonGivesTheKeyLevelsAndTheAoql() throws Exception {
        Path file = save("bolts.json");
        JsonNode curve = JSON.readTree(Cli.run("curve", file.toString(), "--format", "json").out());
        // n = 132, c = 3: SciPy 1.10.1 brentq on binom.cdf (see OperatingCharacteristicTest).
        assertEquals(0.010415738620057834, curve.get("qualityAtAcceptance95").asDouble(), 1e-12);
        assertEquals(0.027747940629990635, curve.get("qualityAtAcceptance50").asDouble(), 1e-12);
        assertEquals(0.049909589226913305, curve.get("qualityAtAcceptance10").asDouble(), 1e-12);
        // Without a lot size: SciPy 1.10.1 minimize_scalar of p * binom.cdf(3, 132, p).
        assertEquals(0.014718743833191066, curve.get("aoql").asDouble(), 1e-13);
        assertEquals(21, curve.get("points").size());
        assertEquals(1.0, curve.get("points").get(0).get("acceptance").asDouble());
    }

    @Test
    void chartsAreWrittenAsPngAndSvg() throws Exception {
        Path png = folder.resolve("charts/all.png");
        Path svg = folder.resolve("charts/oc.svg");
        Cli.Result result = Cli.run("curve", "-n", "132", "-c", "3", "--lot-size", "5000", "--aql", "1%", "--ltpd",
                "5%", "--curves-chart", png.toString(), "--oc-chart", svg.toString(), "--ati-chart",
                folder.resolve("charts/ati.svg").toString());
        assertEquals(0, result.exitCode(), result.err());
        byte[] head = Arrays.copyOf(Files.readAllBytes(png), 8);
        assertArrayEquals(new byte[] {(byte) 0x89, 'P', 'N', 'G', 0x0d, 0x0a, 0x1a, 0x0a}, head);
        String text = Files.readString(svg);
        assertTrue(text.contains("<svg") && text.contains("OC curve of n = 132, c = 3"));
        assertTrue(result.out().endsWith("\n\n  OC, AOQ and ATI chart written to " + png + "\n  OC chart written to " + svg
                + "\n  ATI chart written to " + folder.resolve("charts/ati.svg") + "\n  folder " + folder.resolve("charts")
                + " did not exist and was created\n"), result.out());
    }

    @Test
    void savingIntoAFolderThatDoesNotExistCreatesItAndSaysSo() {
        Path plan = folder.resolve("plans/new/bolts.json");
        Cli.Result result = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--save", plan.toString());
        assertEquals(0, result.exitCode(), result.err());
        assertTrue(Files.isRegularFile(plan));
        assertTrue(result.out().endsWith("\n\n  folder " + folder.resolve("plans/new") + " did not exist and was created\n"),
                result.out());
        Cli.Result again = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--save", folder.resolve("plans/new/nuts.json")
                .toString());
        assertEquals(0, again.exitCode(), again.err());
        assertFalse(again.out().contains("did not exist"), again.out());
        Cli.Result json = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--format", "json", "--save",
                folder.resolve("other/bolts.json").toString());
        assertEquals(0, json.exitCode(), json.err());
        assertFalse(json.out().contains("did not exist"), json.out());
    }

    @Test
    void compareSaysWhichChartsItWroteInTextOnly() {
        Path oc = folder.resolve("oc.png");
        Path asn = folder.resolve("asn.svg");
        Cli.Result text = Cli.run("compare", "132,3", "45,0", "--aql", "1%", "--ltpd", "5%", "--oc-chart", oc.toString(),
                "--asn-chart", asn.toString());
        assertEquals(0, text.exitCode(), text.err());
        assertTrue(text.out().endsWith("\n\n  OC chart written to " + oc + "\n  ASN chart written to " + asn + "\n"),
                text.out());
        Cli.Result csv = Cli.run("compare", "132,3", "45,0", "--aql", "1%", "--ltpd", "5%", "--oc-chart", oc.toString(),
                "--format", "csv");
        assertEquals(0, csv.exitCode(), csv.err());
        assertFalse(csv.out().contains("written"), csv.out());
        assertEquals("", csv.err());
    }

    @Test
    void aChartWithAnUnknownExtensionIsRefusedBeforeAnythingIsComputed() {
        Cli.Result result = Cli.run("curve", "-n", "10", "-c", "1", "--chart", folder.resolve("a.pdf").toString());
        assertEquals(ExitCode.USAGE, result.exitCode());
        assertTrue(result.err().contains("must end in .png or .svg"));
    }

    @Test
    void compareGivesEachPlansRisksAtTheSameLevels() throws Exception {
        Path file = save("bolts.json");
        JsonNode compared = JSON.readTree(Cli.run("compare", file.toString(), "45,0", "--format", "json").out());
        assertEquals(0.01, compared.get("aql").asDouble());
        JsonNode plans = compared.get("plans");
        assertEquals(0.04425250582596621, plans.get(0).get("producerRisk").asDouble(), 1e-12);
        // 1 - 0.99^45 and 0.95^45 (by hand).
        assertEquals(1 - Math.pow(0.99, 45), plans.get(1).get("producerRisk").asDouble(), 1e-13);
        assertEquals(Math.pow(0.95, 45), plans.get(1).get("consumerRisk").asDouble(), 1e-13);
    }

    @Test
    void compareNeedsLevelsWhenNoSavedPlanGivesThem() {
        Cli.Result result = Cli.run("compare", "45,0", "132,3");
        assertEquals(ExitCode.USAGE, result.exitCode());
        assertTrue(result.err().startsWith("lotgate: give --aql and --ltpd to compare at"), result.err());
    }

    @Test
    void compareWithOnePlanAsksForAnother() {
        Cli.Result result = Cli.run("compare", "45,0", "--aql", "1%", "--ltpd", "5%");
        assertEquals(ExitCode.USAGE, result.exitCode());
        assertEquals("lotgate: give two or more plans to compare (plans/*.json files or n,c), got only 45,0"
                + " (see 'lotgate compare --help')",
                result.err().lines().findFirst().orElse(""));
    }

    @Test
    void aPlanWrittenWrongIsNamed() {
        Cli.Result result = Cli.run("compare", "45;0", "132,3", "--aql", "1%", "--ltpd", "5%");
        assertEquals(ExitCode.USAGE, result.exitCode());
        assertTrue(result.err().startsWith("lotgate: '45;0' is neither a plan file (.json) nor a plan written as n,c"),
                result.err());
    }

    @Test
    void theDemoRunsInAFreshFolder() {
        Cli.Result result = Cli.run("demo", "--out", folder.resolve("demo").toString());
        assertEquals(0, result.exitCode(), result.err());
        assertTrue(result.out().contains("invented"));
        assertTrue(Files.exists(folder.resolve("demo/charts/arnwick-af-m8-40.png")));
        assertTrue(Files.exists(folder.resolve("demo/plans/kestrune-kc-114.json")));
    }
}
