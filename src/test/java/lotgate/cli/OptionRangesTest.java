package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Numeric options that ask for absurd work or lie outside their documented range are refused (exit code 2). */
class OptionRangesTest {
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "curve -n 80 -c 2 --steps 2000000000|Invalid value for option '--steps': '2000000000' is more than 10000"
                    + " steps (see 'lotgate curve --help')",
            "curve -n 80 -c 2 --steps 0|Invalid value for option '--steps': '0' must be a whole number of 1 or more"
                    + " (see 'lotgate curve --help')",
            "design --aql 1e-400 --ltpd 5%|Invalid value for option '--aql': '1e-400' is below 0.0001%, the smallest"
                    + " level lotgate takes (see 'lotgate design --help')",
            "design --aql 1% --ltpd 5% --alpha 99.99999%|Invalid value for option '--alpha': '99.99999%' is above"
                    + " 99.9999%, the largest risk or confidence lotgate takes (see 'lotgate design --help')",
            "sentence --no-record --lot L plans/arnwick-af-m8-40.json demo-data/arnwick-af2618.csv --confidence 1e-400"
                    + "|Invalid value for option '--confidence': '1e-400' is below 0.0001%, the smallest level lotgate"
                    + " takes (see 'lotgate sentence --help')",
            "curve -n 80 -c 2 --up-to 0.0000001|Invalid value for option '--up-to': '0.0000001' is below 0.0001%, the"
                    + " smallest level lotgate takes (see 'lotgate curve --help')",
            "design --scheme sequential --aql 1% --ltpd 5% --truncate-at 2000000000|Invalid value for option"
                    + " '--truncate-at': '2000000000' is more than 1000000 units (see 'lotgate design --help')",
            "curve -n 3000000000 -c 2|Invalid value for option '--sample-size': '3000000000' is not a whole number"
                    + " from 1 to 2147483647 (see 'lotgate curve --help')",
    })
    void absurdValuesAreRefusedWithTheirRange(String args, String message) {
        Cli.Result result = Cli.run(args.split(" "));
        assertEquals(ExitCode.USAGE, result.exitCode(), result.err());
        assertEquals("lotgate: " + message, result.err().strip());
    }
}
