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
        return run(request, range(request));
    }

    /** The curves up to a range the face chose, such as the widest of several plans drawn on one axis. */
    public static Result run(Request request, double upTo) {
        OperatingCharacteristic oc = oc(request);
        return new Result(oc.curve(upTo, request.steps()), upTo, KeyLevels.of(oc));
    }

    /** The range the curve command would choose for this plan: past its LTPD and its OC curve's fall. */
    public static double range(Request request) {
        return oc(request).suggestedRange(request.ltpd() == null ? 0 : request.ltpd());
    }

    private static OperatingCharacteristic oc(Request request) {
        return new OperatingCharacteristic(request.plan(), request.model(), request.lotSize());
    }
}
