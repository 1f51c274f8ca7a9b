package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

/** What a lot size adds to a single-plan design: AOQ and ATI, the hypergeometric hint, an AQL below one unit. */
class DesignLotNotesTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @Test
    void aLotSizeAddsAoqAndAtiAndSuggestsTheHypergeometricModelForALargeSample() throws Exception {
        Cli.Result text = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "500");
        assertEquals(ExitCode.OK, text.exitCode(), text.err());
        String out = text.out().replaceAll("\\s+", " ");
        assertTrue(out.contains("Note: the sample is 26.4% of the lot of 500 units, more than a tenth: for an isolated"
                + " lot the hypergeometric model (--model hypergeometric --lot-size 500) is exact and often needs a"
                + " smaller sample."), out);
        assertTrue(out.contains("With rectifying inspection (rejected lots of 500 inspected 100%): AOQ 0.7034% at the"
                + " AQL and 0.3652% at the LTPD; AOQL 1.083% at incoming 2.220%; ATI 148.3 units at the AQL and 463.5"
                + " at the LTPD."), out);
        JsonNode json = JSON.readTree(Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "500",
                "--format", "json").out());
        // SciPy 1.10.1 (Debian python3-scipy): binom.cdf(3, 132, p) * p * 368 / 500 and 132 + binom.sf(3, 132, p) * 368;
        // AOQL by minimize_scalar (bounded) over p.
        assertEquals(0.007034301557120889, json.get("aoqAtAql").asDouble(), 1e-12);
        assertEquals(0.003651601602868811, json.get("aoqAtLtpd").asDouble(), 1e-12);
        assertEquals(148.28492214395555, json.get("atiAtAql").asDouble(), 1e-9);
        assertEquals(463.4839839713119, json.get("atiAtLtpd").asDouble(), 1e-9);
        assertEquals(0.01083299546122862, json.get("aoql").asDouble(), 1e-9);
        Cli.Result small = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--lot-size", "5000");
        assertFalse(small.out().contains("more than a tenth"), small.out());
    }

    @Test
    void anAqlBelowOneUnitOfTheLotIsSaidWithTheAqlThePlanReallyProtects() throws Exception {
        Cli.Result text = Cli.run("design", "--aql", "0.65%", "--ltpd", "5%", "--lot-size", "100", "--model",
                "hypergeometric");
        assertEquals(ExitCode.OK, text.exitCode(), text.err());
        // n = 37, c = 0: a lot of 100 with one nonconforming unit is accepted when the sample misses it, 63/100
        // (hand count: C(99, 37) / C(100, 37) = 63/100).
        String out = text.out().replaceAll("\\s+", " ");
        assertTrue(out.contains("Note: the AQL 0.65% is less than one nonconforming unit of a lot of 100 (D = 0), so"
                + " the producer's risk there is 0 by construction and the AQL point does not shape the plan. The"
                + " lowest quality the plan can be judged at is one nonconforming unit, 1% (D = 1): such a lot is"
                + " accepted 63.00% of the time (producer's risk 37.00%). State the AQL as D = 1 or more to control"
                + " the producer's risk."), out);
    }
}
