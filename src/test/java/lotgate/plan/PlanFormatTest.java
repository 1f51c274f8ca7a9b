package lotgate.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.HexFormat;
import lotgate.files.InputFileException;
import lotgate.sampling.OcModel;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SinglePlan;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Saved plans round-trip, and every altered, inconsistent or foreign file is refused by name. */
class PlanFormatTest {
    @TempDir
    Path folder;

    private SavedPlan sample() {
        return PlanFormat.seal("bolts", "Invented test plan", Instant.parse("2026-01-31T08:00:00Z"),
                new SinglePlan(132, 3), new OcModel.Binomial(), 5000, new RiskPoints(0.01, 0.05, 0.05, 0.10),
                SavedPlan.SMALLEST_SAMPLE);
    }

    private Path saved() {
        Path file = folder.resolve("bolts.json");
        PlanFormat.write(file, sample());
        return file;
    }

    private String refused(Path file) {
        return assertThrows(InputFileException.class, () -> PlanFormat.read(file)).getMessage();
    }

    @Test
    void aSavedPlanReadsBackTheSame() {
        SavedPlan original = sample();
        SavedPlan read = PlanFormat.read(saved());
        assertEquals(original, read);
        assertTrue(read.fingerprint().matches("sha256:[0-9a-f]{64}"));
    }

    @Test
    void theFingerprintIsTheSha256OfTheCanonicalForm() throws Exception {
        SavedPlan plan = sample();
        // Canonical form by hand: keys sorted at every level, no white space, fingerprint left out.
        String canonical = "{\"classes\":[{\"achieved\":{\"consumerRisk\":" + plan.achieved().consumerRisk()
                + ",\"producerRisk\":" + plan.achieved().producerRisk() + "},\"class\":\"any\",\"designedFor\":{"
                + "\"alpha\":0.05,\"aql\":0.01,\"beta\":0.1,\"ltpd\":0.05,\"method\":\"smallest-sample\"},\"plan\":{"
                + "\"c\":3,\"n\":132,\"scheme\":\"single\"}}],\"created\":\"2026-01-31T08:00:00Z\",\"description\":"
                + "\"Invented test plan\",\"format\":\"lotgate-plan\",\"formatVersion\":2,\"lotSize\":5000,"
                + "\"model\":\"binomial\",\"name\":\"bolts\"}";
        byte[] digest = java.security.MessageDigest.getInstance("SHA-256")
                .digest(canonical.getBytes(java.nio.charset.StandardCharsets.UTF_8));
        assertEquals("sha256:" + HexFormat.of().formatHex(digest), plan.fingerprint());
    }

    @Test
    void whiteSpaceAndKeyOrderDoNotChangeTheFingerprint() throws IOException {
        Path file = saved();
        String text = Files.readString(file).replace("\n", "\r\n  ");
        Files.writeString(file, text);
        assertEquals(sample().fingerprint(), PlanFormat.read(file).fingerprint());
    }

    @Test
    void aChangedPlanIsRefusedAsAltered() throws IOException {
        Path file = saved();
        Files.writeString(file, Files.readString(file).replace("\"n\" : 132", "\"n\" : 80"));
        assertEquals(file + ": the fingerprint does not match the content: the file was changed after it was saved;"
                + " save it again with 'lotgate design ... --save'", refused(file));
    }

    @Test
    void recordedRisksThatThePlanDoesNotGiveAreRefusedAsInconsistent() throws IOException {
        Path file = saved();
        var root = (com.fasterxml.jackson.databind.node.ObjectNode) new com.fasterxml.jackson.databind.ObjectMapper()
                .readTree(Files.readString(file));
        ((com.fasterxml.jackson.databind.node.ObjectNode) root.get("classes").get(0).get("achieved"))
                .put("producerRisk", 0.01);
        root.put("fingerprint", PlanFormat.fingerprintOf(root));
        Files.writeString(file, root.toString());
        assertTrue(refused(file).startsWith(file + ": field 'classes[0].achieved.producerRisk' is 0.01 but the plan"
                + " gives 0.0442"), refused(file));
    }

    @Test
    void aNewerFormatVersionIsRefusedWithAClearMessage() throws IOException {
        Path file = saved();
        Files.writeString(file, Files.readString(file).replace("\"formatVersion\" : 2", "\"formatVersion\" : 7"));
        assertEquals(file + ": written in plan format version 7 by a newer lotgate; this one reads versions up to 3",
                refused(file));
    }

    @Test
    void malformedJsonNamesTheLine() throws IOException {
        Path file = folder.resolve("broken.json");
        Files.writeString(file, "{\n  \"format\": \"lotgate-plan\",\n  oops\n}");
        assertTrue(refused(file).startsWith(file + ": not a valid plan file: malformed JSON at line 3"), refused(file));
    }

    @Test
    void aFileThatIsNoJsonObjectIsCalledNoPlanFile() throws IOException {
        Path csv = folder.resolve("lots.csv");
        Files.writeString(csv, "lot,supplier,part\nL-1,A,B\n");
        assertEquals(csv + ": not a plan file: a plan file is the JSON that 'lotgate design --save' writes, and this"
                + " file does not start with '{'", refused(csv));
        Path binary = folder.resolve("sheet.xlsx");
        Files.write(binary, new byte[] {0x50, 0x4b, 0x03, 0x04, (byte) 0xff, (byte) 0xfe, 0x00});
        assertEquals(binary + ": not a plan file: a plan file is UTF-8 JSON text, and this file is not",
                refused(binary));
    }

    @Test
    void duplicateKeysAreRefused() throws IOException {
        Path file = saved();
        Files.writeString(file, Files.readString(file).replace("\"model\" : \"binomial\"",
                "\"model\" : \"binomial\", \"model\" : \"poisson\""));
        assertTrue(refused(file).contains("malformed JSON"), refused(file));
    }

    @Test
    void anotherJsonFileIsNotAPlan() throws IOException {
        Path file = folder.resolve("other.json");
        Files.writeString(file, "{\"hello\": 1}");
        assertEquals(file + ": not a plan file: field 'format' must be \"lotgate-plan\"", refused(file));
    }

    @Test
    void aMissingFileIsNamed() {
        Path file = folder.resolve("absent.json");
        assertEquals(file + ": no such plan file", refused(file));
    }

    @Test
    void anUnknownFieldIsRefused() throws IOException {
        Path file = saved();
        Files.writeString(file, Files.readString(file).replace("\"model\"", "\"extra\" : true, \"model\""));
        assertEquals(file + ": unknown field 'extra'", refused(file));
    }

    @Test
    void outOfRangeValuesAreNamedByField() throws IOException {
        Path file = saved();
        Files.writeString(file, Files.readString(file).replace("\"c\" : 3", "\"c\" : 200"));
        assertEquals(file + ": field 'classes[0].plan.c' must be below plan.n = 132, got 200", refused(file));
    }

    @Test
    void aVersion1FileStillLoadsAsOnePlanForEveryNonconformity() throws Exception {
        Path file = folder.resolve("old.json");
        try (var in = getClass().getResourceAsStream("format-v1.json")) {
            Files.write(file, in.readAllBytes());
        }
        SavedPlan old = PlanFormat.read(file);
        assertTrue(old.unclassified());
        assertEquals(new SinglePlan(132, 3), old.plan());
        assertEquals(5000, old.lotSize());
    }

    @Test
    void aPlanWithDefectClassesRoundTrips() {
        SavedPlan classed = PlanFormat.seal("housing", "Invented", Instant.parse("2026-01-31T08:00:00Z"),
                new OcModel.Binomial(), 0, java.util.List.of(
                        new PlanFormat.ClassDraft(DefectClass.CRITICAL, new SinglePlan(45, 0),
                                new RiskPoints(0.001, 0.05, 0.05, 0.10), SavedPlan.FIXED_ACCEPTANCE),
                        new PlanFormat.ClassDraft(DefectClass.MAJOR, new SinglePlan(132, 3),
                                new RiskPoints(0.01, 0.05, 0.05, 0.10), SavedPlan.SMALLEST_SAMPLE)));
        Path file = folder.resolve("housing.json");
        PlanFormat.write(file, classed);
        SavedPlan read = PlanFormat.read(file);
        assertEquals(classed, read);
        assertEquals(132, read.sampleSize());
        assertEquals(new SinglePlan(45, 0), read.criteria(DefectClass.CRITICAL).plan());
    }
}
