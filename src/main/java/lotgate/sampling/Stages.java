package lotgate.sampling;

import java.util.List;

/**
 * The exact operating characteristics of a plan in stages, by a walk over the lattice of cumulative counts:
 * after each stage only the counts between its acceptance and rejection numbers go on, each carrying its
 * probability, and the next stage's count is drawn given what was drawn before (which matters only for a
 * finite lot). Acceptance and rejection are summed as separate tails, never one as one minus the other.
 */
final class Stages {
    private Stages() {
    }

    /** What a plan in stages does at one quality level. */
    record Outcome(double acceptance, double rejection, double averageSample, double outgoing,
            double inspectedWhenAccepted) {
    }

    /** Checks a list of stages: 1 to {@code most} stages, numbers that never fall, and a decisive last stage. */
    static void check(List<Stage> stages, int most) {
        if (stages.isEmpty() || stages.size() > most) {
            throw new IllegalArgumentException("a plan in stages has 1 to " + most + " stages, got " + stages.size());
        }
        long total = 0;
        for (int i = 0; i < stages.size(); i++) {
            Stage stage = stages.get(i);
            total += stage.n();
            boolean last = i == stages.size() - 1;
            if (last && !stage.decisive()) {
                throw new IllegalArgumentException("the last stage must decide every lot: its rejection number must be"
                        + " its acceptance number + 1 = " + (stage.c() + 1) + ", got " + stage.r());
            }
            if (last && stage.c() < 0) {
                throw new IllegalArgumentException("the last stage needs an acceptance number");
            }
            if (!last && stage.decisive()) {
                throw new IllegalArgumentException("stage " + (i + 1) + " decides every lot (r = c + 1), so the stages"
                        + " after it would never be used");
            }
            if (i > 0) {
                Stage before = stages.get(i - 1);
                if (stage.c() < before.c() || stage.r() < before.r()) {
                    throw new IllegalArgumentException("stage " + (i + 1) + "'s acceptance and rejection numbers must"
                            + " not fall below stage " + i + "'s");
                }
            }
        }
        if (total > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("the stages inspect more than " + Integer.MAX_VALUE + " units");
        }
    }

    static int total(List<Stage> stages) {
        return stages.stream().mapToInt(Stage::n).sum();
    }

    /**
     * Walks the lattice at one quality level.
     *
     * @param lotSize the lot size for AOQ, or 0 for the limit of a very large lot
     */
    static Outcome walk(List<Stage> stages, OcModel model, double quality, int lotSize) {
        LatticeWalk walk = new LatticeWalk(model, quality, lotSize, stages.get(stages.size() - 1).r());
        int drawn = 0;
        for (Stage stage : stages) {
            int n = stage.n();
            int after = drawn + n;
            double reaching = 0;
            for (int d = walk.low; d <= walk.high; d++) {
                double weight = walk.going[d];
                if (weight == 0) {
                    continue;
                }
                reaching += weight;
                double accepted = weight * model.atMostAfter(drawn, d, n, stage.c() - d, quality);
                walk.accept += accepted;
                walk.reject += weight * model.moreThanAfter(drawn, d, n, stage.r() - 1 - d, quality);
                walk.inspectedWhenAccepted += accepted * after;
                if (walk.lotDefectives >= 0) {
                    for (int x = 0; x <= stage.c() - d; x++) {
                        walk.outgoingOfLot(weight * model.exactlyAfter(drawn, d, n, x, quality), d + x);
                    }
                } else {
                    walk.outgoingOfProcess(accepted, after);
                }
                for (int total = Math.max(d, stage.c() + 1); total < stage.r(); total++) {
                    double p = model.exactlyAfter(drawn, d, n, total - d, quality);
                    if (p > 0) {
                        walk.carry(total, weight * p);
                    }
                }
            }
            walk.sample += reaching * n;
            walk.nextStage();
            drawn = after;
            if (!walk.undecided()) {
                break;
            }
        }
        return walk.outcome();
    }

    /** The average total inspection: accepted lots stop at their stage, rejected lots are inspected in full. */
    static double totalInspection(Outcome outcome, int lotSize) {
        return outcome.inspectedWhenAccepted() + outcome.rejection() * lotSize;
    }
}
