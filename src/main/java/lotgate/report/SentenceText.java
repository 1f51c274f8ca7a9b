package lotgate.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.plan.ClassPlan;
import lotgate.sentencing.ClassVerdict;
import lotgate.sentencing.Evidence;
import lotgate.sentencing.LotDecision;
import lotgate.sentencing.MeasuredLot;
import lotgate.plan.Measurement;

/** The plain-language lines of a decision, the same on the terminal, in the workbook and on the page. */
public final class SentenceText {
    private SentenceText() {
    }

    /** "1 nonconforming unit", "3 nonconformities". */
    static String counted(LotDecision decision, long count) {
        String word = decision.countsUnits() ? (count == 1 ? "nonconforming unit" : "nonconforming units")
                : (count == 1 ? "nonconformity" : "nonconformities");
        return count + " " + word;
    }

    /** The "accept up to" cell of a verdict: the acceptance number, "none", or k for a variables plan. */
    public static String acceptanceCell(ClassVerdict verdict) {
        if (verdict.plan() instanceof lotgate.sampling.VariablesPlan variables) {
            return "k = " + number(variables.k());
        }
        return PlanWording.acceptance(verdict.acceptanceNumber());
    }

    /** The "reject at" cell of a verdict: the rejection number, or "below k" for a variables plan. */
    public static String rejectionCell(ClassVerdict verdict) {
        return verdict.rejectionNumber() >= 0 ? String.valueOf(verdict.rejectionNumber()) : "below k";
    }

    /** The bounds of a verdict's evidence as a cell: "a to b" for an interval, "at most b" for an upper bound. */
    public static String boundsCell(Evidence evidence) {
        return evidence.bounds().twoSided() ? percent(evidence.lower()) + " to " + percent(evidence.upper())
                : "at most " + percent(evidence.upper());
    }

    /** A measured value in at most six significant digits, as people write them. */
    public static String number(double value) {
        if (!Double.isFinite(value)) {
            return value > 0 ? "infinite" : value < 0 ? "minus infinite" : "none";
        }
        return new java.math.BigDecimal(value).round(new java.math.MathContext(6)).stripTrailingZeros()
                .toPlainString();
    }

    /** Why a lot judged on measurements got its verdict. */
    private static String measuredReason(LotDecision decision) {
        MeasuredLot measured = decision.measured();
        Measurement spec = decision.plan().measurement();
        String deviation = measured.sigmaKnown() ? "sigma" : "s";
        if (spec.limits().equals(Measurement.COMBINED)) {
            return "estimated fraction beyond the limits " + percent(measured.estimate()) + ", "
                    + (measured.accepted() ? "within" : "above") + " M = " + percent(measured.maxEstimate());
        }
        List<String> parts = new ArrayList<>();
        double lowerK = spec.lowerK(measured.k());
        boolean ownKs = lowerK != measured.k();
        if (!Double.isNaN(measured.statisticLower())) {
            parts.add("(mean - L)/" + deviation + " = " + number(measured.statisticLower())
                    + (ownKs ? " against k = " + number(lowerK) : ""));
        }
        if (!Double.isNaN(measured.statisticUpper())) {
            parts.add("(U - mean)/" + deviation + " = " + number(measured.statisticUpper())
                    + (ownKs ? " against k = " + number(measured.k()) : ""));
        }
        String verdict;
        if (ownKs) {
            verdict = measured.accepted() ? ": each at least its k" : ": below its k at a limit";
        } else if (parts.size() == 2) {
            verdict = (measured.accepted() ? ", both at least k = " : ", not both at least k = ") + number(measured.k());
        } else {
            verdict = (measured.accepted() ? ", at least k = " : ", below k = ") + number(measured.k());
        }
        return String.join(", ", parts) + verdict;
    }

    /** What the measurements say, line by line, the same on the terminal and in the reports. */
    public static List<String> measuredLines(LotDecision decision) {
        MeasuredLot measured = decision.measured();
        Measurement spec = decision.plan().measurement();
        String unit = spec.unit().isEmpty() ? "" : " " + spec.unit();
        String level = percent(decision.confidence());
        List<String> lines = new ArrayList<>();
        lines.add("mean " + number(measured.mean()) + unit + ", " + (measured.sigmaKnown() ? "sigma " + number(
                measured.deviation()) + unit + " (known)" : "s " + number(measured.deviation()) + unit) + ", n = "
                + measured.n() + ", " + measured.distinct() + " distinct values");
        List<String> statistics = new ArrayList<>();
        String deviation = measured.sigmaKnown() ? "sigma" : "s";
        if (spec.lower() != null) {
            statistics.add("(mean - L)/" + deviation + " = " + number(measured.statisticLower()) + " with L = "
                    + number(spec.lower()) + unit);
        }
        if (spec.upper() != null) {
            statistics.add("(U - mean)/" + deviation + " = " + number(measured.statisticUpper()) + " with U = "
                    + number(spec.upper()) + unit);
        }
        lines.add(String.join("; ", statistics) + "; k = " + number(measured.k())
                + (spec.lowerDesign() != null ? " (upper), " + number(spec.lowerDesign().k()) + " (lower)" : "")
                + (spec.limits().equals(Measurement.COMBINED) ? ", M = " + percent(measured.maxEstimate()) : ""));
        lines.add("estimated fraction beyond the limit" + (spec.twoLimits() ? "s" : "") + ": " + percent(measured
                .estimate()) + " (minimum variance unbiased estimate under normality); at most " + percent(measured
                .upperBound()) + " (" + level + " one-sided upper bound, exact, "
                + decision.sentence().classes().get(0).evidence().bounds().label() + (spec.twoLimits()
                ? ", summed over both limits" : "") + ")");
        ClassVerdict verdict = decision.sentence().classes().get(0);
        lines.add("on the OC curve: a lot at the estimate is accepted " + percent(verdict.evidence()
                .acceptanceAtObserved()) + " of the time; at the AQL " + percent(verdict.evidence().acceptanceAtAql())
                + ", at the LTPD " + percent(verdict.evidence().acceptanceAtLtpd()));
        lines.add("p-value against the AQL " + Percent.level(decision.plan().designedFor().aql()) + ": " + percent(verdict
                .evidence().pValue()) + " (the chance that a lot at the AQL gives a statistic this low or lower, at the"
                + " nearer limit)");
        if (measured.normality() != null) {
            lines.add(String.format(Locale.ROOT, "normality (Anderson-Darling, mean and sigma estimated): A* = %.3f,"
                    + " p = %.3g%s", measured.normality().modified(), measured.normality().pValue(),
                    measured.normality().pValue() < MeasuredLot.NORMALITY_LEVEL ? ": NOT NORMAL" : ": no evidence"
                            + " against normality"));
        }
        if (measured.outside().isEmpty()) {
            lines.add("measurements outside the limits: none");
        } else {
            List<String> listed = new ArrayList<>();
            for (var unit1 : decision.sample().nonconforming()) {
                if (listed.size() == 10) {
                    break;
                }
                listed.add("row " + unit1.row() + (unit1.unit().isEmpty() ? "" : " (" + unit1.unit() + ")") + ": "
                        + unit1.note() + unit);
            }
            lines.add("measurements outside the limits: " + measured.outside().size() + " (" + String.join(", ", listed)
                    + (measured.outside().size() > listed.size() ? ", ..." : "") + ")");
        }
        return lines;
    }

    /** Why the lot got its verdict, in one sentence. */
    public static String reason(LotDecision decision) {
        if (decision.measured() != null) {
            return measuredReason(decision);
        }
        List<String> rejected = new ArrayList<>();
        for (ClassVerdict verdict : decision.sentence().classes()) {
            if (!verdict.accepted()) {
                rejected.add((decision.plan().unclassified() ? "" : verdict.defectClass().label() + ": ")
                        + counted(decision, verdict.found()) + " found in " + verdict.inspected() + " units"
                        + where(verdict) + ", at or above the rejection number " + verdict.rejectionNumber());
            }
        }
        if (rejected.isEmpty() && decision.sentence().reinstatesNormal()) {
            List<String> between = new ArrayList<>();
            for (ClassVerdict verdict : decision.sentence().classes()) {
                if (verdict.reinstatesNormal()) {
                    between.add((decision.plan().unclassified() ? "" : verdict.defectClass().label() + ": ")
                            + counted(decision, verdict.found()) + " found in " + verdict.inspected() + " units, above"
                            + " the acceptance number " + verdict.acceptanceNumber() + " and below the rejection number "
                            + verdict.rejectionNumber());
                }
            }
            return String.join("; ", between) + ": the lot is accepted, and normal inspection is reinstated for the"
                    + " next lot";
        }
        if (rejected.isEmpty()) {
            return decision.plan().unclassified()
                    ? counted(decision, decision.sentence().classes().get(0).found()) + " found in "
                            + decision.sentence().classes().get(0).inspected() + " units"
                            + where(decision.sentence().classes().get(0)) + ", within the acceptance number "
                            + decision.sentence().classes().get(0).acceptanceNumber()
                    : "every defect class is within its acceptance number";
        }
        return String.join("; ", rejected);
    }

    /** Where a plan in stages or a sequential plan stopped, as " (second sample)"; nothing for a single plan. */
    static String where(ClassVerdict verdict) {
        return verdict.plan() instanceof lotgate.sampling.SinglePlan ? "" : " (decided at " + verdict.step() + ")";
    }

    /** A fraction as percent with four significant digits, as {@link Percent#probability} prints it everywhere. */
    public static String percent(double fraction) {
        return Percent.probability(fraction);
    }

    /** The evidence per class: count, p-value, interval, lot bound, position on the OC curve. */
    public static List<String> evidenceLines(LotDecision decision) {
        if (decision.measured() != null) {
            return measuredLines(decision);
        }
        List<String> lines = new ArrayList<>();
        String perUnit = decision.countsUnits() ? "" : " per unit";
        String level = percent(decision.confidence());
        for (ClassVerdict verdict : decision.sentence().classes()) {
            Evidence evidence = verdict.evidence();
            ClassPlan criteria = decision.plan().criteria(verdict.defectClass());
            lines.add(verdict.defectClass().label() + ": " + counted(decision, verdict.found()) + " in " + verdict.inspected()
                    + " units (" + percent(evidence.observed()) + perUnit + ")");
            boolean fixed = verdict.plan() instanceof lotgate.sampling.SinglePlan;
            lines.add("  p-value against the AQL " + Percent.level(criteria.designedFor().aql()) + perUnit + ": "
                    + percent(evidence.pValue()) + " (the chance of finding " + verdict.found()
                    + " or more in " + verdict.inspected() + " units of a lot at the AQL)");
            if (!fixed) {
                lines.add("  (the p-value and the interval treat the units inspected as one fixed sample; they do not"
                        + " allow for the plan's stopping rule)");
            }
            lines.add("  " + (decision.countsUnits() ? "fraction nonconforming" : "nonconformities per unit")
                    + " between " + percent(evidence.lower()) + " and " + percent(evidence.upper()) + " ("
                    + evidence.bounds().label() + ", " + level + " confidence)");
            if (evidence.lotUpperBound() >= 0) {
                lines.add("  nonconforming units in the lot: at most " + evidence.lotUpperBound() + " of "
                        + decision.lot().lotSize() + " (" + level + " one-sided upper bound)");
            }
            lines.add("  on the OC curve: a lot at " + percent(evidence.observed()) + perUnit + " is accepted "
                    + percent(evidence.acceptanceAtObserved()) + " of the time; at the AQL "
                    + percent(evidence.acceptanceAtAql()) + ", at the LTPD " + percent(evidence.acceptanceAtLtpd()));
        }
        return lines;
    }
}
