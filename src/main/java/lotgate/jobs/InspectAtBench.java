package lotgate.jobs;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.files.AtomicWrite;
import lotgate.inspection.ResultWords;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.CsvTable;
import lotgate.sampling.Plan;
import lotgate.sentencing.Stopping;

/**
 * Bench inspection: a saved plan applied unit by unit as the units are inspected, saying after each unit whether
 * the plan has decided. The face reads the units; the job holds them, answers with the state after each, and
 * writes them as an inspection sheet. Nothing is recorded in the history.
 */
public final class InspectAtBench {

    /** The plan file, the sheet to write the units to (a .csv, or null) and the prefix of the units' ids. */
    public record Request(Path planFile, Path sheet, String prefix) {
    }

    /** One unit as entered: its count (1 for a failed unit of a pass/fail plan) and its defect type, or "". */
    public record Unit(int count, String defect) {
    }

    /**
     * Where the plan stands after the last unit entered: how many units and how many found, and the plan's
     * decision, or null while it goes on.
     */
    public record State(Plan plan, boolean countsUnits, int units, Unit last, long found, Stopping.Point decision) {
        /** Whether the plan has accepted or rejected the lot. */
        public boolean decided() {
            return decision != null;
        }
    }

    private InspectAtBench() {
    }

    /**
     * Checks the request and the plan, and starts the bench with no unit entered. Refuses a sheet that is not
     * a .csv file, a plan with criteria per defect class and a variables plan (their units need a sheet).
     */
    public static Bench start(Request request) {
        if (request.sheet() != null
                && !request.sheet().getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv")) {
            throw JobException.invalid("sheet", "--save-sheet " + request.sheet() + ": the sheet is a .csv file");
        }
        SavedPlan saved = PlanFormat.read(request.planFile());
        if (!saved.unclassified()) {
            throw JobException.invalid("plan", "plan " + saved.name() + " has criteria per defect class; record its"
                    + " units in a sheet with critical, major and minor columns and use 'lotgate sentence'");
        }
        if (saved.measurement() != null) {
            throw JobException.invalid("plan", "plan " + saved.name() + " judges measurements; record them in a"
                    + " sheet with a value column and use 'lotgate sentence'");
        }
        return new Bench(request, saved, List.of());
    }

    /** The units entered so far under a plan; each change gives a new bench. */
    public static final class Bench {
        private final Request request;
        private final SavedPlan saved;
        private final List<Unit> units;

        private Bench(Request request, SavedPlan saved, List<Unit> units) {
            this.request = request;
            this.saved = saved;
            this.units = List.copyOf(units);
        }

        /** The saved plan applied. */
        public SavedPlan saved() {
            return saved;
        }

        /** Whether the plan counts nonconforming units (pass or fail) rather than nonconformities per unit. */
        public boolean countsUnits() {
            return saved.model().countsUnits();
        }

        /** The units entered, in order. */
        public List<Unit> units() {
            return units;
        }

        /**
         * A unit from a line: a result word, or a fail word then a defect type; for a plan counting
         * nonconformities, a count (or a pass word, 0) then an optional defect type. Refuses anything else, with
         * the field "unit".
         */
        public Unit parse(String line, ResultWords words) {
            String text = line.trim().replaceAll("\\s+", " ");
            Unit unit = unit(text, countsUnits(), words);
            if (unit == null) {
                throw new JobException(JobException.Kind.BAD_INPUT, "unit", "'" + line.trim() + "' is not "
                        + (countsUnits() ? "a result word (" + words.accepted() + ")"
                                : "a whole number of nonconformities from 0 to 1000000")
                        + ", optionally followed by a defect type");
            }
            return unit;
        }

        /** The bench with one more unit. */
        public Bench with(Unit unit) {
            List<Unit> more = new ArrayList<>(units);
            more.add(unit);
            return new Bench(request, saved, more);
        }

        /** The bench without its last unit (the same bench when none is entered). */
        public Bench withoutLast() {
            return units.isEmpty() ? this : new Bench(request, saved, units.subList(0, units.size() - 1));
        }

        /** Where the plan stands after the units entered. */
        public State state() {
            int m = units.size();
            long[] cumulative = new long[m + 1];
            for (int i = 0; i < m; i++) {
                int count = units.get(i).count();
                cumulative[i + 1] = cumulative[i] + (countsUnits() ? Math.min(1, count) : count);
            }
            Stopping.Point point = m == 0 ? null : pointAfter(saved.plan(), m, cumulative);
            if (point != null && point.verdict() != Stopping.Verdict.ACCEPT
                    && point.verdict() != Stopping.Verdict.REJECT) {
                point = null;
            }
            return new State(saved.plan(), countsUnits(), m, m == 0 ? null : units.get(m - 1), cumulative[m], point);
        }

        /** Writes the units as an inspection sheet (unit, result or count, defect) that sentencing reads. */
        public void writeSheet(Path target) {
            List<List<Object>> rows = new ArrayList<>();
            for (int i = 0; i < units.size(); i++) {
                String id = request.prefix() + (i + 1);
                Unit unit = units.get(i);
                rows.add(countsUnits() ? List.of(id, unit.count() > 0 ? "fail" : "pass", unit.defect())
                        : List.of(id, unit.count(), unit.defect()));
            }
            AtomicWrite.writeString(target, CsvTable.table(countsUnits() ? List.of("unit", "result", "defect")
                    : List.of("unit", "minor", "defect"), rows));
        }

        /**
         * Keeps the units of an entry that ended on a refused line: in the request's sheet, or in a new file in
         * the temporary folder. Returns where, or null when no unit was entered.
         */
        public Path keep() {
            if (units.isEmpty()) {
                return null;
            }
            Path target = request.sheet();
            if (target == null) {
                try {
                    target = Files.createTempFile("lotgate-bench-", ".csv");
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }
            writeSheet(target);
            return target;
        }
    }

    private static Unit unit(String text, boolean countsUnits, ResultWords words) {
        Boolean failed = words.failed(text);
        if (failed != null) {
            return countsUnits || !failed ? new Unit(failed ? 1 : 0, "") : null;
        }
        String failWord = words.failPrefix(text);
        if (failWord != null) {
            return countsUnits ? new Unit(1, text.substring(failWord.length()).trim()) : null;
        }
        int space = text.indexOf(' ');
        String number = space < 0 ? text : text.substring(0, space);
        String defect = space < 0 ? "" : text.substring(space + 1).trim();
        try {
            int count = Integer.parseInt(number);
            if (count < 0 || count > 1_000_000 || (countsUnits && count > 1)) {
                return null;
            }
            return new Unit(count, count == 0 ? "" : defect);
        } catch (NumberFormatException e) {
            return null;
        }
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
}
