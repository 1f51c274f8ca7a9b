package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The committed demo sheets give the verdicts the README and the demo show (invented data). */
class DemoDataTest {

    @ParameterizedTest(name = "{1}")
    @CsvSource({
            "plans/arnwick-af-m8-40.json, demo-data/arnwick-af2611.xlsx, 0",
            "plans/arnwick-af-m8-40.json, demo-data/arnwick-af2618.csv, 1",
            "plans/kestrune-kc-114-classes.json, demo-data/kestrune-kc0907.xlsx, 1",
            "plans/mirelle-ms-22.json, demo-data/mirelle-ms1130.csv, 0",
            "plans/mirelle-ms-22.json, demo-data/mirelle-ms1204-malformed.xlsx, 3",
            "plans/quorrin-qp-7-double.json, demo-data/quorrin-qp2611.csv, 0",
            "plans/quorrin-qp-7-sequential.json, demo-data/quorrin-qp2611.csv, 0",
            "plans/quorrin-qp-7-tables-normal.json, demo-data/quorrin-qp2612.csv, 0",
            "plans/kestrune-kc-114-bore.json, demo-data/kestrune-kc0911-bore.csv, 0",
            "plans/kestrune-kc-114-bore.json, demo-data/kestrune-kc0915-bore.csv, 0",
    })
    void eachDemoLotGetsItsVerdict(String plan, String sheet, int exitCode) {
        Cli.Result result = Cli.run("sentence", "--no-record", plan, sheet);
        assertEquals(exitCode, result.exitCode(), result.out() + result.err());
    }

    @org.junit.jupiter.api.Test
    void theSkewedBoresBringTheNormalityWarning() {
        Cli.Result normal = Cli.run("sentence", "--no-record", "plans/kestrune-kc-114-bore.json",
                "demo-data/kestrune-kc0911-bore.csv");
        org.junit.jupiter.api.Assertions.assertFalse(normal.out().contains("WARNING"), normal.out());
        Cli.Result skewed = Cli.run("sentence", "--no-record", "plans/kestrune-kc-114-bore.json",
                "demo-data/kestrune-kc0915-bore.csv");
        org.junit.jupiter.api.Assertions.assertTrue(skewed.out().contains("WARNING: the measurements do not look"
                + " normal"), skewed.out());
    }

    @ParameterizedTest(name = "{1} rows {2}")
    @CsvSource({
            "plans/quorrin-qp-7.json, demo-data/quorrin-qp2611.csv, 2-133, 0",
            "plans/quorrin-qp-7-double.json, demo-data/quorrin-qp2611.csv, 2-70, 9",
    })
    void theQuorrinLotGetsItsVerdictOnPartOfItsSheet(String plan, String sheet, String rows, int exitCode) {
        Cli.Result result = Cli.run("sentence", "--no-record", plan, sheet, "--rows", rows);
        assertEquals(exitCode, result.exitCode(), result.out() + result.err());
    }
}
