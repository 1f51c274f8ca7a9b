package lotgate.sampling;

import java.util.List;

/**
 * A multiple-sampling plan of up to {@value #MOST_STAGES} stages, given stage by stage: after each stage the
 * cumulative count is held against that stage's acceptance and rejection numbers.
 */
public record MultiplePlan(List<Stage> stages) implements LatticePlan {
    /** The most stages a multiple plan may have (as in the multiple plans of ISO 2859-1:1999, common practice). */
    public static final int MOST_STAGES = 7;

    public MultiplePlan {
        stages = List.copyOf(stages);
        Stages.check(stages, MOST_STAGES);
    }

    @Override
    public String scheme() {
        return "multiple";
    }

    @Override
    public int maxSampleSize() {
        return Stages.total(stages);
    }

    @Override
    public Stages.Outcome walk(OcModel model, double quality, int lotSize) {
        return Stages.walk(stages, model, quality, lotSize);
    }
}
