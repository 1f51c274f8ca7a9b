package lotgate.jobs;

import java.util.List;
import lotgate.sampling.CurvePoint;
import lotgate.sampling.OcModel;
import lotgate.sampling.OperatingCharacteristic;
import lotgate.sampling.Plan;

/**
 * The OC, AOQ, ATI and ASN curves of a plan of any kind just designed (saved or not), over the range the
 * curve command would choose, for a face that draws them itself.
 */
public final class PlanCurves {
    /** The plan, its model and lot size (0: none), and the LTPD the range must show (null: none). */
    public record Request(Plan plan, OcModel model, int lotSize, Double ltpd, int steps) {
    }

    /** The curve points from quality 0 up to the range, and the plan's key levels. */
    public record Result(List<CurvePoint> points, double upTo, KeyLevels keys) {
        public Result {
            points = List.copyOf(points);
        }
    }

    private PlanCurves() {
    }

    public static Result run(Request request) {
        OperatingCharacteristic oc = new OperatingCharacteristic(request.plan(), request.model(), request.lotSize());
        double upTo = oc.suggestedRange(request.ltpd() == null ? 0 : request.ltpd());
        return new Result(oc.curve(upTo, request.steps()), upTo, KeyLevels.of(oc));
    }
}
