package lotgate.cli;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import java.util.function.Supplier;
import lotgate.inspection.ResultWords;
import lotgate.jobs.InspectAtBench;
import lotgate.jobs.JobException;
import lotgate.jobs.SheetLayout;
import lotgate.report.results.BenchRendering;
import lotgate.sentencing.Stopping;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** At the inspection bench: takes one unit's result per line and says after each whether to stop. */
@Command(name = "inspect", header = "At the inspection bench: enter each unit's result and learn after each whether to stop.",
        description = {
                "Reads one inspected unit per line from standard input, in the order inspected: a result word (pass,"
                        + " p, ok, good; fail, f, nc, ng, bad; any case; a site adds its own with --result-words),"
                        + " a fail word may be followed by the defect type (fail thread damage); or for a plan that"
                        + " counts nonconformities (Poisson model) the number found in the unit, also with an"
                        + " optional defect type (2 burr). After each line it says where the plan stands: accept, reject, or inspect on,"
                        + " and for how long at most. 'undo' takes back the last unit, 'quit' stops without a"
                        + " decision. Blank lines and lines starting with # are skipped.",
                "",
                "Sequential plans decide after any unit; double and multiple plans at the end of a stage, or as"
                        + " soon as the count reaches the stage's rejection number (curtailed inspection); single"
                        + " plans after n units or at the rejection number. Nothing is recorded: save the units with"
                        + " --save-sheet and sentence that sheet to record the lot.",
                "",
                "A mistyped line is asked again at a terminal; from piped input it ends the entry with exit code 3,"
                        + " naming the line, and the units entered before it are kept in the --save-sheet file (or a"
                        + " file in the temporary folder, named in the message). Stopping before the plan decides"
                        + " leaves an unfinished sample: it neither accepts nor rejects the lot.",
                "",
                "Exit code 0: accepted; 1: rejected; 9: no decision when the input ended; 2 and 3: bad options or"
                        + " input.",
                ""})
final class InspectCommand implements Runnable {
    /** Where the units come from; tests replace it. */
    static Supplier<InputStream> input = () -> System.in;

    @Parameters(index = "0", paramLabel = "PLAN", description = "The saved plan file to apply (plans/*.json).")
    Path planFile;

    @Option(names = "--save-sheet", paramLabel = "FILE",
            description = "When the plan has decided (or the input ends), write the units entered as an inspection"
                    + " sheet (.csv) that 'lotgate sentence' reads.")
    Path sheet;

    @Option(names = "--prefix", paramLabel = "TEXT", defaultValue = "",
            description = "With --save-sheet: unit identifiers are TEXT followed by the unit's number (e.g. LOT17-).")
    String prefix;

    @Mixin
    SharedOptions.ResultWords resultWords;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        InspectAtBench.Bench bench = InspectAtBench.start(new InspectAtBench.Request(planFile, sheet, prefix));
        ResultWords words = SheetLayout.resultWords(resultWords.mapping);
        boolean terminal = System.console() != null && input.get() == System.in;
        PrintWriter out = spec.commandLine().getOut();
        out.print(BenchRendering.opening(bench));
        out.flush();
        InspectAtBench.State state = bench.state();
        int lineNumber = 0;
        try (BufferedReader reader = new BufferedReader(new InputStreamReader(input.get(), StandardCharsets.UTF_8))) {
            String line;
            while (!state.decided() && (line = reader.readLine()) != null) {
                lineNumber++;
                String text = line.trim().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
                if (text.equals("quit")) {
                    break;
                }
                if (text.equals("undo")) {
                    InspectAtBench.Bench before = bench;
                    bench = bench.withoutLast();
                    out.print(BenchRendering.takenBack(before, bench));
                } else if (!text.isEmpty() && !text.startsWith("#")) {
                    try {
                        bench = bench.with(bench.parse(line, words));
                        state = bench.state();
                        out.print(BenchRendering.afterUnit(state));
                    } catch (JobException refused) {
                        String problem = "line " + lineNumber + ": " + refused.getMessage();
                        if (!terminal) {
                            throw new Main.Failure(ExitCode.BAD_INPUT, problem + "; " + keep(bench));
                        }
                        out.println("  " + problem + "; enter it again");
                    }
                }
                out.flush();
            }
        } catch (IOException e) {
            throw new Main.Failure(ExitCode.BAD_INPUT, "standard input cannot be read (" + e.getMessage() + ")");
        }
        finish(out, bench, state);
    }

    /** Writes the sheet asked for and says what the entry came to, failing with its exit code unless accepted. */
    private void finish(PrintWriter out, InspectAtBench.Bench bench, InspectAtBench.State state) {
        int entered = bench.units().size();
        if (!state.decided()) {
            out.print(BenchRendering.unfinished(entered, state.plan()));
            if (sheet != null) {
                bench.writeSheet(sheet);
                out.println("The " + entered + " units entered are kept in " + sheet + "; add the units still to"
                        + " inspect to it (or enter them all again here) before sentencing the lot.");
            }
            out.flush();
            throw new Main.Failure(ExitCode.NOT_DECIDED, null);
        }
        if (sheet != null) {
            bench.writeSheet(sheet);
            out.println("Units written to " + sheet + "; sentence it with: lotgate sentence " + planFile + " " + sheet);
        }
        out.flush();
        if (state.decision().verdict() == Stopping.Verdict.REJECT) {
            throw new Main.Failure(ExitCode.REJECTED, null);
        }
    }

    /** Keeps the units entered before a refused line, and says where. */
    private static String keep(InspectAtBench.Bench bench) {
        int entered = bench.units().size();
        try {
            Path kept = bench.keep();
            return kept == null ? "no units were entered before it" : "the " + entered + " units entered before it"
                    + " are kept in " + kept + " (an unfinished sample: " + entered + " of up to "
                    + bench.saved().plan().maxSampleSize() + " units)";
        } catch (UncheckedIOException e) {
            return "the " + entered + " units entered before it could not be kept (" + e.getCause().getMessage() + ")";
        }
    }
}
