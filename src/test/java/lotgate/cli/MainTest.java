package lotgate.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/** The root command: one command built per run, the help and errors that still know them all. */
class MainTest {

    @Test
    void helpKeepsFileNamesAndPathsWhole() {
        // At the help's width of 80 the JDK's line breaker would split these after their '.' ("plans/bolts." then
        // "json).").
        assertTrue(Cli.run("design", "--help").out().contains(" plans/bolts.json)."));
        assertTrue(Cli.run("family", "--help").out().contains(" plans/bolts-family.json)."));
        String history = Cli.run("history", "--help").out();
        assertTrue(history.contains(" ~/.local/share/lotgate/history.sqlite)."), history);
    }

    @Test
    void aSplitWordMovesWholeToTheNextLineAndTheRestIsFilledAgain() {
        String drawn = String.join("\n", "  --save=FILE  Save it (e.g. plans/bolts.", "               json) now and",
                "               later.", "  --next       Other.");
        assertEquals(String.join("\n", "  --save=FILE  Save it (e.g.", "               plans/bolts.json) now",
                "               and later.", "  --next       Other."),
                HelpLayout.mend(drawn, java.util.Set.of("Save", "it", "(e.g.", "plans/bolts.json)", "now", "and",
                        "later.", "Other."), 36));
    }

    @Test
    void theFactoryMakesLotgatesPackagePrivateClassesAndLeavesOthersToPicocli() throws Exception {
        Main.Factory factory = new Main.Factory();
        assertTrue(factory.create(Values.Quality.class) instanceof Values.Quality);
        assertTrue(factory.create(DesignCommand.class) instanceof DesignCommand);
        assertTrue(factory.create(java.util.List.class) instanceof java.util.ArrayList); // picocli's choice
    }

    @Test
    void aMistypedOptionGetsTheNearestName() {
        String err = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--lotsize", "5000").err();
        assertTrue(err.startsWith("lotgate: unknown option or extra argument '--lotsize'; did you mean '--lot-size'?"),
                err);
        err = Cli.run("design", "--AQL", "1%", "--ltpd", "5%").err();
        assertTrue(err.startsWith("lotgate: unknown option or extra argument '--AQL'; did you mean '--aql'?"), err);
        err = Cli.run("design", "--aql", "1%", "--ltpd", "5%", "--zzzzzzzz").err();
        assertTrue(err.startsWith("lotgate: unknown option or extra argument '--zzzzzzzz' (see"), err);
    }

    @Test
    void theEditDistanceIsLevenshteins() {
        // The textbook example (common practice): kitten -> sitting takes 3 edits.
        assertEquals(3, lotgate.history.NameMatch.distance("kitten", "sitting"));
        assertEquals(0, lotgate.history.NameMatch.distance("", ""));
        assertEquals(4, lotgate.history.NameMatch.distance("", "abcd"));
    }

    @Test
    void everyCommandIsRegisteredUnderItsOwnName() {
        for (Map.Entry<String, Class<?>> command : Main.commands().entrySet()) {
            CommandLine.Command annotation = command.getValue().getAnnotation(CommandLine.Command.class);
            assertEquals(command.getKey(), annotation.name(), command.getValue().getName());
        }
    }

    @Test
    void aRunBuildsOnlyTheCommandItInvokes() {
        assertEquals(List.of("design"),
                List.copyOf(Main.commandLine("--debug", "design", "--aql", "1%").getSubcommands().keySet()));
        assertEquals(List.copyOf(Main.commands().keySet()),
                List.copyOf(Main.commandLine("--help").getSubcommands().keySet()));
        assertEquals(List.copyOf(Main.commands().keySet()),
                List.copyOf(Main.commandLine("help", "design").getSubcommands().keySet()));
    }

    @Test
    void theHelpListsEveryCommand() {
        Cli.Result result = Cli.run("--help");
        assertEquals(0, result.exitCode());
        for (String name : Main.commands().keySet()) {
            assertTrue(result.out().contains("\n  " + name + " "), name);
        }
    }

    @Test
    void anUnknownCommandIsToldTheCommandsThereAre() {
        Cli.Result result = Cli.run("desing", "--aql", "1%");
        assertEquals(2, result.exitCode());
        assertEquals("lotgate: unknown command 'desing'; the commands are design, lookup, least-inspection, curve, compare, show, sentence,"
                + " inspect, history, supplier, suppliers, verify, reissue, corrective-action, import, family, demo, workbench,"
                + " help"
                + " (see 'lotgate --help')\n", result.err());
    }

    @Test
    void lotgateAloneListsTheCommandsWithWhatEachDoes() {
        Cli.Result result = Cli.run();
        assertEquals(2, result.exitCode());
        assertEquals("", result.out());
        String[] lines = result.err().split("\n");
        assertEquals("lotgate: name a command, e.g. 'lotgate design --aql 1% --ltpd 5%'. The commands:", lines[0]);
        assertEquals("  design             Design a sampling plan from the producer's and consumer's", lines[1]);
        assertEquals("'lotgate COMMAND --help' tells a command's options; 'lotgate --help' also lists the exit codes.",
                lines[lines.length - 1]);
        for (String name : Main.commands().keySet()) {
            assertTrue(result.err().contains("\n  " + name + " "), name);
        }
    }

    @Test
    void aMissingArgumentIsNamedWithWhereItGoes() {
        Cli.Result none = Cli.run("sentence");
        assertEquals(2, none.exitCode());
        assertEquals("lotgate: missing PLAN and SHEET; write 'lotgate sentence PLAN SHEET' (see 'lotgate sentence --help')\n",
                none.err());
        Cli.Result one = Cli.run("sentence", "plans/bolts.json");
        assertEquals(2, one.exitCode());
        assertEquals("lotgate: missing SHEET; write 'lotgate sentence PLAN SHEET' (see 'lotgate sentence --help')\n",
                one.err());
        Cli.Result compare = Cli.run("compare", "--aql", "1%");
        assertEquals(2, compare.exitCode());
        assertEquals("lotgate: missing PLAN; write 'lotgate compare PLAN...' (see 'lotgate compare --help')\n",
                compare.err());
    }

    @Test
    void aMissingOptionIsNamedPlainly() {
        Cli.Result result = Cli.run("corrective-action", "--part", "AF-M8-40", "--reason", "new die");
        assertEquals(2, result.exitCode());
        assertEquals("lotgate: missing option --supplier (see 'lotgate corrective-action --help')\n", result.err());
        Cli.Result two = Cli.run("corrective-action", "--reason", "new die");
        assertEquals(2, two.exitCode());
        assertEquals("lotgate: missing option --supplier and option --part (see 'lotgate corrective-action --help')\n",
                two.err());
    }

    @Test
    void versionAloneAndWithTheHelpOfACommand() {
        Cli.Result alone = Cli.run("--version");
        assertEquals(0, alone.exitCode());
        assertTrue(alone.out().matches("lotgate \\S+\n"), alone.out());
        Cli.Result viaPicocli = Cli.run("--debug", "--version");
        assertEquals(alone.out(), viaPicocli.out());
    }
}
