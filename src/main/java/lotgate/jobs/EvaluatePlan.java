package lotgate.jobs;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lotgate.report.ChartCurve;
import lotgate.report.ChartFile;
import lotgate.report.Charts;
import lotgate.report.Percent;
import lotgate.report.PlanWording;
import lotgate.sampling.CurvePoint;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.OperatingCharacteristic;
import lotgate.sampling.RiskPoints;
import lotgate.sampling.SequentialPlan;
import lotgate.sampling.WaldSequential;

/** Evaluating a plan: its OC, AOQ, ATI and ASN curves over a range of quality, its key levels, and charts. */
public final class EvaluatePlan {

    /** The chart files to draw, each null when not wanted: all curves stacked, OC, AOQ, ATI, ASN. */
    public record ChartFiles(Path all, Path oc, Path aoq, Path ati, Path asn) {
        /** No charts. */
        public static final ChartFiles NONE = new ChartFiles(null, null, null, null, null);

        boolean any() {
            return all != null || oc != null || aoq != null || ati != null || asn != null;
        }
    }

    /**
     * A saved plan file (with a defect class, or null), or a plan given as n and c with a model name and lot size;
     * the AQL and LTPD to mark (null: the saved plan's), the highest quality (null: where P(accept) is 1%), the
     * number of steps, the charts, and whether a double plan's ASN is shown curtailed.
     */
    public record Request(Path planFile, String defectClass, Integer sampleSize, Integer acceptance, String model,
            Integer lotSize, Double aql, Double ltpd, Double upTo, int steps, ChartFiles charts, boolean curtailed) {
    }

    /**
     * The plan, its curve table, key levels, the AQL and LTPD marked (or null) with P(accept) there, Wald's
     * approximation for a saved sequential plan (or null), and whether the ASN is curtailed.
     */
    public record Result(PlanChoice choice, List<CurvePoint> table, KeyLevels keys, Double markAql, Double markLtpd,
            double acceptanceAtAql, double acceptanceAtLtpd, WaldSequential wald, boolean curtailed) {
        public Result {
            table = List.copyOf(table);
        }

        /** The ASN at a point of the table, curtailed when asked. */
        public double asn(CurvePoint point) {
            return curtailed ? ((DoublePlan) choice.plan()).curtailedAverageSampleNumber(choice.model(),
                    point.quality()) : point.asn();
        }
    }

    private EvaluatePlan() {
    }

    /** Chooses the plan, checks the request, computes the curves and key levels, and draws the charts asked for. */
    public static Result run(Request request) {
        PlanChoice choice = choose(request.planFile(), request.defectClass(), request.sampleSize(),
                request.acceptance(), request.model(), request.lotSize());
        ChartFiles charts = request.charts();
        String[] fields = {"chart", "ocChart", "aoqChart", "atiChart", "asnChart"};
        Path[] files = {charts.all(), charts.oc(), charts.aoq(), charts.ati(), charts.asn()};
        for (int i = 0; i < files.length; i++) {
            Checks.chartName(fields[i], files[i]);
        }
        if (request.curtailed() && !(choice.plan() instanceof DoublePlan)) {
            throw JobException.invalid("curtailed", "--curtailed is for double plans");
        }
        if (charts.ati() != null && choice.lotSize() == 0) {
            throw JobException.invalid("atiChart", "--ati-chart needs a lot size: add --lot-size N");
        }
        RiskPoints design = choice.designedFor();
        Double markAql = request.aql() != null ? request.aql() : design == null ? null : (Double) design.aql();
        Double markLtpd = request.ltpd() != null ? request.ltpd() : design == null ? null : (Double) design.ltpd();
        OperatingCharacteristic oc = new OperatingCharacteristic(choice.plan(), choice.model(), choice.lotSize());
        double range = request.upTo() != null ? request.upTo() : oc.suggestedRange(markLtpd == null ? 0 : markLtpd);
        Checks.curveTop(choice.model(), "--up-to", range);
        List<CurvePoint> table = oc.curve(range, request.steps());
        KeyLevels keys = KeyLevels.of(oc);
        if (charts.any()) {
            draw(charts, choice, oc, range, markAql, markLtpd, keys);
        }
        return new Result(choice, table, keys, markAql, markLtpd,
                markAql == null ? Double.NaN : oc.acceptance(choice.model().producerPoint(markAql)),
                markLtpd == null ? Double.NaN : oc.acceptance(choice.model().consumerPoint(markLtpd)),
                wald(choice), request.curtailed());
    }

    /** The plan file, or the plan given as n and c, checked against each other's options. */
    static PlanChoice choose(Path planFile, String defectClass, Integer sampleSize, Integer acceptance,
            String model, Integer lotSize) {
        if (planFile != null) {
            if (sampleSize != null || acceptance != null) {
                throw JobException.invalid("planFile", "give either a plan file or --sample-size and"
                        + " --acceptance, not both");
            }
            return PlanChoice.saved(planFile, defectClass, model, lotSize);
        }
        if (defectClass != null) {
            throw JobException.invalid("class", "--class chooses a defect class of a saved plan file");
        }
        if (sampleSize == null || acceptance == null) {
            throw JobException.invalid("planFile", "name a plan: a plan file, or --sample-size N and"
                    + " --acceptance C");
        }
        return PlanChoice.given(sampleSize, acceptance, model, lotSize);
    }

    /** The AQL and LTPD marks of an OC chart, with the risks the plan was designed for (or 5% and 10%). */
    public static List<Charts.RiskMark> marks(PlanChoice choice, Double markAql, Double markLtpd) {
        List<Charts.RiskMark> marks = new ArrayList<>();
        RiskPoints design = choice.designedFor();
        double alpha = design == null ? 0.05 : design.alpha();
        double beta = design == null ? 0.10 : design.beta();
        if (markAql != null) {
            marks.add(new Charts.RiskMark("AQL " + Percent.level(markAql) + ": asked P(accept) >= "
                    + Percent.level(1 - alpha), markAql, 1 - alpha));
        }
        if (markLtpd != null) {
            marks.add(new Charts.RiskMark("LTPD " + Percent.level(markLtpd) + ": asked P(accept) <= "
                    + Percent.level(beta), markLtpd, beta));
        }
        return marks;
    }

    private static void draw(ChartFiles charts, PlanChoice choice, OperatingCharacteristic oc, double range,
            Double markAql, Double markLtpd, KeyLevels keys) {
        boolean perUnit = !choice.model().countsUnits();
        ChartCurve curve = new ChartCurve(choice.title(), oc.curve(range, 400));
        List<Charts.RiskMark> marks = marks(choice, markAql, markLtpd);
        int fewest = PlanWording.fewestInspected(choice.plan());
        String subject = choice.title();
        String about = PlanWording.model(choice.plan(), choice.model(), choice.lotSize());
        if (charts.all() != null) {
            ChartFile.write(Charts.withSubtitle(Charts.all("OC, AOQ and ATI of " + subject, perUnit, curve, marks,
                    keys.aoql().limit(), keys.aoql().quality(), fewest, choice.lotSize()), about), charts.all(), 900,
                    choice.lotSize() > 0 ? 1100 : 850);
        }
        if (charts.oc() != null) {
            ChartFile.write(Charts.withSubtitle(Charts.oc("OC curve of " + subject, perUnit, List.of(curve), marks),
                    about), charts.oc(), 900, 600);
        }
        if (charts.aoq() != null) {
            ChartFile.write(Charts.withSubtitle(Charts.aoq("Average outgoing quality of " + subject, perUnit, curve,
                    keys.aoql().limit(), keys.aoql().quality()), about), charts.aoq(), 900, 600);
        }
        if (charts.ati() != null) {
            ChartFile.write(Charts.withSubtitle(Charts.ati("Average total inspection of " + subject, perUnit, curve,
                    fewest, choice.lotSize()), about), charts.ati(), 900, 600);
        }
        if (charts.asn() != null) {
            ChartFile.write(Charts.withSubtitle(Charts.asn("Average sample number of " + subject, perUnit,
                    List.of(curve)), about), charts.asn(), 900, 600);
        }
    }

    /** Wald's approximation for a saved sequential plan, or null. */
    private static WaldSequential wald(PlanChoice choice) {
        if (choice.plan() instanceof SequentialPlan sequential && choice.designedFor() != null) {
            return WaldSequential.fromLines(choice.designedFor().aql(), choice.designedFor().ltpd(),
                    !choice.model().countsUnits(), sequential.h1(), sequential.h2());
        }
        return null;
    }
}
