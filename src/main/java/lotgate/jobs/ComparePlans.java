package lotgate.jobs;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lotgate.report.ChartCurve;
import lotgate.report.ChartFile;
import lotgate.report.Charts;
import lotgate.report.Percent;
import lotgate.sampling.OperatingCharacteristic;
import lotgate.sampling.RiskPoints;

/** Comparing plans side by side: their risks at the same AQL and LTPD, key levels, costs, and shared charts. */
public final class ComparePlans {

    /**
     * The plans as written (plan files, FILE.json#class, or n,c), the model and lot size for plans given as n,c
     * (each null: none named), the AQL and LTPD to compare at (null: the first saved plan's), and the OC and ASN
     * chart files (or null).
     */
    public record Request(List<String> plans, String model, Integer lotSize, Double aql, Double ltpd, Path chart,
            Path asnChart) {
        public Request {
            plans = List.copyOf(plans);
        }
    }

    /** One plan's figures: P(accept) and producer's risk at the AQL, P(accept) at the LTPD, key levels and ASNs. */
    public record Row(PlanChoice choice, double atAql, double producerRisk, double atLtpd, KeyLevels keys,
            double asnAtAql, double asnAtLtpd) {
    }

    /** The levels compared at and a row per plan, in the order given. */
    public record Result(double aql, double ltpd, List<Row> rows) {
        public Result {
            rows = List.copyOf(rows);
        }
    }

    private ComparePlans() {
    }

    /** Reads or builds each plan, computes its figures at the same levels, and draws the charts asked for. */
    public static Result run(Request request) {
        if (request.plans().size() < 2) {
            throw JobException.invalid("plans", "give two or more plans to compare (plans/*.json files or n,c),"
                    + " got only " + String.join("", request.plans()));
        }
        Checks.chartName("chart", request.chart());
        Checks.chartName("asnChart", request.asnChart());
        List<PlanChoice> choices = new ArrayList<>();
        for (String text : request.plans()) {
            choices.add(PlanChoice.parse(text, request.model(), request.lotSize()));
        }
        RiskPoints first = choices.stream().map(PlanChoice::designedFor).filter(p -> p != null).findFirst()
                .orElse(null);
        double atAql = request.aql() != null ? request.aql() : first != null ? first.aql() : Double.NaN;
        double atLtpd = request.ltpd() != null ? request.ltpd() : first != null ? first.ltpd() : Double.NaN;
        if (Double.isNaN(atAql) || Double.isNaN(atLtpd)) {
            throw JobException.invalid("aql", "give --aql and --ltpd to compare at (no saved plan"
                    + " among the plans supplies them)");
        }
        if (atAql >= atLtpd) {
            throw JobException.invalid("aql", "--aql " + Percent.level(atAql) + " must be below --ltpd "
                    + Percent.level(atLtpd));
        }
        List<Row> rows = new ArrayList<>();
        List<OperatingCharacteristic> curves = new ArrayList<>();
        for (PlanChoice choice : choices) {
            Checks.level(choice.model(), "--ltpd", atLtpd);
            OperatingCharacteristic oc = new OperatingCharacteristic(choice.plan(), choice.model(), choice.lotSize());
            double aqlPoint = choice.model().producerPoint(atAql);
            double ltpdPoint = choice.model().consumerPoint(atLtpd);
            curves.add(oc);
            rows.add(new Row(choice, oc.acceptance(aqlPoint), oc.rejection(aqlPoint), oc.acceptance(ltpdPoint),
                    KeyLevels.of(oc), oc.asn(aqlPoint), oc.asn(ltpdPoint)));
        }
        if (request.chart() != null || request.asnChart() != null) {
            draw(request, rows, curves, atAql, atLtpd);
        }
        return new Result(atAql, atLtpd, rows);
    }

    private static void draw(Request request, List<Row> rows, List<OperatingCharacteristic> ocs, double atAql,
            double atLtpd) {
        double range = 0;
        for (OperatingCharacteristic oc : ocs) {
            range = Math.max(range, oc.suggestedRange(atLtpd));
        }
        List<ChartCurve> curves = new ArrayList<>();
        for (int i = 0; i < rows.size(); i++) {
            PlanChoice choice = rows.get(i).choice();
            curves.add(new ChartCurve(choice.title() + ", " + choice.model().name(), ocs.get(i).curve(range, 400)));
        }
        boolean perUnit = rows.stream().allMatch(r -> !r.choice().model().countsUnits());
        if (request.chart() != null) {
            ChartFile.write(Charts.oc("OC curves compared", perUnit, curves,
                    EvaluatePlan.marks(rows.get(0).choice(), atAql, atLtpd)), request.chart(), 900, 600);
        }
        if (request.asnChart() != null) {
            ChartFile.write(Charts.asn("Average sample number compared", perUnit, curves), request.asnChart(), 900,
                    600);
        }
    }
}
