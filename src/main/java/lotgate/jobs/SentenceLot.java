package lotgate.jobs;

import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.LongConsumer;
import java.util.stream.IntStream;
import lotgate.files.AtomicWrite;
import lotgate.files.Sha256;
import lotgate.files.StagedFiles;
import lotgate.history.Identifiers;
import lotgate.history.Severity;
import lotgate.history.SeverityTracker;
import lotgate.history.StoredRecord;
import lotgate.inspection.Columns;
import lotgate.inspection.InspectionSample;
import lotgate.inspection.LotDetails;
import lotgate.inspection.MeasurementReader;
import lotgate.inspection.SampleReader;
import lotgate.inspection.SheetException;
import lotgate.inspection.SheetSource;
import lotgate.inspection.Tally;
import lotgate.plan.ClassPlan;
import lotgate.plan.DefectClass;
import lotgate.plan.Measurement;
import lotgate.plan.PlanFamily;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.ChartFile;
import lotgate.report.DecisionJson;
import lotgate.report.HistoryPlace;
import lotgate.report.Json;
import lotgate.report.LotReport;
import lotgate.report.SamplingChart;
import lotgate.sampling.OcModel;
import lotgate.sampling.Plan;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.VariablesPlan;
import lotgate.sentencing.BoundMethod;
import lotgate.sentencing.ClassVerdict;
import lotgate.sentencing.Evidence;
import lotgate.sentencing.LotDecision;
import lotgate.sentencing.MeasuredLot;
import lotgate.sentencing.Outcome;
import lotgate.sentencing.Pending;
import lotgate.sentencing.Sentence;
import lotgate.sentencing.Sentencer;
import lotgate.sentencing.Stopping;

/**
 * Sentencing a lot: reads its inspection sheet, applies a saved plan (or the plan a family's switching rules
 * select), and, in this order, checks everything, renders every output file, stages them, commits the lot's
 * record to the history store, and only then moves the outputs into place.
 */
public final class SentenceLot {

    /** The files to write besides the store's record: the decision record (.json), a sampling chart, lot reports. */
    public record Outputs(Path record, Path chart, List<Path> reports) {
        /** No output files. */
        public static final Outputs NONE = new Outputs(null, null, List.of());

        public Outputs {
            reports = List.copyOf(reports);
        }
    }

    /**
     * The plan file (or family), the sheet with the sheet name (null: the first not named 'lot'), column names,
     * the sample's rows (0, 0: all), the lot details given (each null where the lot file or sheet says it), the
     * lot file (null: the default), the confidence of the bounds, whether to record the lot, the record it
     * corrects (or null) and why, whether production was steady or irregular, the store, and the outputs.
     */
    public record Request(Path planFile, Path sheetFile, String sheet, Columns columns, int firstRow, int lastRow,
            LotDetails given, Path lotFile, double confidence, boolean record, Long supersedes, String reason,
            String production, String store, Outputs outputs) {
    }

    /**
     * What the lot was inspected under and what recording it gave: the store, the severity applied, the
     * switching rules' edition, the record (null when not recorded), the severity for the next lot, the switch
     * the record caused (or null), and the record it corrects (0: none).
     */
    public record Recording(String store, Severity applied, String rulesEdition, StoredRecord record, Severity next,
            SeverityTracker.Switch caused, long supersedes) {
        /** Whether the lot was recorded. */
        public boolean recorded() {
            return record != null;
        }
    }

    /** What sentencing gave: a decision, or an instruction to inspect more units first. */
    public sealed interface Result {
    }

    /** The lot was decided: the decision with its evidence, the history (null without a store) and the outputs. */
    public record Decided(LotDecision decision, Recording recording, Outputs outputs) implements Result {
        /** Whether the lot is accepted. */
        public boolean accepted() {
            return decision.sentence().accepted();
        }
    }

    /** A plan in stages or a sequential plan has not decided yet; nothing was recorded or written. */
    public record Undecided(LotDetails lot, SavedPlan plan, InspectionSample sample, Pending pending)
            implements Result {
    }

    private SentenceLot() {
    }

    /** Sentences the lot, records it unless asked not to, and writes the outputs asked for. */
    public static Result run(Request request) {
        return run(request, row -> { });
    }

    /** As {@link #run(Request)}, telling {@code rowsRead} each sheet row read (for a face's progress line). */
    public static Result run(Request request, LongConsumer rowsRead) {
        checkOutputs(request.outputs());
        if (!request.production().equals("steady") && !request.production().equals("irregular")) {
            throw JobException.invalid("production", "--production " + request.production() + ": give steady or"
                    + " irregular");
        }
        if ((request.supersedes() == null) != (request.reason() == null || request.reason().isBlank())) {
            throw JobException.invalid("supersedes", "--supersedes and --reason go together: a correction"
                    + " names the record it corrects and why");
        }
        if (!request.record() && request.supersedes() != null) {
            throw JobException.invalid("supersedes", "--supersedes records a correction; it cannot go with"
                    + " --no-record");
        }
        boolean family = PlanFamily.isFamily(request.planFile());
        SheetSource source = SheetSource.open(request.sheetFile());
        LotDetails lot = request.given().orElse(LotDetails.read(source, request.lotFile()));
        String[][] ids = {{"lot", lot.lot()}, {"supplier", lot.supplier()}, {"part", lot.part()},
                {"inspector", lot.inspector()}};
        for (String[] id : ids) {
            String problem = Identifiers.problem(id[0], id[1]);
            if (problem != null) {
                throw new JobException(JobException.Kind.BAD_INPUT, id[0], "lot details of " + request.sheetFile()
                        + ": " + problem + " (nothing was recorded)");
            }
        }
        if ((request.record() || family) && (lot.supplier() == null || lot.part() == null)) {
            throw JobException.invalid("supplier", "give the lot's --supplier and --part (or put them in the"
                    + " lot details) so that the lot joins its supplier's history, or sentence with --no-record");
        }
        Inspection inspection = !request.record() && !family ? null
                : Inspection.open(request.store(), request.planFile(), family, lot, request.supersedes());
        try {
            SavedPlan plan = inspection == null ? PlanFormat.read(request.planFile()) : inspection.plan();
            List<String> notices = new ArrayList<>();
            if (inspection != null) {
                lot = inspection.lot();
                if (inspection.notice() != null) {
                    notices.add(inspection.notice());
                }
            }
            lot = checkLot(request, lot, plan, notices);
            Path appliedPlan = inspection == null ? request.planFile() : inspection.planFile();
            Judged judged = plan.measurement() != null
                    ? measured(request, plan, appliedPlan, source, lot, notices, rowsRead)
                    : counted(request, plan, appliedPlan, source, lot, notices, rowsRead);
            if (judged instanceof UndecidedLot undecided) {
                return undecided.undecided();
            }
            return finish(request, ((DecidedLot) judged).decision(), inspection);
        } finally {
            if (inspection != null) {
                inspection.close();
            }
        }
    }

    /**
     * Applies a plan to a sheet again for a lot already decided (regenerating a recorded lot's outputs):
     * the decision as it comes out now, or a refusal when the plan no longer decides the lot.
     */
    static LotDecision decideAgain(Request request, SavedPlan plan, LotDetails lot) {
        SheetSource source = SheetSource.open(request.sheetFile());
        List<String> notices = new ArrayList<>();
        Judged judged = plan.measurement() != null
                ? measured(request, plan, request.planFile(), source, lot, notices, row -> { })
                : counted(request, plan, request.planFile(), source, lot, notices, row -> { });
        if (judged instanceof DecidedLot decided) {
            return decided.decision();
        }
        throw new JobException(JobException.Kind.CONFLICT, "sheet", request.sheetFile() + " no longer decides lot "
                + lot.lot() + " under plan " + plan.name());
    }

    /** What applying the plan to the sheet gave, before anything is recorded or written. */
    private sealed interface Judged {
    }

    /** A decision not yet recorded nor written. */
    private record DecidedLot(LotDecision decision) implements Judged {
    }

    /** Renders and stages the outputs, commits the record, then publishes the outputs. */
    private static Decided finish(Request request, LotDecision decision, Inspection inspection) {
        Outputs outputs = request.outputs();
        try (StagedFiles staged = new StagedFiles()) {
            Recording recording = null;
            if (inspection != null && request.record()) {
                // The outputs show the record's place in the chain: they are rendered and staged inside the
                // record's transaction, which commits only once they all are.
                recording = inspection.record(decision, request.production(), request.reason(), stored -> stage(staged,
                        outputs, decision, new HistoryPlace(stored.seq(), stored.hash(), inspection.storeLocation())));
            } else {
                stage(staged, outputs, decision, null);
                recording = inspection == null ? null : inspection.unrecorded();
            }
            try {
                staged.publish();
            } catch (lotgate.files.OutputFileException e) {
                if (recording == null || !recording.recorded()) {
                    throw e;
                }
                throw e.withNote("the lot was recorded as #" + recording.record().seq() + ": once the cause is"
                        + " removed, write its outputs with 'lotgate reissue " + recording.record().seq() + "'");
            }
            return new Decided(decision, recording, outputs);
        }
    }

    /** Renders every output of a decision under a staged name, showing its place in the history (or null). */
    static void stage(StagedFiles staged, Outputs outputs, LotDecision decision, HistoryPlace place) {
        for (Path report : outputs.reports()) {
            staged.stage(report, file -> LotReport.write(decision, place, file));
        }
        if (outputs.record() != null) {
            String record = Json.text(decisionRecord(decision, place)) + "\n";
            staged.stage(outputs.record(), file -> AtomicWrite.writeString(file, record));
        }
        if (outputs.chart() != null) {
            staged.stage(outputs.chart(), file -> ChartFile.write(SamplingChart.of(decision), file, 900, 560));
        }
    }

    /** The decision record as saved to a file: the decision, and where the store holds it. */
    static com.fasterxml.jackson.databind.node.ObjectNode decisionRecord(LotDecision decision, HistoryPlace place) {
        com.fasterxml.jackson.databind.node.ObjectNode node = DecisionJson.of(decision);
        if (place != null) {
            com.fasterxml.jackson.databind.node.ObjectNode history = node.putObject("historyRecord");
            history.put("seq", place.seq());
            history.put("chainHash", place.hash());
            history.put("store", place.store());
            history.put("expect", place.expect());
        }
        return node;
    }

    /** A lot judged by counts: a single plan, a plan in stages or a sequential plan. */
    private static Judged counted(Request request, SavedPlan plan, Path appliedPlan, SheetSource source,
            LotDetails lot, List<String> notices, LongConsumer rowsRead) {
        if (request.outputs().chart() != null && !plan.unclassified()) {
            throw JobException.invalid("chart", "--sampling-chart draws the sampling chart of a plan without"
                    + " defect classes; plan " + plan.name() + " has criteria per class");
        }
        int[] cutoffs = plan.classes().stream().flatMap(c -> Stopping.boundaries(c.plan()).stream())
                .mapToInt(Integer::intValue).distinct().toArray();
        SampleReader reader = new SampleReader(source, request.sheet(), request.columns(), cutoffs,
                request.firstRow(), request.lastRow()).telling(rowsRead);
        if (plan.classes().stream().anyMatch(c -> c.plan() instanceof SequentialPlan)) {
            reader.keepSequence();
        } else if (cutoffs.length > 0) {
            reader.stopAfter(readingLimit(cutoffs));
        }
        InspectionSample sample = reader.read();
        if (reader.stoppedAtLimit()) {
            throw incomplete(request.sheetFile() + " holds more than " + (sample.units() - 1) + " units"
                    + (request.firstRow() > 0 ? " in rows " + request.firstRow() + "-" + request.lastRow() : "")
                    + " (reading stopped there), but plan " + plan.name() + " samples at most "
                    + IntStream.of(cutoffs).max().orElseThrow() + "; name the sample's rows with --rows FIRST-LAST"
                    + " (nothing was recorded)");
        }
        Sentencer.Counts counts = counts(request, plan, sample);
        checkSampleSize(request, plan, sample, counts);
        Outcome outcome = Sentencer.sentence(plan, counts, lot.lotSize(), request.confidence());
        if (outcome instanceof Pending pending) {
            return new UndecidedLot(new Undecided(lot, plan, sample, pending));
        }
        Sentence sentence = (Sentence) outcome;
        int used = sentence.classes().stream().mapToInt(ClassVerdict::inspected).max().orElse(sample.units());
        if (used < sample.units()) {
            ClassVerdict first = sentence.classes().get(0);
            notices.add("the plan decided at " + first.step() + ", after "
                    + lotgate.report.Words.count(used, "unit") + "; the other "
                    + (sample.units() - used == 1 ? "unit on the sheet does" : (sample.units() - used)
                            + " units on the sheet do") + " not count toward the verdict");
        }
        return new DecidedLot(new LotDecision(lot, plan, appliedPlan, sample, Sha256.of(request.sheetFile()),
                sentence, request.confidence(), Instant.now().truncatedTo(ChronoUnit.SECONDS), ToolVersion.number(),
                notices));
    }

    /** A lot not decided yet, on its way out of {@link #counted}. */
    private record UndecidedLot(Undecided undecided) implements Judged {
    }

    /** A lot judged on measurements by a variables plan. */
    private static Judged measured(Request request, SavedPlan plan, Path appliedPlan, SheetSource source,
            LotDetails lot, List<String> notices, LongConsumer rowWatcher) {
        if (request.outputs().chart() != null) {
            throw JobException.invalid("chart", "--sampling-chart draws the sampling chart of an attribute plan;"
                    + " plan " + plan.name() + " judges measurements (its report shows them)");
        }
        Path sheetFile = request.sheetFile();
        double confidence = request.confidence();
        VariablesPlan variables = (VariablesPlan) plan.plan();
        Measurement spec = plan.measurement();
        MeasurementReader.Measurements measurements = new MeasurementReader(source, request.sheet(),
                request.columns(), request.firstRow(), request.lastRow()).telling(rowWatcher).read();
        int wanted = variables.n();
        if (measurements.count() != wanted) {
            String rowsRead = measurements.count() == 0 ? "" : ", rows " + measurements.firstRow() + " to "
                    + measurements.lastRow();
            throw new JobException(JobException.Kind.INCOMPLETE_SAMPLE, "sheet", measurements.count() < wanted
                    ? "incomplete sample: " + measurements.count() + " of " + wanted + " measurements in " + sheetFile
                            + rowsRead + "; measure and record " + (wanted - measurements.count())
                            + " more before sentencing (nothing was recorded)"
                    : sheetFile + " holds " + measurements.count() + " measurements" + rowsRead + " but plan "
                            + plan.name() + " measures " + wanted + "; name the sample's rows with --rows FIRST-LAST"
                            + " (nothing was recorded)");
        }
        MeasuredLot judged = MeasuredLot.judge(variables, spec, measurements.values(), confidence);
        notices.addAll(judged.warnings());
        OcModel model = plan.model();
        RiskPoints points = plan.designedFor();
        double nearest = Double.isNaN(judged.statisticLower()) ? judged.statisticUpper()
                : Double.isNaN(judged.statisticUpper()) ? judged.statisticLower()
                : Math.min(judged.statisticLower(), judged.statisticUpper());
        double pValue = Double.isFinite(nearest)
                ? new VariablesPlan(variables.n(), nearest, variables.sigmaKnown()).rejection(model, points.aql())
                : (nearest > 0 ? 0.0 : 1.0);
        Evidence evidence = new Evidence(pValue, confidence, 0.0, judged.upperBound(),
                BoundMethod.measured(variables.sigmaKnown()), -1,
                Math.min(1, Math.max(0, judged.estimate())), judged.acceptanceAtEstimate(),
                variables.acceptance(model, points.aql()), variables.acceptance(model, points.ltpd()));
        ClassVerdict verdict = new ClassVerdict(DefectClass.ANY, variables, wanted, judged.outside().size(),
                judged.accepted(), evidence, -1, -1, "the sample");
        Sentence sentence = new Sentence(judged.accepted(), List.of(verdict));
        InspectionSample sample = measurements.asSample(judged.outside(), "outside the limits");
        return new DecidedLot(new LotDecision(lot, plan, appliedPlan, sample, Sha256.of(sheetFile), sentence,
                confidence, Instant.now().truncatedTo(ChronoUnit.SECONDS), ToolVersion.number(), notices, judged));
    }

    /** The counts the plan is judged on, by its model: units, or nonconformities, over the first m units. */
    private static Sentencer.Counts counts(Request request, SavedPlan plan, InspectionSample sample) {
        checkClasses(request.sheetFile(), plan, sample);
        boolean units = plan.model().countsUnits();
        long[] cumulative = null;
        if (sample.sequence() != null) {
            cumulative = new long[sample.units() + 1];
            for (int i = 0; i < sample.units(); i++) {
                int count = sample.sequence()[i];
                cumulative[i + 1] = cumulative[i] + (units ? (count > 0 ? 1 : 0) : count);
            }
        }
        long[] prefix = cumulative;
        return new Sentencer.Counts() {
            @Override
            public int units() {
                return sample.units();
            }

            @Override
            public long countAt(DefectClass defectClass, int m) {
                if (prefix != null && defectClass == DefectClass.ANY) {
                    return prefix[m];
                }
                Tally tally = m == sample.units() ? sample.all() : sample.tallies().get(m);
                if (tally == null) {
                    throw new IllegalStateException("no count kept after " + m + " units");
                }
                return units ? tally.nonconformingUnits(defectClass) : tally.nonconformities(defectClass);
            }
        };
    }

    static void checkOutputs(Outputs outputs) {
        Checks.chartName("chart", outputs.chart());
        Path record = outputs.record();
        if (record != null && !record.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".json")) {
            throw JobException.invalid("record", "--record " + record + ": a decision record is a .json file");
        }
        for (Path report : outputs.reports()) {
            if (!LotReport.supported(report)) {
                throw JobException.invalid("reports", "--report " + report + ": a lot report is a .xlsx or"
                        + " .html file");
            }
        }
    }

    private static LotDetails checkLot(Request request, LotDetails lot, SavedPlan plan, List<String> notices) {
        Path sheetFile = request.sheetFile();
        if (lot.lot() == null) {
            throw JobException.invalid("lot", "name the lot: give --lot ID, or a 'lot' row in the lot"
                    + " details (the workbook's 'lot' sheet, or " + (sheetFile.toString().endsWith(".csv")
                    ? LotDetails.sideFile(sheetFile).getFileName() : "--lot-file") + ")");
        }
        int size = lot.lotSize();
        if (size == 0 && plan.lotSize() > 0 && plan.model() instanceof OcModel.Hypergeometric) {
            size = plan.lotSize();
            notices.add("lot size not given: taken as the plan's " + size + " units");
        } else if (size > 0 && plan.lotSize() > 0 && size != plan.lotSize()) {
            notices.add("this lot has " + size + " units; the plan was designed for lots of " + plan.lotSize()
                    + " (the evidence uses " + size + ")");
        }
        if (size > 0 && size < plan.sampleSize()) {
            throw new JobException(JobException.Kind.BAD_INPUT, "lotSize", "the lot has " + size + " units but plan "
                    + plan.name() + " samples " + plan.sampleSize() + "; inspect every unit instead");
        }
        return new LotDetails(lot.lot(), lot.supplier(), lot.part(), size, lot.received(), lot.inspector());
    }

    /**
     * How many units a sheet may show before reading stops: well past the plan's largest sample, so that a
     * sheet a few units over is refused with its exact count, and one of a million rows without reading them all.
     */
    private static int readingLimit(int[] cutoffs) {
        return 2 * IntStream.of(cutoffs).max().orElseThrow() + 100;
    }

    private static void checkSampleSize(Request request, SavedPlan plan, InspectionSample sample,
            Sentencer.Counts counts) {
        Path sheetFile = request.sheetFile();
        Plan first = plan.classes().get(0).plan();
        if (first instanceof SequentialPlan) {
            if (sample.units() == 0) {
                throw incomplete("no units recorded in " + sheetFile + "; record the"
                        + " units in the order inspected (nothing was recorded)");
            }
            return;
        }
        boolean rowsNamed = request.firstRow() > 0;
        List<Integer> boundaries = Stopping.boundaries(first);
        if (boundaries.size() > 1) {
            if (!boundaries.contains(sample.units()) && !curtailedRejection(first, sample, counts)) {
                String ends = String.join(", ", boundaries.stream().map(String::valueOf).toList());
                throw incomplete(sheetFile + " holds " + sample.units() + " units"
                        + (sample.units() == 0 ? "" : ", " + rowsOf(sample)) + ", but plan " + plan.name()
                        + "'s samples end at " + ends + " units; record whole samples in the order inspected, or stop"
                        + " early only where the count reaches the rejection number"
                        + (rowsNamed ? "" : " (or name the rows with --rows FIRST-LAST)") + " (nothing was recorded)");
            }
            return;
        }
        int wanted = plan.sampleSize();
        String rowsRead = sample.units() == 0 ? "" : ", " + rowsOf(sample);
        if (sample.units() < wanted) {
            throw incomplete("incomplete sample: " + sample.units() + " of " + wanted
                    + " units in " + sheetFile + rowsRead + "; inspect and record " + (wanted - sample.units())
                    + " more before sentencing (nothing was recorded)");
        }
        if (sample.units() > wanted) {
            throw incomplete(sheetFile + " holds " + sample.units() + " units"
                    + (rowsNamed ? " in rows " + request.firstRow() + "-" + request.lastRow() : "") + " but plan "
                    + plan.name() + " samples " + wanted + "; name the sample's rows with --rows FIRST-LAST"
                    + " (nothing was recorded)");
        }
    }

    private static JobException incomplete(String message) {
        return new JobException(JobException.Kind.INCOMPLETE_SAMPLE, "sheet", message);
    }

    /** Whether a sample that ends inside a stage already reaches that stage's rejection number. */
    private static boolean curtailedRejection(Plan plan, InspectionSample sample, Sentencer.Counts counts) {
        if (sample.units() == 0 || sample.units() > plan.maxSampleSize()) {
            return false;
        }
        try {
            return Stopping.at(plan, sample.units(), m -> counts.countAt(DefectClass.ANY, m)).verdict()
                    == Stopping.Verdict.REJECT;
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    /** The sheet rows a sample came from, in words: "rows 2 to 126", with the sheet's name for a workbook. */
    public static String rowsOf(InspectionSample sample) {
        String rows = "rows " + sample.firstRow() + " to " + sample.lastRow();
        return sample.file().toString().toLowerCase(Locale.ROOT).endsWith(".csv") ? rows
                : "sheet '" + sample.sheet() + "' " + rows;
    }

    /** Checks that the sheet records what the plan judges: its way of counting and its defect classes. */
    private static void checkClasses(Path sheetFile, SavedPlan plan, InspectionSample sample) {
        boolean units = plan.model().countsUnits();
        if (sample.passFail() && !units) {
            throw new SheetException(sheetFile, "the sheet records pass or fail per unit, but plan " + plan.name()
                    + " counts nonconformities (Poisson model); record counts per unit in critical, major or minor"
                    + " columns");
        }
        if (sample.passFail() && !plan.unclassified()) {
            throw new SheetException(sheetFile, "the sheet records pass or fail per unit, but plan " + plan.name()
                    + " has criteria per defect class; record counts per unit in critical, major and minor columns");
        }
        if (!plan.unclassified()) {
            for (ClassPlan criteria : plan.classes()) {
                if (!sample.classColumns().contains(criteria.defectClass())) {
                    throw new SheetException(sheetFile, "plan " + plan.name() + " has criteria for "
                            + criteria.defectClass().label() + " but the sheet has no '" + criteria.defectClass().label()
                            + "' column");
                }
            }
            for (DefectClass recorded : sample.classColumns()) {
                if (plan.criteria(recorded) == null && sample.all().nonconformingUnits(recorded) > 0) {
                    throw new SheetException(sheetFile, "the sheet records " + recorded.label() + " nonconformities ("
                            + sample.all().nonconformingUnits(recorded) + " units) but plan " + plan.name()
                            + " has no criteria for " + recorded.label() + "; a plan must not judge a class it was not"
                            + " designed for");
                }
            }
        }
    }
}
