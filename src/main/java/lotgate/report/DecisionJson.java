package lotgate.report;

import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Map;
import java.util.TreeMap;
import lotgate.inspection.InspectionSample;
import lotgate.inspection.LotDetails;
import lotgate.plan.DefectClass;
import lotgate.plan.PlanFormat;
import lotgate.sentencing.ClassVerdict;
import lotgate.sentencing.Evidence;
import lotgate.sentencing.LotDecision;
import lotgate.sentencing.MeasuredLot;

/**
 * The decision record, "lotgate-decision" version 2 (version 1 named the counts "sampleSize" and "found"; readers
 * take both): one JSON object with the verdict, the lot, the
 * plan (its fingerprint and its whole content), the sheet's SHA-256, the counts and the evidence.
 * {@code sentence --format json} prints it and {@code --record FILE} saves it.
 */
public final class DecisionJson {
    public static final String FORMAT = "lotgate-decision";
    public static final int VERSION = 2;

    private DecisionJson() {
    }

    /** A measured lot's statistics, the basis of the supplier report's mean and standard deviation charts. */
    private static ObjectNode measured(LotDecision decision) {
        MeasuredLot measured = decision.measured();
        ObjectNode node = JsonNodeFactory.instance.objectNode();
        node.put("n", measured.n());
        node.put("characteristic", decision.plan().measurement().characteristic());
        node.put("unit", decision.plan().measurement().unit());
        node.put("mean", measured.mean());
        node.put("standardDeviation", measured.deviation());
        node.put("sampleStandardDeviation", measured.sampleDeviation());
        node.put("sigmaKnown", measured.sigmaKnown());
        putNumber(node, "statisticLower", measured.statisticLower());
        putNumber(node, "statisticUpper", measured.statisticUpper());
        node.put("k", measured.k());
        node.put("estimate", measured.estimate());
        putNumber(node, "maxEstimate", measured.maxEstimate());
        node.put("upperBound", measured.upperBound());
        node.put("acceptanceAtEstimate", measured.acceptanceAtEstimate());
        if (measured.normality() != null) {
            ObjectNode normality = node.putObject("normality");
            normality.put("test", "Anderson-Darling");
            normality.put("statistic", measured.normality().statistic());
            normality.put("modified", measured.normality().modified());
            normality.put("pValue", measured.normality().pValue());
        }
        node.put("distinctValues", measured.distinct());
        node.put("outsideLimits", measured.outside().size());
        var warnings = node.putArray("warnings");
        measured.warnings().forEach(warnings::add);
        return node;
    }

    private static void putNumber(ObjectNode node, String field, double value) {
        if (Double.isFinite(value)) {
            node.put(field, value);
        } else {
            node.putNull(field);
        }
    }

    public static ObjectNode of(LotDecision decision) {
        ObjectNode root = JsonNodeFactory.instance.objectNode();
        root.put("format", FORMAT);
        root.put("formatVersion", VERSION);
        root.put("verdict", decision.sentence().verdict());
        root.put("decidedAt", decision.decidedAt().toString());
        ObjectNode tool = root.putObject("tool");
        tool.put("name", "lotgate");
        tool.put("version", decision.toolVersion());
        LotDetails lot = decision.lot();
        ObjectNode lotNode = root.putObject("lot");
        lotNode.put("lot", lot.lot());
        lotNode.put("supplier", lot.supplier());
        lotNode.put("part", lot.part());
        if (lot.lotSize() > 0) {
            lotNode.put("lotSize", lot.lotSize());
        } else {
            lotNode.putNull("lotSize");
        }
        lotNode.put("received", lot.received() == null ? null : lot.received().toString());
        lotNode.put("inspector", lot.inspector());
        ObjectNode plan = root.putObject("plan");
        plan.put("name", decision.plan().name());
        plan.put("file", decision.planFile().toString());
        plan.put("fingerprint", decision.plan().fingerprint());
        plan.set("content", PlanFormat.json(decision.plan()));
        InspectionSample sample = decision.sample();
        ObjectNode sheet = root.putObject("sheet");
        sheet.put("file", sample.file().toString());
        sheet.put("sha256", decision.sheetSha256());
        sheet.put("sheet", sample.sheet());
        sheet.put("headerRow", sample.headerRow());
        sheet.put("firstRow", sample.firstRow());
        sheet.put("lastRow", sample.lastRow());
        sheet.put("recording", decision.measured() != null ? "measurements" : sample.passFail() ? "pass-fail"
                : "class-counts");
        // One vocabulary with the history's records: "inspected" units, "nonconforming" found among them (records
        // written before it say "sampleSize" and "found", and are read under both names).
        root.put("unitsOnSheet", sample.units());
        root.put("counting", decision.measured() != null ? "units measured outside the limits"
                : decision.countsUnits() ? "nonconforming units" : "nonconformities");
        root.put("confidence", decision.confidence());
        var classes = root.putArray("classes");
        for (ClassVerdict verdict : decision.sentence().classes()) {
            ObjectNode entry = classes.addObject();
            entry.put("class", verdict.defectClass().label());
            entry.put("inspected", verdict.inspected());
            entry.put("nonconforming", verdict.found());
            entry.put("scheme", verdict.plan().scheme());
            entry.put("decidedAt", verdict.step());
            if (verdict.acceptanceNumber() >= 0) {
                entry.put("acceptanceNumber", verdict.acceptanceNumber());
            } else {
                entry.putNull("acceptanceNumber");
            }
            if (verdict.rejectionNumber() >= 0) {
                entry.put("rejectionNumber", verdict.rejectionNumber());
            } else {
                entry.putNull("rejectionNumber");
            }
            entry.put("verdict", verdict.accepted() ? "accept" : "reject");
            Evidence evidence = verdict.evidence();
            ObjectNode proof = entry.putObject("evidence");
            proof.put("observed", evidence.observed());
            proof.put("pValueAtAql", evidence.pValue());
            if (evidence.bounds().twoSided()) {
                proof.put("lowerBound", evidence.lower());
            } else {
                proof.putNull("lowerBound");
            }
            proof.put("upperBound", evidence.upper());
            proof.put("interval", evidence.bounds().label());
            proof.put("intervalSides", evidence.bounds().twoSided() ? "two-sided" : "one-sided upper");
            if (evidence.lotUpperBound() >= 0) {
                proof.put("lotUpperBound", evidence.lotUpperBound());
            }
            proof.put("acceptanceAtObserved", evidence.acceptanceAtObserved());
            proof.put("acceptanceAtAql", evidence.acceptanceAtAql());
            proof.put("acceptanceAtLtpd", evidence.acceptanceAtLtpd());
        }
        ObjectNode counts = root.putObject("counts");
        for (DefectClass defectClass : DefectClass.values()) {
            if (defectClass == DefectClass.ANY ? true : sample.classColumns().contains(defectClass)) {
                ObjectNode count = counts.putObject(defectClass.label());
                count.put("nonconformingUnits", sample.all().nonconformingUnits(defectClass));
                if (!sample.passFail()) {
                    count.put("nonconformities", sample.all().nonconformities(defectClass));
                }
            }
        }
        ObjectNode types = root.putObject("defectTypes");
        Map<String, Integer> sorted = new TreeMap<>(sample.defectTypes());
        sorted.forEach(types::put);
        if (decision.measured() != null) {
            root.set("measurement", measured(decision));
        }
        root.put("criticalFound", decision.criticalFound());
        if (decision.criticalFound()) {
            root.put("criticalNotice", decision.criticalNotice());
        }
        var notices = root.putArray("notices");
        decision.notices().forEach(notices::add);
        return root;
    }
}
