package lotgate.tables;

import java.util.List;
import lotgate.sampling.Plan;

/**
 * A plan read from the attribute sampling tables, with the way it was found.
 *
 * @param letter        the sample size code letter for the lot size and inspection level (Table I)
 * @param usedLetter    the code letter whose plan applies after following the table's arrows
 * @param plan          the plan: single (n, Ac, Re) or double (per stage, numbers on the cumulative count)
 * @param scheme        the scheme of {@code plan}: single where a double table says to use the single plan
 * @param steps         each arrow followed or substitution made, in words (empty when the cell held a plan)
 * @param source        the table the plan comes from, with its edition
 * @param lotSize       the lot size asked about
 * @param hundredPercent whether the plan's sample reaches the lot size, so that every unit is inspected
 */
public record TableLookup(char letter, char usedLetter, Plan plan, TableScheme scheme, List<String> steps,
        String source, int lotSize, boolean hundredPercent) {

    public TableLookup {
        steps = List.copyOf(steps);
    }

    /** Whether an arrow moved the plan to another code letter. */
    public boolean arrowFollowed() {
        return usedLetter != letter;
    }
}
