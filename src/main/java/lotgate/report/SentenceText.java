package lotgate.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lotgate.plan.ClassPlan;
import lotgate.sentencing.ClassVerdict;
import lotgate.sentencing.Evidence;
import lotgate.sentencing.LotDecision;

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

    /** Why the lot got its verdict, in one sentence. */
    public static String reason(LotDecision decision) {
        List<String> rejected = new ArrayList<>();
        for (ClassVerdict verdict : decision.sentence().classes()) {
            if (!verdict.accepted()) {
                rejected.add((decision.plan().unclassified() ? "" : verdict.defectClass().label() + ": ")
                        + counted(decision, verdict.found()) + " found in " + verdict.inspected() + " units"
                        + where(verdict) + ", at or above the rejection number " + verdict.rejectionNumber());
            }
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

    /** A fraction as percent with four significant digits. */
    public static String percent(double fraction) {
        if (fraction == 0) {
            return "0%";
        }
        double value = fraction * 100;
        if (Math.abs(value) < 0.001) {
            return String.format(Locale.ROOT, "%.3e%%", value);
        }
        return new java.math.BigDecimal(value).round(new java.math.MathContext(4)).stripTrailingZeros()
                .toPlainString() + "%";
    }

    /** The evidence per class: count, p-value, interval, lot bound, position on the OC curve. */
    public static List<String> evidenceLines(LotDecision decision) {
        List<String> lines = new ArrayList<>();
        String perUnit = decision.countsUnits() ? "" : " per unit";
        String level = percent(decision.confidence());
        for (ClassVerdict verdict : decision.sentence().classes()) {
            Evidence evidence = verdict.evidence();
            ClassPlan criteria = decision.plan().criteria(verdict.defectClass());
            lines.add(verdict.defectClass().label() + ": " + counted(decision, verdict.found()) + " in " + verdict.inspected()
                    + " units (" + percent(evidence.observed()) + perUnit + ")");
            boolean fixed = verdict.plan() instanceof lotgate.sampling.SinglePlan;
            lines.add("  p-value against the AQL " + percent(criteria.designedFor().aql()) + perUnit + ": "
                    + percent(evidence.pValue()) + " (the chance of finding " + verdict.found()
                    + " or more in " + verdict.inspected() + " units of a lot at the AQL)");
            if (!fixed) {
                lines.add("  (the p-value and the interval treat the units inspected as one fixed sample; they do not"
                        + " allow for the plan's stopping rule)");
            }
            lines.add("  " + (decision.countsUnits() ? "fraction nonconforming" : "nonconformities per unit")
                    + " between " + percent(evidence.lower()) + " and " + percent(evidence.upper()) + " ("
                    + (decision.countsUnits() ? "Clopper-Pearson" : "Garwood") + ", " + level + " confidence)");
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
