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
        DemoTour tour = new DemoTour(plans, charts);
        tour.designing().forEach(step -> run(out, step));
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
        tour.receiving(sheets, reports, store).forEach(step -> run(out, step));
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
            "lots-2025.csv", "quorrin-qp2611.csv", "quorrin-qp2611.lot.csv",
            "quorrin-qp2612.csv", "quorrin-qp2612.lot.csv", "kestrune-kc0911-bore.csv",
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
        out.println("The invented inspection sheets of nine lots and last year's lot list are copied to " + target
                + " (the same as demo-data/ in the repository).");
        out.println();
        return target.toString();
    }

    /** Runs a step: prints its story and command line, then its output (unless quiet), and checks its exit code. */
    private void run(PrintWriter out, DemoTour.Step step) {
        String[] args = step.args();
        CommandLine cli = Main.commandLine(args);
        if (step.quiet()) {
            cli.setOut(new PrintWriter(java.io.Writer.nullWriter()));
            cli.setErr(spec.commandLine().getErr());
        } else {
            if (!step.story().isEmpty()) {
                out.println(step.story());
            }
            List<String> shown = new ArrayList<>();
            for (String arg : args) {
                shown.add(arg.contains(" ") ? "\"" + arg + "\"" : arg);
            }
            out.println("$ lotgate " + String.join(" ", shown));
            out.println();
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
        }
        int code = cli.execute(args);
        if (!step.quiet()) {
            out.println();
        }
        if (code != step.expected()) {
            throw new Main.Failure(code, "the demo step 'lotgate " + String.join(" ", args) + "' failed");
        }
    }
}
