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
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".xlsx")) {
            LotReportXlsx.write(decision, file);
        } else if (name.endsWith(".html") || name.endsWith(".htm")) {
            LotReportHtml.write(decision, file);
        } else {
            throw new IllegalArgumentException("a lot report is .xlsx or .html: " + file);
        }
    }

    /** The OC curve of each class's plan with the point the observed count puts the lot at. */
    static JFreeChart ocChart(LotDecision decision) {
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
        JFreeChart chart = Charts.oc(title, !model.countsUnits(), curves, design, "Design points and their risks",
                marks, measured ? "This lot's estimated fraction beyond the limits" : "Observed in this lot's sample");
        return Charts.withSubtitle(chart, "lot " + decision.lot().lot() + ", plan " + decision.plan().name());
    }

    /** Text that a spreadsheet or page would otherwise read as a formula is shown with a leading quote. */
    static boolean looksLikeFormula(String text) {
        return !text.isEmpty() && "=+-@\t\r".indexOf(text.charAt(0)) >= 0;
    }
}
