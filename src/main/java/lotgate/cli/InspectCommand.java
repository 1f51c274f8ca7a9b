package lotgate.cli;

import java.io.BufferedReader;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;
import lotgate.files.AtomicWrite;
import lotgate.inspection.ResultWords;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.CsvTable;
import lotgate.report.PlanWording;
import lotgate.sampling.Plan;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.Stage;
import lotgate.sentencing.Stopping;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParameterException;
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

    /** One unit as entered: its count (1 for a failed unit of a pass/fail plan) and its defect type, or "". */
    private record Unit(int count, String defect) {
    }

    @Override
    public void run() {
        if (sheet != null && !sheet.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv")) {
            throw new ParameterException(spec.commandLine(), "--save-sheet " + sheet + ": the sheet is a .csv file");
        }
        SavedPlan saved = PlanFormat.read(planFile);
        if (!saved.unclassified()) {
            throw new ParameterException(spec.commandLine(), "plan " + saved.name() + " has criteria per defect class;"
                    + " record its units in a sheet with critical, major and minor columns and use 'lotgate sentence'");
        }
        Plan plan = saved.plan();
        if (saved.measurement() != null) {
            throw new ParameterException(spec.commandLine(), "plan " + saved.name() + " judges measurements; record them"
                    + " in a sheet with a value column and use 'lotgate sentence'");
        }
        boolean units = saved.model().countsUnits();
        ResultWords words = SheetOptions.resultWords(spec, resultWords.mapping);
        boolean terminal = System.console() != null && input.get() == System.in;
        PrintWriter out = spec.commandLine().getOut();
        out.println("Plan " + saved.name() + " (fingerprint " + saved.shortFingerprint() + "): " + PlanWording.brief(plan));
        out.println("Enter each unit as inspected: " + (units ? "pass or fail" : "the number of nonconformities")
                + ", then a defect type if you like (fail thread damage); 'undo' takes back the last, 'quit' stops.");
        out.flush();
        List<Unit> entered = new ArrayList<>();
        Stopping.Point decided = null;
        int lineNumber = 0;
        try (BufferedReader reader = new BufferedReader(new InputStreamReader(input.get(), StandardCharsets.UTF_8))) {
            String line;
            while (decided == null && (line = reader.readLine()) != null) {
                lineNumber++;
                String text = line.trim().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
                if (text.isEmpty() || text.startsWith("#")) {
                    continue;
                }
                if (text.equals("quit")) {
                    break;
                }
                if (text.equals("undo")) {
                    if (entered.isEmpty()) {
                        out.println("  nothing to take back");
                    } else {
                        entered.remove(entered.size() - 1);
                        out.println("  unit " + (entered.size() + 1) + " taken back; " + entered.size() + " units entered");
                    }
                    out.flush();
                    continue;
                }
                Unit unit = parse(line.trim().replaceAll("\\s+", " "), units, words);
                if (unit == null) {
                    String problem = "line " + lineNumber + ": '" + line.trim() + "' is not " + (units
                            ? "a result word (" + words.accepted() + ")"
                            : "a whole number of nonconformities from 0 to 1000000") + ", optionally followed by a"
                            + " defect type";
                    if (!terminal) {
                        throw new Main.Failure(ExitCode.BAD_INPUT, problem + "; " + keep(entered, units, plan));
                    }
                    out.println("  " + problem + "; enter it again");
                    out.flush();
                    continue;
                }
                entered.add(unit);
                decided = report(out, plan, entered, units);
                out.flush();
            }
        } catch (java.io.IOException e) {
            throw new Main.Failure(ExitCode.BAD_INPUT, "standard input cannot be read (" + e.getMessage() + ")");
        }
        if (decided == null) {
            out.println(unfinished(entered.size(), plan));
            if (sheet != null) {
                writeSheet(sheet, entered, units);
                out.println("The " + entered.size() + " units entered are kept in " + sheet + "; add the units still to"
                        + " inspect to it (or enter them all again here) before sentencing the lot.");
            }
            out.flush();
            throw new Main.Failure(ExitCode.NOT_DECIDED, null);
        }
        if (sheet != null) {
            writeSheet(sheet, entered, units);
            out.println("Units written to " + sheet + "; sentence it with: lotgate sentence " + planFile + " " + sheet);
        }
        out.flush();
        if (decided.verdict() == Stopping.Verdict.REJECT) {
            throw new Main.Failure(ExitCode.REJECTED, null);
        }
    }

    /**
     * A unit from a line: a result word, or a fail word then a defect type; for a plan counting nonconformities,
     * a count (or a pass word, 0) then an optional defect type. Null when the line is neither.
     */
    private static Unit parse(String text, boolean units, ResultWords words) {
        Boolean failed = words.failed(text);
        if (failed != null) {
            return units || !failed ? new Unit(failed ? 1 : 0, "") : null;
        }
        String failWord = words.failPrefix(text);
        if (failWord != null) {
            return units ? new Unit(1, text.substring(failWord.length()).trim()) : null;
        }
        int space = text.indexOf(' ');
        String number = space < 0 ? text : text.substring(0, space);
        String defect = space < 0 ? "" : text.substring(space + 1).trim();
        try {
            int count = Integer.parseInt(number);
            if (count < 0 || count > 1_000_000 || (units && count > 1)) {
                return null;
            }
            return new Unit(count, count == 0 ? "" : defect);
        } catch (NumberFormatException e) {
            return null;
        }
    }

    /** Saves the units entered before a refused line, and says where. */
    private String keep(List<Unit> entered, boolean units, Plan plan) {
        if (entered.isEmpty()) {
            return "no units were entered before it";
        }
        Path target = sheet;
        if (target == null) {
            try {
                target = java.nio.file.Files.createTempFile("lotgate-bench-", ".csv");
            } catch (java.io.IOException e) {
                return "the " + entered.size() + " units entered before it could not be kept (" + e.getMessage() + ")";
            }
        }
        writeSheet(target, entered, units);
        return "the " + entered.size() + " units entered before it are kept in " + target + " (an unfinished"
                + " sample: " + entered.size() + " of up to " + plan.maxSampleSize() + " units)";
    }

    /** What stopping before the plan decides means, in words. */
    private static String unfinished(int entered, Plan plan) {
        return "No decision: " + entered + " of up to " + plan.maxSampleSize() + " units entered. An unfinished"
                + " sample neither accepts nor rejects the lot: the plan decides only when its units are inspected.";
    }

    /** Prints where the plan stands after the last unit; returns the decision, or null to go on. */
    private static Stopping.Point report(PrintWriter out, Plan plan, List<Unit> entered, boolean units) {
        int m = entered.size();
        long[] cumulative = new long[m + 1];
        for (int i = 0; i < m; i++) {
            int count = entered.get(i).count();
            cumulative[i + 1] = cumulative[i] + (units ? Math.min(1, count) : count);
        }
        long found = cumulative[m];
        String head = String.format(Locale.ROOT, "  unit %-5d %-5s found %-4d ", m, units ? (entered.get(m - 1).count() > 0
                ? "fail" : "pass") : String.valueOf(entered.get(m - 1).count()), found);
        Stopping.Point point = pointAfter(plan, m, cumulative);
        if (point == null) {
            out.println(head + "inspect on: " + untilText(plan, m, found));
            return null;
        }
        switch (point.verdict()) {
            case ACCEPT -> out.println(head + "ACCEPT the lot (" + point.step() + ": " + found + " is at most "
                    + point.acceptanceNumber() + ")");
            case REJECT -> out.println(head + "REJECT the lot (" + point.step() + ": " + found + " reaches "
                    + point.rejectionNumber() + ")");
            default -> {
                out.println(head + "inspect on: " + untilText(plan, m, found));
                return null;
            }
        }
        return point;
    }

    /** The plan's verdict after m units, or null while m is inside a stage and no rejection is certain. */
    private static Stopping.Point pointAfter(Plan plan, int m, long[] cumulative) {
        if (m > plan.maxSampleSize()) {
            return null;
        }
        try {
            return Stopping.at(plan, m, unit -> cumulative[unit]);
        } catch (IllegalArgumentException e) {
            return null;
        }
    }

    private static String untilText(Plan plan, int m, long found) {
        if (plan instanceof SequentialPlan sequential) {
            int clean = Stopping.acceptanceIfClean(sequential, m, found);
            return "accepted after unit " + clean + " if nothing more is found; rejected at "
                    + sequential.rejectionNumber(Math.min(m + 1, sequential.truncation())) + " found";
        }
        int total = 0;
        for (Stage stage : Stopping.stages(plan)) {
            total += stage.n();
            if (total > m) {
                return "this sample ends at unit " + total + " (accept there with up to "
                        + PlanWording.acceptance(stage.c()) + ", reject at " + stage.r() + ")";
            }
        }
        return "";
    }

    private void writeSheet(Path target, List<Unit> entered, boolean units) {
        List<List<Object>> rows = new ArrayList<>();
        for (int i = 0; i < entered.size(); i++) {
            String id = prefix + (i + 1);
            Unit unit = entered.get(i);
            rows.add(units ? List.of(id, unit.count() > 0 ? "fail" : "pass", unit.defect())
                    : List.of(id, unit.count(), unit.defect()));
        }
        AtomicWrite.writeString(target, CsvTable.table(units ? List.of("unit", "result", "defect")
                : List.of("unit", "minor", "defect"), rows));
    }
}
