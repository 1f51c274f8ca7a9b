package lotgate.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.sampling.OcModel;
import lotgate.sampling.OperatingCharacteristic;
import lotgate.sentencing.ClassVerdict;
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
        for (ClassVerdict verdict : decision.sentence().classes()) {
            OperatingCharacteristic oc = new OperatingCharacteristic(verdict.plan(), model, lotSize);
            String label = (decision.plan().unclassified() ? "" : verdict.defectClass().label() + ": ")
                    + PlanWording.brief(verdict.plan());
            curves.add(new ChartCurve(label, oc.curve(range, 300)));
            marks.add(new Charts.RiskMark((decision.plan().unclassified() ? "" : verdict.defectClass().label() + " ")
                    + "found " + verdict.found() + " of " + verdict.inspected(), verdict.evidence().observed(),
                    verdict.evidence().acceptanceAtObserved()));
        }
        JFreeChart chart = Charts.oc("OC curve and the lot's observed quality", !model.countsUnits(), curves, marks,
                "Observed in this lot's sample");
        return Charts.withSubtitle(chart, "lot " + decision.lot().lot() + ", plan " + decision.plan().name());
    }

    /** Text that a spreadsheet or page would otherwise read as a formula is shown with a leading quote. */
    static boolean looksLikeFormula(String text) {
        return !text.isEmpty() && "=+-@\t\r".indexOf(text.charAt(0)) >= 0;
    }
}
