package lotgate.sentencing;

import lotgate.sampling.Plan;

/**
 * A sample on which a double, multiple or sequential plan has not decided yet: inspect more units, then
 * sentence again with all of them on the sheet. Nothing is recorded for it.
 *
 * @param point     where the plan stands after the units recorded
 * @param nextTotal the units the sheet should hold at the next point where the plan may decide
 * @param cleanAcceptance for a sequential plan, the unit after which the lot is accepted if no further
 *                  nonconformity is found (0 for plans in stages)
 */
public record Pending(Plan plan, Stopping.Point point, int nextTotal, int cleanAcceptance) implements Outcome {
}
