package lotgate.history;

/**
 * The numbers of the switching rules between normal, tightened and reduced inspection, as a site
 * chooses them. The two editions below follow the attribute-sampling standards (from memory):
 *
 * <ul>
 * <li>{@link #CURRENT}: ISO 2859-1:1999 and ANSI/ASQ Z1.4-2003 — normal to tightened when 2 of 5 or
 * fewer consecutive lots are not accepted on original inspection; tightened to normal after 5
 * consecutive lots accepted; normal to reduced after 10 consecutive lots accepted with steady
 * production (those editions add a switching score, which lotgate does not compute: a site that
 * uses it sets {@code reduceDefectiveLimit} instead or leaves reduced inspection to its authority);
 * reduced to normal on a lot not accepted or irregular production; discontinue when 5 lots are not
 * accepted, cumulatively, while on tightened inspection.
 * <li>{@link #OLDER}: MIL-STD-105D (1963) — the same, except that the move to reduced also asks that
 * the nonconforming units found in the 10 lots stay within a limit number (a table of the standard;
 * here a number the site sets), and that inspection is discontinued after 10 consecutive lots on
 * tightened inspection.
 * </ul>
 *
 * @param tightenRejected           lots not accepted that move normal to tightened...
 * @param tightenWithin             ...among this many consecutive lots
 * @param normalAfterAccepted       consecutive accepted lots that move tightened back to normal
 * @param reduceAfterAccepted       consecutive accepted lots on normal that allow reduced inspection
 * @param reduceDefectiveLimit      the most nonconforming units in those lots, or -1 for no limit
 * @param discontinueRejected       lots not accepted, cumulatively, on tightened that discontinue
 *                                  inspection, or -1 for none
 * @param discontinueLotsOnTightened consecutive lots on tightened that discontinue inspection, or -1
 */
public record SwitchingRules(String edition, int tightenRejected, int tightenWithin, int normalAfterAccepted,
        int reduceAfterAccepted, int reduceDefectiveLimit, int discontinueRejected, int discontinueLotsOnTightened) {

    public static final SwitchingRules CURRENT = new SwitchingRules("current", 2, 5, 5, 10, -1, 5, -1);
    public static final SwitchingRules OLDER = new SwitchingRules("older", 2, 5, 5, 10, -1, -1, 10);

    public SwitchingRules {
        if (tightenRejected < 1 || tightenWithin < tightenRejected || normalAfterAccepted < 1
                || reduceAfterAccepted < 1) {
            throw new IllegalArgumentException("switching rules need tightenRejected >= 1, tightenWithin >="
                    + " tightenRejected, normalAfterAccepted >= 1 and reduceAfterAccepted >= 1");
        }
        if (discontinueRejected < 1 && discontinueLotsOnTightened < 1) {
            throw new IllegalArgumentException("switching rules need a discontinuation rule: discontinueRejected or"
                    + " discontinueLotsOnTightened");
        }
    }

    /** The rules a plan family names: an edition, with any of its numbers replaced by the site's. */
    /** The rules in words, one per line, as a quality engineer reads them. */
    public java.util.List<String> describe() {
        java.util.List<String> lines = new java.util.ArrayList<>();
        lines.add(edition + " rules");
        lines.add("normal to tightened: " + tightenRejected + " of " + tightenWithin
                + " consecutive lots not accepted");
        lines.add("tightened to normal: " + normalAfterAccepted + " consecutive lots accepted");
        lines.add("normal to reduced: " + reduceAfterAccepted + " consecutive lots accepted"
                + (reduceDefectiveLimit < 0 ? "" : ", with at most " + reduceDefectiveLimit
                        + " nonconforming units found in them") + ", and steady production");
        lines.add("reduced to normal: a lot not accepted, or production irregular");
        if (discontinueRejected >= 0) {
            lines.add("inspection discontinued: " + discontinueRejected
                    + " lots not accepted while on tightened inspection");
        }
        if (discontinueLotsOnTightened >= 0) {
            lines.add("inspection discontinued: " + discontinueLotsOnTightened
                    + " consecutive lots on tightened inspection");
        }
        return lines;
    }

    public static SwitchingRules fromJson(com.fasterxml.jackson.databind.JsonNode node) {
        if (node == null || node.isNull() || node.isMissingNode()) {
            return CURRENT;
        }
        SwitchingRules base = edition(node.path("edition").asText("current").split(" ")[0]);
        return new SwitchingRules(node.path("edition").asText(base.edition()),
                node.path("tightenRejected").asInt(base.tightenRejected()),
                node.path("tightenWithin").asInt(base.tightenWithin()),
                node.path("normalAfterAccepted").asInt(base.normalAfterAccepted()),
                node.path("reduceAfterAccepted").asInt(base.reduceAfterAccepted()),
                node.path("reduceDefectiveLimit").asInt(base.reduceDefectiveLimit()),
                node.path("discontinueRejected").asInt(base.discontinueRejected()),
                node.path("discontinueLotsOnTightened").asInt(base.discontinueLotsOnTightened()));
    }

    /** The rules as a plan family holds them. */
    public com.fasterxml.jackson.databind.node.ObjectNode toJson() {
        var node = com.fasterxml.jackson.databind.node.JsonNodeFactory.instance.objectNode();
        node.put("edition", edition);
        node.put("tightenRejected", tightenRejected);
        node.put("tightenWithin", tightenWithin);
        node.put("normalAfterAccepted", normalAfterAccepted);
        node.put("reduceAfterAccepted", reduceAfterAccepted);
        node.put("reduceDefectiveLimit", reduceDefectiveLimit);
        node.put("discontinueRejected", discontinueRejected);
        node.put("discontinueLotsOnTightened", discontinueLotsOnTightened);
        return node;
    }

    public static SwitchingRules edition(String name) {
        return switch (name) {
            case "current" -> CURRENT;
            case "older" -> OLDER;
            default -> throw new IllegalArgumentException("unknown switching edition '" + name + "'; use current or older");
        };
    }
}
