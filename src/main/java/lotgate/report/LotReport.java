package lotgate.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.sampling.OcModel;
import lotgate.sampling.OperatingCharacteristic;
import lotgate.sentencing.ClassVerdict;
import lotgate.sentencing.Evidence;
import lotgate.sentencing.LotDecision;
import org.jfree.chart.JFreeChart;

/** Writes a lot's report as an .xlsx workbook or a self-contained .html page, chosen by extension. */
public final class LotReport {
    private LotReport() {
    }

    public static boolean supported(Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        return name.endsWith(".xlsx") || name.endsWith(".html") || name.endsWith(".htm");
    }

    public static void write(LotDecision decision, Path file) {
        write(decision, null, file);
    }

    /** Writes the report of a recorded lot, which shows its place in the history store (null: not recorded). */
    public static void write(LotDecision decision, HistoryPlace place, Path file) {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".xlsx")) {
            LotReportXlsx.write(decision, place, file);
        } else if (name.endsWith(".html") || name.endsWith(".htm")) {
            LotReportHtml.write(decision, place, file);
        } else {
            throw new IllegalArgumentException("a lot report is .xlsx or .html: " + file);
        }
    }

    /** What the lot's OC chart shows, for the picture and for the workbook's native chart alike. */
    record OcView(String title, boolean perUnit, List<ChartCurve> curves, List<Charts.RiskMark> design,
            List<Charts.RiskMark> observed, String observedLabel) {
    }

    /** The OC curve of each class's plan, the design points with their risks, and where the lot's count puts it. */
    static OcView ocView(LotDecision decision) {
        OcModel model = decision.plan().model() instanceof OcModel.Hypergeometric && decision.lot().lotSize() > 0
                ? new OcModel.Hypergeometric(decision.lot().lotSize()) : decision.plan().model();
        int lotSize = model.lotSize();
        List<ChartCurve> curves = new ArrayList<>();
        List<Charts.RiskMark> marks = new ArrayList<>();
        double range = 0;
        for (ClassVerdict verdict : decision.sentence().classes()) {
            OperatingCharacteristic oc = new OperatingCharacteristic(verdict.plan(), model, lotSize);
            range = Math.max(range, Math.max(oc.suggestedRange(decision.plan().criteria(verdict.defectClass())
                    .designedFor().ltpd()), 1.2 * verdict.evidence().observed()));
        }
        range = Math.min(range, model.maxQuality());
        List<Charts.RiskMark> design = new ArrayList<>();
        boolean classified = !decision.plan().unclassified();
        boolean measured = decision.measured() != null;
        for (ClassVerdict verdict : decision.sentence().classes()) {
            OperatingCharacteristic oc = new OperatingCharacteristic(verdict.plan(), model, lotSize);
            String prefix = classified ? verdict.defectClass().label() + " " : "";
            curves.add(new ChartCurve((classified ? verdict.defectClass().label() + ": " : "")
                    + PlanWording.brief(verdict.plan()), oc.curve(range, 300)));
            Evidence evidence = verdict.evidence();
            lotgate.sampling.RiskPoints asked = decision.plan().criteria(verdict.defectClass()).designedFor();
            // With several classes the risks stay in the evidence lines: their labels would cover each other.
            design.add(new Charts.RiskMark(classified ? "" : "AQL " + SentenceText.percent(asked.aql())
                    + ": producer's risk " + SentenceText.percent(verdict.plan().rejection(model, asked.aql())),
                    asked.aql(), evidence.acceptanceAtAql()));
            design.add(new Charts.RiskMark(classified ? "" : "LTPD " + SentenceText.percent(asked.ltpd())
                    + ": consumer's risk " + SentenceText.percent(evidence.acceptanceAtLtpd()), asked.ltpd(),
                    evidence.acceptanceAtLtpd()));
            marks.add(new Charts.RiskMark(measured ? "this lot: estimate " + SentenceText.percent(evidence.observed())
                    : prefix + "this lot: " + verdict.found() + " in " + verdict.inspected() + " ("
                            + SentenceText.percent(evidence.observed()) + ")", evidence.observed(),
                    evidence.acceptanceAtObserved()));
        }
        String title = measured ? "OC curve and the lot's estimated quality" : "OC curve and the lot's observed quality";
        return new OcView(title, !model.countsUnits(), curves, design, marks,
                measured ? "This lot's estimated fraction beyond the limits" : "Observed in this lot's sample");
    }

    static JFreeChart ocChart(LotDecision decision) {
        OcView view = ocView(decision);
        JFreeChart chart = Charts.oc(view.title(), view.perUnit(), view.curves(), view.design(),
                "Design points and their risks", view.observed(), view.observedLabel());
        return Charts.withSubtitle(chart, "lot " + decision.lot().lot() + ", plan " + decision.plan().name());
    }

    /** A row of a variables lot's criteria: what is judged, its value, what it is held against, how it fares. */
    record Criterion(String what, String value, String against, String outcome) {
    }

    /** The variables criterion in the method's own words: mean, s, the quality statistics or M-method estimate. */
    static List<Criterion> criteria(LotDecision decision) {
        lotgate.sentencing.MeasuredLot measured = decision.measured();
        lotgate.plan.Measurement spec = decision.plan().measurement();
        String unit = spec.unit().isEmpty() ? "" : " " + spec.unit();
        String deviation = measured.sigmaKnown() ? "sigma" : "s";
        List<Criterion> rows = new ArrayList<>();
        rows.add(new Criterion("Sample mean (n = " + measured.n() + ")", SentenceText.number(measured.mean()) + unit,
                "", ""));
        rows.add(new Criterion(measured.sigmaKnown() ? "Known process sigma" : "Sample standard deviation s",
                SentenceText.number(measured.deviation()) + unit, "", ""));
        boolean combined = spec.limits().equals(lotgate.plan.Measurement.COMBINED);
        double lowerK = spec.lowerK(measured.k());
        if (!Double.isNaN(measured.statisticLower())) {
            rows.add(new Criterion("(mean - L) / " + deviation + ", L = " + SentenceText.number(spec.lower()) + unit,
                    SentenceText.number(measured.statisticLower()), combined ? "" : "at least k = "
                            + SentenceText.number(lowerK), combined ? "" : measured.statisticLower() >= lowerK
                                    ? "meets" : "falls short"));
        }
        if (!Double.isNaN(measured.statisticUpper())) {
            rows.add(new Criterion("(U - mean) / " + deviation + ", U = " + SentenceText.number(spec.upper()) + unit,
                    SentenceText.number(measured.statisticUpper()), combined ? "" : "at least k = "
                            + SentenceText.number(measured.k()), combined ? "" : measured.statisticUpper()
                                    >= measured.k() ? "meets" : "falls short"));
        }
        rows.add(new Criterion("Estimated fraction beyond the limit" + (spec.twoLimits() ? "s" : "")
                + (combined ? " (M-method)" : ""), SentenceText.percent(measured.estimate()), combined
                        ? "at most M = " + SentenceText.percent(measured.maxEstimate()) : "",
                combined ? (measured.accepted() ? "within" : "above") : ""));
        rows.add(new Criterion("Upper " + SentenceText.percent(decision.confidence()) + " bound on that fraction",
                SentenceText.percent(measured.upperBound()), "", ""));
        if (measured.normality() != null) {
            rows.add(new Criterion("Normality (Anderson-Darling)", String.format(Locale.ROOT, "p = %.3g",
                    measured.normality().pValue()), "p at least " + SentenceText.number(
                            lotgate.sentencing.MeasuredLot.NORMALITY_LEVEL), normalityFailed(decision)
                                    ? "FAILS" : "no evidence against"));
        }
        return rows;
    }

    /** Whether a variables lot's measurements fail the normality check its verdict rests on. */
    static boolean normalityFailed(LotDecision decision) {
        return decision.measured() != null && decision.measured().normality() != null
                && decision.measured().normality().pValue() < lotgate.sentencing.MeasuredLot.NORMALITY_LEVEL;
    }

    /** The warning a failed normality check puts in the verdict box. */
    static String normalityWarning(LotDecision decision) {
        return "Measurements not normal (Anderson-Darling p = " + String.format(Locale.ROOT, "%.3g",
                decision.measured().normality().pValue()) + "): the k-method's risks assume normal measurements, so"
                + " this verdict is not to be relied on alone. Inspect the sample by attributes or investigate the"
                + " process before releasing the lot.";
    }

    /**
     * The classes whose sample leaves out the unit at this position of the sample (1-based): a class judged on
     * fewer units than the sheet holds (a plan that stopped early, or a smaller sample for that class).
     */
    static List<String> classesWithout(LotDecision decision, int position) {
        List<String> without = new ArrayList<>();
        for (ClassVerdict verdict : decision.sentence().classes()) {
            if (position > verdict.inspected()) {
                without.add(verdict.defectClass().label());
            }
        }
        return without;
    }

    /** Each class's sample in words, for a report where classes were judged on different numbers of units. */
    static String sampleSizes(LotDecision decision) {
        List<String> parts = new ArrayList<>();
        for (ClassVerdict verdict : decision.sentence().classes()) {
            parts.add(verdict.defectClass().label() + " on the first " + verdict.inspected());
        }
        return "Each class was judged on its own sample (" + String.join(", ", parts) + " of the "
                + decision.sample().units() + " units on the sheet); a unit past a class's sample does not count for"
                + " that class.";
    }

    /** Whether some class was judged on fewer units than the sheet holds. */
    static boolean subSamples(LotDecision decision) {
        return decision.sentence().classes().stream().anyMatch(v -> v.inspected() < decision.sample().units());
    }

    /** Text that a spreadsheet or page would otherwise read as a formula is shown with a leading quote. */
    static boolean looksLikeFormula(String text) {
        return !text.isEmpty() && "=+-@\t\r".indexOf(text.charAt(0)) >= 0;
    }
}
