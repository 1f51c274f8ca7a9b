package lotgate.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.files.AtomicWrite;
import lotgate.files.Sha256;
import lotgate.inspection.Columns;
import lotgate.inspection.InspectionSample;
import lotgate.inspection.LotDetails;
import lotgate.inspection.SampleReader;
import lotgate.inspection.SheetException;
import lotgate.inspection.SheetSource;
import lotgate.inspection.Tally;
import lotgate.plan.ClassPlan;
import lotgate.plan.DefectClass;
import lotgate.plan.PlanFormat;
import lotgate.plan.SavedPlan;
import lotgate.report.DecisionJson;
import lotgate.report.LotReport;
import lotgate.report.SentenceText;
import lotgate.sentencing.ClassVerdict;
import lotgate.sentencing.Evidence;
import lotgate.sentencing.LotDecision;
import lotgate.sentencing.Sentence;
import lotgate.sentencing.Sentencer;
import lotgate.sentencing.Outcome;
import lotgate.sentencing.Pending;
import lotgate.sentencing.Stopping;
import lotgate.sampling.Plan;
import lotgate.sampling.OcModel;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.VariablesPlan;
import lotgate.sampling.SinglePlan;
import lotgate.inspection.MeasurementReader;
import lotgate.plan.Measurement;
import lotgate.sentencing.MeasuredLot;
import lotgate.sampling.SequentialPlan;
import lotgate.report.ChartFile;
import lotgate.report.PlanWording;
import lotgate.report.SamplingChart;
import lotgate.report.CsvTable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** Sentences a lot: reads its inspection sheet, applies a saved plan, and gives the verdict with its evidence. */
@Command(name = "sentence", mixinStandardHelpOptions = true, sortOptions = false, usageHelpAutoWidth = true,
        header = "Accept or reject a lot from its inspection sheet and a saved plan.",
        description = {
                "Reads the sample recorded in an inspection sheet (.xlsx, .xls or .csv), applies the saved plan,"
                        + " and gives the verdict per defect class and for the lot, with exact evidence: the"
                        + " p-value of the count against the AQL, a confidence interval for the lot's quality, for a"
                        + " known lot size an upper bound on its nonconforming units, and where the count sits on"
                        + " the plan's OC curve.",
                "",
                "A variables plan reads measurements from a 'value' column instead, and gives the sample's mean"
                        + " and s, the quality statistic against k, the estimated fraction beyond the limits with an"
                        + " exact upper bound, and a normality test.",
                "",
                "The lot is recorded in the supplier's history (see --store), unless --no-record.",
                "",
                "A double or multiple plan stops at the first sample (stage) whose count decides; a sequential"
                        + " plan after the first unit at which the count crosses a line. The sheet lists the units in"
                        + " the order inspected; when the plan has not decided yet, lotgate says how many more units to"
                        + " inspect (exit code 9) and records nothing.",
                "",
                "Exit code 0: accepted; 1: rejected; 4: the sheet holds fewer or more units than the plan samples;"
                        + " 8: inspection of the part is discontinued; 9: no decision yet, inspect more units;"
                        + " 2 and 3: bad options or input; 7: the history store cannot be used.",
                ""})
final class SentenceCommand implements Runnable {

    @Parameters(index = "0", paramLabel = "PLAN",
            description = "The saved plan file to apply (plans/*.json), or a plan family, whose variant for the"
                    + " supplier's current inspection severity is applied.")
    Path planFile;

    @Parameters(index = "1", paramLabel = "SHEET", description = "The inspection sheet: .xlsx, .xls or .csv.")
    Path sheetFile;

    @Option(names = "--sheet", paramLabel = "NAME",
            description = "The workbook sheet holding the sample (default: the first sheet not named 'lot').")
    String sheet;

    @Option(names = "--columns", paramLabel = "MAPPING",
            description = "Your own header names, as role=header pairs: unit, result, critical, major, minor,"
                    + " defect, note, value (measurements); e.g. --columns unit=Serial,result=Outcome.")
    String columnMapping;

    @Option(names = "--rows", paramLabel = "FIRST-LAST",
            description = "The sheet rows that form the sample, when the sheet holds more units (e.g. 2-126).")
    String rows;

    @Option(names = "--lot", paramLabel = "ID", description = "The lot's identifier.")
    String lotId;

    @Option(names = "--supplier", paramLabel = "NAME", description = "The supplier.")
    String supplier;

    @Option(names = "--part", paramLabel = "PART", description = "The part number.")
    String part;

    @Option(names = {"-N", "--lot-size"}, paramLabel = "N", converter = Values.Count.class,
            description = "The lot's size N (default: the plan's, for a finite-lot plan).")
    Integer lotSize;

    @Option(names = "--received", paramLabel = "DATE", description = "The day the lot was received (2026-03-14).")
    String received;

    @Option(names = "--inspector", paramLabel = "NAME", description = "Who inspected the sample.")
    String inspector;

    @Option(names = "--lot-file", paramLabel = "FILE",
            description = "Lot details as key/value rows (default: the workbook's 'lot' sheet, or NAME.lot.csv beside"
                    + " a CSV sheet).")
    Path lotFile;

    @Option(names = "--confidence", paramLabel = "LEVEL", defaultValue = "95%", converter = Values.Risk.class,
            description = "Confidence level of the bounds (default ${DEFAULT-VALUE}).")
    double confidence;

    @Option(names = "--record", paramLabel = "FILE", description = "Also save the decision record as a JSON file.")
    Path record;

    @Option(names = "--no-record", description = "Do not add this lot to the history store (a trial run).")
    boolean noRecord;

    @Option(names = "--supersedes", paramLabel = "SEQ",
            description = "This sentence corrects the history record SEQ (give --reason); the old record stays.")
    Long supersedes;

    @Option(names = "--reason", paramLabel = "TEXT", description = "Why this sentence corrects an earlier record.")
    String reason;

    @Option(names = "--production", paramLabel = "STEADY-OR-IRREGULAR", defaultValue = "steady",
            description = "Whether the supplier's production was steady or irregular (default ${DEFAULT-VALUE});"
                    + " irregular production ends reduced inspection.")
    String production;

    @Mixin
    StoreOption storeOption;

    @Option(names = "--chart", paramLabel = "FILE",
            description = "Draw the sampling chart: the count found against units inspected, with the plan's"
                    + " acceptance and rejection numbers (lines for a sequential plan, steps for a plan in stages);"
                    + " .png or .svg.")
    Path chart;

    @Option(names = "--report", paramLabel = "FILE",
            description = "Write a lot report: .xlsx (summary, sample, OC chart) or .html (printable); repeatable.")
    List<Path> reports = new ArrayList<>();

    @Mixin
    OutputFormat format;

    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        checkOutputs();
        int[] range = rowRange();
        LotDetails given = givenDetails();
        Columns columns = columns();
        if (!production.equals("steady") && !production.equals("irregular")) {
            throw new ParameterException(spec.commandLine(), "--production " + production + ": give steady or"
                    + " irregular");
        }
        if ((supersedes == null) != (reason == null || reason.isBlank())) {
            throw new ParameterException(spec.commandLine(), "--supersedes and --reason go together: a correction"
                    + " names the record it corrects and why");
        }
        if (noRecord && supersedes != null) {
            throw new ParameterException(spec.commandLine(), "--supersedes records a correction; it cannot go with"
                    + " --no-record");
        }
        boolean family = lotgate.plan.PlanFamily.isFamily(planFile);
        SheetSource source = SheetSource.open(sheetFile);
        LotDetails lot = given.orElse(LotDetails.read(source, lotFile));
        if ((!noRecord || family) && (lot.supplier() == null || lot.part() == null)) {
            throw new ParameterException(spec.commandLine(), "give the lot's --supplier and --part (or put them in the"
                    + " lot details) so that the lot joins its supplier's history, or sentence with --no-record");
        }
        Inspection inspection = noRecord && !family ? null : Inspection.open(storeOption, planFile, family, lot,
                supersedes);
        Sentence sentence;
        try {
            SavedPlan plan = inspection == null ? PlanFormat.read(planFile) : inspection.plan();
            List<String> notices = new ArrayList<>();
            if (inspection != null && inspection.notice() != null) {
                notices.add(inspection.notice());
            }
            lot = checkLot(lot, plan, notices);
            Path appliedPlan = inspection == null ? planFile : inspection.planFile();
            LotDecision decision = plan.measurement() != null
                    ? measured(plan, appliedPlan, source, lot, range, columns, notices)
                    : counted(plan, appliedPlan, source, lot, range, columns, notices);
            sentence = finish(decision, inspection);
        } finally {
            if (inspection != null) {
                inspection.close();
            }
        }
        if (!sentence.accepted()) {
            throw new Main.Failure(ExitCode.REJECTED, null);
        }
    }

    /** A lot judged by counts: a single plan, a plan in stages or a sequential plan. */
    private LotDecision counted(SavedPlan plan, Path appliedPlan, SheetSource source, LotDetails lot, int[] range,
            Columns columns, List<String> notices) {
        if (chart != null && !plan.unclassified()) {
            throw new ParameterException(spec.commandLine(), "--chart draws the sampling chart of a plan without"
                    + " defect classes; plan " + plan.name() + " has criteria per class");
        }
        int[] cutoffs = plan.classes().stream().flatMap(c -> Stopping.boundaries(c.plan()).stream())
                .mapToInt(Integer::intValue).distinct().toArray();
        SampleReader reader = new SampleReader(source, sheet, columns, cutoffs, range[0], range[1]);
        if (plan.classes().stream().anyMatch(c -> c.plan() instanceof SequentialPlan)) {
            reader.keepSequence();
        }
        InspectionSample sample = reader.read();
        Sentencer.Counts counts = counts(plan, sample);
        checkSampleSize(plan, sample, range, counts);
        Outcome outcome = Sentencer.sentence(plan, counts, lot.lotSize(), confidence);
        if (outcome instanceof Pending pending) {
            printPending(spec.commandLine().getOut(), plan, sample, pending, lot);
            throw new Main.Failure(ExitCode.NOT_DECIDED, null);
        }
        Sentence sentence = (Sentence) outcome;
        int used = sentence.classes().stream().mapToInt(ClassVerdict::inspected).max().orElse(sample.units());
        if (used < sample.units()) {
            ClassVerdict first = sentence.classes().get(0);
            notices.add("the plan decided at " + first.step() + ", after " + used + " units; the other "
                    + (sample.units() - used) + " units on the sheet do not count toward the verdict");
        }
        return new LotDecision(lot, plan, appliedPlan, sample, Sha256.of(sheetFile), sentence, confidence,
                Instant.now().truncatedTo(ChronoUnit.SECONDS), Version.number(), notices);
    }

    /** Records the decision, writes its reports and record, and prints it; returns its sentence. */
    private Sentence finish(LotDecision decision, Inspection inspection) {
        Inspection.Recorded recorded = null;
        if (inspection != null && !noRecord) {
            recorded = inspection.record(decision, production, reason);
        }
        for (Path report : reports) {
            LotReport.write(decision, report);
        }
        if (record != null) {
            AtomicWrite.writeString(record, Json.text(DecisionJson.of(decision)) + "\n");
        }
        if (chart != null) {
            ChartFile.write(SamplingChart.of(decision), chart, 900, 560);
        }
        PrintWriter out = spec.commandLine().getOut();
        switch (format.kind) {
            case json -> {
                var node = DecisionJson.of(decision);
                if (inspection != null) {
                    node.set("history", inspection.json(recorded));
                }
                out.println(Json.text(node));
            }
            case csv -> out.print(csv(decision));
            case text -> {
                printText(out, decision);
                if (inspection != null) {
                    inspection.printText(out, recorded);
                }
            }
        }
        out.flush();
        return decision.sentence();
    }

    /** A lot judged on measurements by a variables plan. */
    private LotDecision measured(SavedPlan plan, Path appliedPlan, SheetSource source, LotDetails lot, int[] range,
            Columns columns, List<String> notices) {
        if (chart != null) {
            throw new ParameterException(spec.commandLine(), "--chart draws the sampling chart of an attribute plan;"
                    + " plan " + plan.name() + " judges measurements (its report shows them)");
        }
        VariablesPlan variables = (VariablesPlan) plan.plan();
        Measurement spec = plan.measurement();
        MeasurementReader.Measurements measurements = new MeasurementReader(source, sheet, columns, range[0],
                range[1]).read();
        int wanted = variables.n();
        if (measurements.count() != wanted) {
            String rowsRead = measurements.count() == 0 ? "" : ", rows " + measurements.firstRow() + " to "
                    + measurements.lastRow();
            throw new Main.Failure(ExitCode.INCOMPLETE_SAMPLE, measurements.count() < wanted
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
        Evidence evidence = new Evidence(pValue, confidence, 0.0, judged.upperBound(), -1,
                Math.min(1, Math.max(0, judged.estimate())), judged.acceptanceAtEstimate(),
                variables.acceptance(model, points.aql()), variables.acceptance(model, points.ltpd()));
        ClassVerdict verdict = new ClassVerdict(DefectClass.ANY, variables, wanted, judged.outside().size(),
                judged.accepted(), evidence, -1, -1, "the sample");
        Sentence sentence = new Sentence(judged.accepted(), List.of(verdict));
        InspectionSample sample = measurements.asSample(judged.outside(), "outside the limits");
        return new LotDecision(lot, plan, appliedPlan, sample, Sha256.of(sheetFile), sentence, confidence,
                Instant.now().truncatedTo(ChronoUnit.SECONDS), Version.number(), notices, judged);
    }

    /** The counts the plan is judged on, by its model: units, or nonconformities, over the first m units. */
    private Sentencer.Counts counts(SavedPlan plan, InspectionSample sample) {
        checkClasses(plan, sample);
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

    private void checkOutputs() {
        CurveCommand.checkChartName(spec, chart);
        if (record != null && !record.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".json")) {
            throw new ParameterException(spec.commandLine(), "--record " + record + ": a decision record is a .json file");
        }
        for (Path report : reports) {
            if (!LotReport.supported(report)) {
                throw new ParameterException(spec.commandLine(), "--report " + report + ": a lot report is a .xlsx or"
                        + " .html file");
            }
        }
    }

    private int[] rowRange() {
        if (rows == null) {
            return new int[] {0, 0};
        }
        String[] parts = rows.split("-");
        try {
            int first = Integer.parseInt(parts[0].trim());
            int last = Integer.parseInt(parts[1].trim());
            if (parts.length == 2 && first >= 1 && last >= first) {
                return new int[] {first, last};
            }
        } catch (NumberFormatException | ArrayIndexOutOfBoundsException e) {
            // Falls through to the message below.
        }
        throw new ParameterException(spec.commandLine(), "--rows " + rows + ": give the first and last sheet row of"
                + " the sample, as in 2-126");
    }

    private LotDetails givenDetails() {
        LocalDate day = null;
        if (received != null) {
            try {
                day = LocalDate.parse(received.trim());
            } catch (DateTimeParseException e) {
                throw new ParameterException(spec.commandLine(), "--received " + received + ": give a date such as"
                        + " 2026-03-14");
            }
        }
        return new LotDetails(blankToNull(lotId), blankToNull(supplier), blankToNull(part),
                lotSize == null ? 0 : lotSize, day, blankToNull(inspector));
    }

    private static String blankToNull(String text) {
        return text == null || text.isBlank() ? null : text.trim();
    }

    private Columns columns() {
        if (columnMapping == null) {
            return Columns.standard();
        }
        try {
            return Columns.mapped(columnMapping);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), "--columns: " + e.getMessage());
        }
    }

    private LotDetails checkLot(LotDetails lot, SavedPlan plan, List<String> notices) {
        if (lot.lot() == null) {
            throw new ParameterException(spec.commandLine(), "name the lot: give --lot ID, or a 'lot' row in the lot"
                    + " details (the workbook's 'lot' sheet, or " + (sheetFile.toString().endsWith(".csv")
                    ? LotDetails.sideFile(sheetFile).getFileName() : "--lot-file") + ")");
        }
        int size = lot.lotSize();
        if (size == 0 && plan.lotSize() > 0 && plan.model() instanceof lotgate.sampling.OcModel.Hypergeometric) {
            size = plan.lotSize();
            notices.add("lot size not given: taken as the plan's " + size + " units");
        } else if (size > 0 && plan.lotSize() > 0 && size != plan.lotSize()) {
            notices.add("this lot has " + size + " units; the plan was designed for lots of " + plan.lotSize()
                    + " (the evidence uses " + size + ")");
        }
        if (size > 0 && size < plan.sampleSize()) {
            throw new Main.Failure(ExitCode.BAD_INPUT, "the lot has " + size + " units but plan " + plan.name()
                    + " samples " + plan.sampleSize() + "; inspect every unit instead");
        }
        return new LotDetails(lot.lot(), lot.supplier(), lot.part(), size, lot.received(), lot.inspector());
    }

    private void checkSampleSize(SavedPlan plan, InspectionSample sample, int[] range, Sentencer.Counts counts) {
        Plan first = plan.classes().get(0).plan();
        if (first instanceof SequentialPlan) {
            if (sample.units() == 0) {
                throw new Main.Failure(ExitCode.INCOMPLETE_SAMPLE, "no units recorded in " + sheetFile + "; record the"
                        + " units in the order inspected (nothing was recorded)");
            }
            return;
        }
        List<Integer> boundaries = Stopping.boundaries(first);
        if (boundaries.size() > 1) {
            if (!boundaries.contains(sample.units()) && !curtailedRejection(first, sample, counts)) {
                String ends = String.join(", ", boundaries.stream().map(String::valueOf).toList());
                throw new Main.Failure(ExitCode.INCOMPLETE_SAMPLE, sheetFile + " holds " + sample.units() + " units"
                        + (sample.units() == 0 ? "" : ", " + rowsOf(sample)) + ", but plan " + plan.name()
                        + "'s samples end at " + ends + " units; record whole samples in the order inspected, or stop"
                        + " early only where the count reaches the rejection number"
                        + (range[0] > 0 ? "" : " (or name the rows with --rows FIRST-LAST)") + " (nothing was recorded)");
            }
            return;
        }
        int wanted = plan.sampleSize();
        String rowsRead = sample.units() == 0 ? "" : ", " + rowsOf(sample);
        if (sample.units() < wanted) {
            throw new Main.Failure(ExitCode.INCOMPLETE_SAMPLE, "incomplete sample: " + sample.units() + " of " + wanted
                    + " units in " + sheetFile + rowsRead + "; inspect and record " + (wanted - sample.units())
                    + " more before sentencing (nothing was recorded)");
        }
        if (sample.units() > wanted) {
            throw new Main.Failure(ExitCode.INCOMPLETE_SAMPLE, sheetFile + " holds " + sample.units() + " units"
                    + (range[0] > 0 ? " in rows " + rows : "") + " but plan " + plan.name() + " samples " + wanted
                    + "; name the sample's rows with --rows FIRST-LAST (nothing was recorded)");
        }
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

    /** A plan in stages or a sequential plan that has not decided yet: what to inspect next. */
    private void printPending(PrintWriter out, SavedPlan plan, InspectionSample sample, Pending pending,
            LotDetails lot) {
        Stopping.Point point = pending.point();
        String counted = DesignCommand.unitWord(plan.model(), (int) Math.min(Integer.MAX_VALUE, point.found()));
        String what;
        if (pending.plan() instanceof SequentialPlan sequential) {
            what = "inspect the next unit and sentence again with it on the sheet; with no further " + (plan.model()
                    .countsUnits() ? "nonconforming unit" : "nonconformity") + " the lot is accepted after unit "
                    + pending.cleanAcceptance() + " (the plan stops by unit " + sequential.truncation() + " at the latest)";
        } else {
            what = "inspect the " + (pending.plan() instanceof lotgate.sampling.DoublePlan ? "second sample"
                    : "next stage") + ": " + point.moreUnits() + " more units, then sentence again with all "
                    + pending.nextTotal() + " units on the sheet";
        }
        switch (format.kind) {
            case json -> {
                var node = Json.object();
                node.put("verdict", "continue");
                node.put("lot", lot.lot());
                node.put("plan", plan.name());
                node.put("planFingerprint", plan.fingerprint());
                node.put("inspected", point.inspected());
                node.put("found", point.found());
                node.put("step", point.step());
                if (point.acceptanceNumber() >= 0) {
                    node.put("acceptanceNumber", point.acceptanceNumber());
                } else {
                    node.putNull("acceptanceNumber");
                }
                node.put("rejectionNumber", point.rejectionNumber());
                node.put("moreUnits", point.moreUnits());
                node.put("nextTotal", pending.nextTotal());
                if (pending.cleanAcceptance() > 0) {
                    node.put("acceptedIfCleanAfterUnit", pending.cleanAcceptance());
                }
                node.put("instruction", what);
                out.println(Json.text(node));
            }
            case csv -> out.print(CsvTable.table(List.of("lot", "verdict", "inspected", "found", "step", "moreUnits",
                    "nextTotal", "planFingerprint"), List.of(List.of(lot.lot(), "continue", point.inspected(),
                    point.found(), point.step(), point.moreUnits(), pending.nextTotal(), plan.fingerprint()))));
            case text -> {
                out.println("NO DECISION YET " + lotLine(lot));
                out.println("  " + point.found() + " " + counted + " found in " + point.inspected() + " units ("
                        + point.step() + "): above the acceptance number " + PlanWording.acceptance(point.acceptanceNumber())
                        + " and below the rejection number " + point.rejectionNumber());
                out.println("  plan " + plan.name() + " (fingerprint " + plan.shortFingerprint() + "), "
                        + PlanWording.brief(pending.plan()));
                out.println("  sample of " + sample.units() + " units from " + sample.file() + ", " + rowsOf(sample));
                out.println();
                out.println("  Next: " + what.replace("; ", ";\n        ") + ".");
                out.println("  Nothing was recorded.");
            }
        }
        out.flush();
    }

    private static String rowsOf(InspectionSample sample) {
        String rows = "rows " + sample.firstRow() + " to " + sample.lastRow();
        return sample.file().toString().toLowerCase(Locale.ROOT).endsWith(".csv") ? rows
                : "sheet '" + sample.sheet() + "' " + rows;
    }

    private static String where(InspectionSample sample, int row) {
        return sample.file().toString().toLowerCase(Locale.ROOT).endsWith(".csv") ? "row " + row
                : "sheet '" + sample.sheet() + "' row " + row;
    }

    /** Checks that the sheet records what the plan judges: its way of counting and its defect classes. */
    private void checkClasses(SavedPlan plan, InspectionSample sample) {
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

    static String lotLine(LotDetails lot) {
        List<String> parts = new ArrayList<>();
        if (lot.supplier() != null) {
            parts.add(lot.supplier());
        }
        if (lot.part() != null) {
            parts.add("part " + lot.part());
        }
        if (lot.lotSize() > 0) {
            parts.add(lot.lotSize() + " units");
        }
        if (lot.received() != null) {
            parts.add("received " + lot.received());
        }
        return "lot " + lot.lot() + (parts.isEmpty() ? "" : " (" + String.join(", ", parts) + ")");
    }

    private void printText(PrintWriter out, LotDecision decision) {
        Sentence sentence = decision.sentence();
        InspectionSample sample = decision.sample();
        if (decision.criticalFound()) {
            out.println("!! CRITICAL NONCONFORMITY FOUND " + "!".repeat(50));
            out.println("!! Quarantine this lot now. Follow the customer's requirements and local regulations for");
            out.println("!! critical nonconformities, whatever the verdict below says. Sampling cannot clear a lot");
            out.println("!! in which a critical nonconformity was found (" + where(sample, sample.firstCriticalRow())
                    + ").");
            out.println("!".repeat(83));
            out.println();
        }
        out.println((sentence.accepted() ? "ACCEPT " : "REJECT ") + lotLine(decision.lot()));
        out.println("  " + SentenceText.reason(decision));
        if (decision.measured() != null) {
            out.println("  plan " + decision.plan().name() + " (fingerprint " + decision.plan().shortFingerprint()
                    + "), variables plan " + PlanWording.brief(decision.plan().plan()));
            out.println("  " + VariablesDesign.describe(decision.plan().measurement()));
        } else {
            out.println("  plan " + decision.plan().name() + " (fingerprint " + decision.plan().shortFingerprint()
                    + "), " + DesignCommand.modelLine(decision.plan().model(), decision.lot().lotSize()));
        }
        if (decision.measured() == null && !(decision.plan().classes().get(0).plan() instanceof SinglePlan)) {
            out.println("  " + decision.plan().plan().scheme() + " plan: " + PlanWording.brief(decision.plan().plan()));
        }
        out.println("  sample of " + sample.units() + " units from " + sample.file() + ", " + rowsOf(sample));
        out.println();
        if (decision.measured() != null) {
            out.println("  Evidence (exact)");
            for (String line : SentenceText.measuredLines(decision)) {
                out.println("    " + line);
            }
            for (String notice : decision.notices()) {
                out.println();
                out.println((decision.measured().warnings().contains(notice) ? "  WARNING: " : "  Note: ") + notice
                        + ".");
            }
            out.println();
            out.println("  decided " + decision.decidedAt() + " by lotgate " + decision.toolVersion() + "; sheet sha256 "
                    + decision.sheetSha256());
            printWritten(out);
            return;
        }
        String what = decision.countsUnits() ? "nonconforming units" : "nonconformities";
        boolean staged = sentence.classes().stream().anyMatch(v -> !(v.plan() instanceof SinglePlan));
        String row = staged ? "  %-9s %10s %7s %13s %10s  %-8s %s%n" : "  %-9s %10s %7s %13s %10s  %s%n";
        out.printf(row, "class", "inspected", "found", "accept up to", "reject at", "verdict", "decided at");
        for (ClassVerdict verdict : sentence.classes()) {
            out.printf(row, verdict.defectClass().label(), verdict.inspected(), verdict.found(),
                    PlanWording.acceptance(verdict.acceptanceNumber()), verdict.rejectionNumber(),
                    verdict.accepted() ? "accept" : "REJECT", verdict.step());
        }
        out.println("  (found: " + what + ")");
        out.println();
        out.println("  Evidence (exact)");
        for (String line : SentenceText.evidenceLines(decision)) {
            out.println("    " + line);
        }
        for (String notice : decision.notices()) {
            out.println();
            out.println("  Note: " + notice + ".");
        }
        out.println();
        out.println("  decided " + decision.decidedAt() + " by lotgate " + decision.toolVersion() + "; sheet sha256 "
                + decision.sheetSha256());
        printWritten(out);
    }

    private void printWritten(PrintWriter out) {
        if (record != null) {
            out.println("  record saved to " + record);
        }
        for (Path report : reports) {
            out.println("  report written to " + report);
        }
        if (chart != null) {
            out.println("  sampling chart written to " + chart);
        }
    }

    private static String csv(LotDecision decision) {
        List<List<Object>> rows = new ArrayList<>();
        for (ClassVerdict verdict : decision.sentence().classes()) {
            Evidence evidence = verdict.evidence();
            rows.add(List.of(decision.lot().lot(), verdict.defectClass().label(), verdict.inspected(), verdict.found(),
                    SentenceText.acceptanceCell(verdict), SentenceText.rejectionCell(verdict),
                    verdict.accepted() ? "accept" : "reject",
                    evidence.pValue(), evidence.lower(), evidence.upper(),
                    evidence.lotUpperBound() >= 0 ? evidence.lotUpperBound() : "", decision.sentence().verdict(),
                    decision.plan().fingerprint(), decision.sheetSha256()));
        }
        return CsvTable.table(List.of("lot", "class", "sampleSize", "found", "acceptanceNumber", "rejectionNumber",
                "classVerdict", "pValueAtAql", "lowerBound", "upperBound", "lotUpperBound", "verdict", "planFingerprint",
                "sheetSha256"), rows);
    }
}
