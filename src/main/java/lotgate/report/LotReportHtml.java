package lotgate.report;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import lotgate.files.AtomicWrite;
import lotgate.inspection.InspectedUnit;
import lotgate.inspection.InspectionSample;
import lotgate.inspection.LotDetails;
import lotgate.sentencing.ClassVerdict;
import lotgate.sentencing.Evidence;
import lotgate.sentencing.LotDecision;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

/**
 * The lot report as one self-contained HTML page (styles and the OC chart inline, as SVG) that prints
 * on one A4 page. Every piece of text from the sheet or the plan is escaped.
 */
final class LotReportHtml {
    /** Nonconforming units listed on the page; the counts cover all. */
    private static final int LISTED = 12;

    private LotReportHtml() {
    }

    static void write(LotDecision decision, HistoryPlace place, Path file) {
        AtomicWrite.writeString(file, page(decision, place));
    }

    static String escape(String text) {
        if (text == null) {
            return "(not given)";
        }
        StringBuilder out = new StringBuilder(text.length());
        for (char ch : text.toCharArray()) {
            switch (ch) {
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '&' -> out.append("&amp;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&#39;");
                default -> out.append(ch);
            }
        }
        return out.toString();
    }

    static String page(LotDecision decision) {
        return page(decision, null);
    }

    static String page(LotDecision decision, HistoryPlace place) {
        LotDetails lot = decision.lot();
        InspectionSample sample = decision.sample();
        boolean accepted = decision.sentence().accepted();
        StringBuilder html = new StringBuilder();
        html.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n<title>Lot ")
                .append(escape(lot.lot())).append(accepted ? " accepted" : " rejected").append("</title>\n<style>\n")
                .append("@page { size: A4; margin: 12mm; }\n")
                .append("body { font: 10pt/1.35 system-ui, sans-serif; color: #222; max-width: 190mm; margin: 0 auto; }\n")
                .append("h1 { font-size: 15pt; margin: 0 0 4pt; }\n")
                .append(".verdict { display: inline-block; padding: 3pt 10pt; color: #fff; font-weight: bold;")
                .append(" font-size: 13pt; border-radius: 3pt; background: ").append(accepted ? "#" + ChartStyle.hex(ChartStyle.ACCEPT) : "#" + ChartStyle.hex(ChartStyle.REJECT))
                .append("; }\n")
                .append(".alarm { border: 2pt solid #").append(ChartStyle.hex(ChartStyle.REJECT)).append("; color: #")
                .append(ChartStyle.hex(ChartStyle.REJECT)).append("; padding: 5pt; font-weight: bold; margin: 6pt 0; }\n")
                .append("table { border-collapse: collapse; margin: 4pt 0 8pt; }\n")
                .append("td, th { border-bottom: 1px solid #ccc; padding: 2pt 6pt; text-align: left; }\n")
                .append("th { background: #f0f0f0; } td.n { text-align: right; } td.id { white-space: nowrap; }\n")
                .append(".facts td:nth-child(odd) { font-weight: bold; }\n")
                .append("svg { width: 100%; height: auto; } .small { font-size: 8pt; color: #555; }\n")
                .append("pre { font: inherit; margin: 0; white-space: pre-wrap; }\n")
                .append("@media print { body { font-size: 8pt; } pre { font-size: 7.5pt; } svg { max-height: 60mm; } h1 { font-size: 12pt; } p { margin: 3pt 0; } table { margin: 2pt 0 5pt; } }\n")
                .append("</style></head><body>\n");
        html.append("<h1>Lot ").append(escape(lot.lot())).append(" <span class=\"verdict\">")
                .append(accepted ? "ACCEPT" : "REJECT").append("</span></h1>\n");
        html.append("<p>").append(escape(SentenceText.reason(decision))).append(".</p>\n");
        if (decision.criticalFound()) {
            html.append("<div class=\"alarm\">Critical nonconformity found (sheet row ").append(sample.firstCriticalRow())
                    .append("). Quarantine the lot and follow the customer's requirements and local regulations for"
                            + " critical nonconformities, whatever the verdict.</div>\n");
        }
        if (LotReport.normalityFailed(decision)) {
            html.append("<div class=\"alarm\">").append(escape(LotReport.normalityWarning(decision))).append("</div>\n");
        }
        html.append("<table class=\"facts\">\n");
        facts(html, "Supplier", lot.supplier(), "Plan", decision.plan().name() + " (" + (decision.measured() != null
                ? "variables plan, k-method, sigma " + (decision.measured().sigmaKnown() ? "known" : "unknown")
                : decision.plan().model().name() + " model") + ")");
        facts(html, "Part", lot.part(), "Sheet", sheetLine(sample));
        facts(html, "Lot size", lot.lotSize() > 0 ? Integer.toString(lot.lotSize()) : null, "Decided",
                decision.decidedAt() + " by lotgate " + decision.toolVersion());
        facts(html, "Received", lot.received() == null ? null : lot.received().toString(), "Inspector",
                lot.inspector());
        html.append("</table>\n<p class=\"small\">Plan fingerprint ").append(escape(decision.plan().fingerprint()))
                .append("<br>Sheet SHA-256 ").append(escape(decision.sheetSha256()))
                .append(place == null ? "" : "<br>History record " + escape(place.text()))
                .append("</p>\n");
        if (decision.measured() != null) {
            html.append("<table><tr><th>Criterion</th><th>Value</th><th>Held against</th><th>Outcome</th></tr>\n");
            for (LotReport.Criterion criterion : LotReport.criteria(decision)) {
                boolean bad = List.of("FAILS", "falls short", "above").contains(criterion.outcome());
                html.append("<tr><td>").append(escape(criterion.what())).append("</td><td class=\"n\">")
                        .append(escape(criterion.value())).append("</td><td>").append(escape(criterion.against()))
                        .append("</td><td>").append(bad ? "<b>" : "").append(escape(criterion.outcome()))
                        .append(bad ? "</b>" : "").append("</td></tr>\n");
            }
        } else {
        html.append("<table><tr><th>Class</th><th>Inspected</th><th>Found</th><th>Accept up to</th><th>Reject at</th>"
                    + "<th>Verdict</th><th>p-value at AQL</th><th>Interval</th></tr>\n");
            for (ClassVerdict verdict : decision.sentence().classes()) {
                Evidence evidence = verdict.evidence();
                html.append("<tr><td>").append(escape(verdict.defectClass().label())).append("</td><td class=\"n\">")
                        .append(verdict.inspected()).append("</td><td class=\"n\">").append(verdict.found())
                        .append("</td><td class=\"n\">").append(escape(SentenceText.acceptanceCell(verdict)))
                        .append("</td><td class=\"n\">").append(escape(SentenceText.rejectionCell(verdict)))
                        .append("</td><td>").append(verdict.accepted() ? "accept"
                                : "<b>reject</b>").append("</td><td class=\"n\">")
                        .append(SentenceText.percent(evidence.pValue())).append("</td><td>")
                        .append(escape(SentenceText.boundsCell(evidence)) + " (" + escape(evidence.bounds().label())
                                + ")").append("</td></tr>\n");
            }
        }
        html.append("</table>\n<pre>");
        for (String line : SentenceText.evidenceLines(decision)) {
            html.append(escape(line)).append('\n');
        }
        for (String notice : decision.notices()) {
            html.append(escape("Note: " + notice)).append('\n');
        }
        html.append("</pre>\n");
        // A small canvas keeps the chart's lettering large once the page scales it to print width.
        SVGGraphics2D svg = new SVGGraphics2D(660, 400);
        LotReport.ocChart(decision).draw(svg, new java.awt.Rectangle(0, 0, 660, 400));
        html.append(svg.getSVGElement(null, false, new ViewBox(0, 0, 660, 400), null, null)).append('\n');
        if (!sample.nonconforming().isEmpty()) {
            // Positions in the sample follow from the rows when the sample's rows hold one unit each.
            boolean marks = LotReport.subSamples(decision)
                    && sample.units() == sample.lastRow() - sample.firstRow() + 1;
            html.append("<table><tr><th>Row</th><th>Unit</th>").append(sample.passFail() ? ""
                    : "<th>Critical</th><th>Major</th><th>Minor</th>").append("<th>Defect</th><th>Note</th>")
                    .append(marks ? "<th>Not counted for</th>" : "").append("</tr>\n");
            int listed = 0;
            for (InspectedUnit unit : sample.nonconforming()) {
                if (listed++ == LISTED) {
                    break;
                }
                html.append("<tr><td class=\"n\">").append(unit.row()).append("</td><td class=\"id\">")
                        .append(escape(unit.unit()))
                        .append("</td>");
                if (!sample.passFail()) {
                    html.append("<td class=\"n\">").append(unit.critical()).append("</td><td class=\"n\">")
                            .append(unit.major()).append("</td><td class=\"n\">").append(unit.minor()).append("</td>");
                }
                html.append("<td>").append(escape(unit.defect())).append("</td><td>").append(escape(unit.note()))
                        .append("</td>");
                if (marks) {
                    List<String> without = LotReport.classesWithout(decision, unit.row() - sample.firstRow() + 1);
                    html.append("<td>").append(escape(String.join(", ", without))).append("</td>");
                }
                html.append("</tr>\n");
            }
            html.append("</table>\n");
            if (LotReport.subSamples(decision)) {
                html.append("<p class=\"small\">").append(escape(LotReport.sampleSizes(decision))).append("</p>\n");
            }
            if (sample.nonconformingTotal() > LISTED) {
                html.append("<p class=\"small\">").append(sample.nonconformingTotal() - LISTED)
                        .append(" more nonconforming units are in the workbook report and the sheet.</p>\n");
            }
        }
        if (!sample.defectTypes().isEmpty()) {
            html.append("<p class=\"small\">Defect types: ");
            Map<String, Integer> sorted = new TreeMap<>(sample.defectTypes());
            html.append(escape(String.join(", ", sorted.entrySet().stream()
                    .map(e -> e.getKey() + " " + e.getValue()).toList()))).append("</p>\n");
        }
        html.append("<p class=\"small\">Acceptance sampling controls the risks of this decision; it does not show that"
                + " the lot is free of nonconforming units.</p>\n</body></html>\n");
        return html.toString();
    }

    /** The sheet file, the sheet within it (workbooks only) and the sample's rows. */
    static String sheetLine(InspectionSample sample) {
        String file = sample.file().getFileName().toString();
        String within = file.equals(sample.sheet()) ? "" : ", sheet " + sample.sheet();
        return file + within + ", rows " + sample.firstRow() + " to " + sample.lastRow();
    }

    private static void facts(StringBuilder html, String key, String value, String otherKey, String otherValue) {
        html.append("<tr><td>").append(escape(key)).append("</td><td>").append(escape(value)).append("</td><td>")
                .append(escape(otherKey)).append("</td><td>").append(escape(otherValue)).append("</td></tr>\n");
    }
}
