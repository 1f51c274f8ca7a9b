package lotgate.history;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The switching rules of the attribute-sampling standards (ISO 2859-1:1999, ANSI/ASQ Z1.4-2003 and
 * MIL-STD-105D, all from memory) on lot sequences worked by hand.
 */
class SeverityTrackerTest {

    private static SeverityTracker.Switch feed(SeverityTracker tracker, String outcomes) {
        SeverityTracker.Switch last = null;
        for (int i = 0; i < outcomes.length(); i++) {
            SeverityTracker.Switch change = tracker.lot("L" + (i + 1), outcomes.charAt(i) == 'a', 0, true);
            if (change != null) {
                last = change;
            }
        }
        return last;
    }

    @Test
    void twoOfFiveConsecutiveLotsRejectedTightenInspection() {
        SeverityTracker tracker = new SeverityTracker(SwitchingRules.CURRENT);
        SeverityTracker.Switch change = feed(tracker, "aarar");
        assertEquals(Severity.TIGHTENED, tracker.severity());
        assertEquals("2 of the last 5 lots not accepted (L3, L5)", change.reason());
    }

    @Test
    void twoRejectedLotsFurtherApartThanFiveDoNotTighten() {
        SeverityTracker tracker = new SeverityTracker(SwitchingRules.CURRENT);
        feed(tracker, "raaaaar");
        assertEquals(Severity.NORMAL, tracker.severity());
    }

    @Test
    void fiveConsecutiveAcceptedLotsOnTightenedReturnToNormal() {
        SeverityTracker tracker = new SeverityTracker(SwitchingRules.CURRENT);
        feed(tracker, "rr");
        assertEquals(Severity.TIGHTENED, tracker.severity());
        feed(tracker, "aaaa");
        assertEquals(Severity.TIGHTENED, tracker.severity());
        SeverityTracker.Switch change = tracker.lot("L7", true, 0, true);
        assertEquals(Severity.NORMAL, change.to());
        assertEquals("5 consecutive lots accepted on tightened inspection", change.reason());
    }

    @Test
    void aLotAcceptedBetweenTheReducedPlansAcceptanceAndRejectionNumbersReinstatesNormal() {
        // ISO 2859-1 / MIL-STD-105E, reduced inspection (from memory): where the count exceeds Ac but not Re, the lot
        // is accepted and normal inspection reinstated.
        SeverityTracker tracker = new SeverityTracker(SwitchingRules.CURRENT);
        feed(tracker, "aaaaaaaaaa");
        assertEquals(Severity.REDUCED, tracker.severity());
        assertNull(tracker.lot("L11", true, false, 1, true), "a count within Ac keeps reduced inspection");
        SeverityTracker.Switch change = tracker.lot("L12", true, true, 2, true);
        assertEquals(Severity.NORMAL, change.to());
        assertEquals("lot L12 accepted on reduced inspection with a count between the acceptance and rejection"
                + " numbers", change.reason());
        assertNull(tracker.lot("L13", true, true, 2, true), "on normal inspection the mark changes nothing");
    }

    @Test
    void tenAcceptedLotsWithSteadyProductionEarnReducedInspection() {
        SeverityTracker tracker = new SeverityTracker(SwitchingRules.CURRENT);
        assertNull(feed(tracker, "aaaaaaaaa"));
        SeverityTracker.Switch change = tracker.lot("L10", true, 1, true);
        assertEquals(Severity.REDUCED, change.to());
        assertEquals(Severity.NORMAL, tracker.lot("L11", false, 4, true).to());
    }

    @Test
    void irregularProductionHoldsOffReducedAndEndsIt() {
        SeverityTracker tracker = new SeverityTracker(SwitchingRules.CURRENT);
        feed(tracker, "aaaaaaaaa");
        assertNull(tracker.lot("L10", true, 0, false));
        assertEquals(Severity.NORMAL, tracker.severity());
        assertEquals(Severity.REDUCED, tracker.lot("L11", true, 0, true).to());
        assertEquals("irregular production", tracker.lot("L12", true, 0, false).reason());
    }

    @Test
    void aLimitOnNonconformingUnitsFoundCanHoldOffReducedInspection() {
        SwitchingRules limited = new SwitchingRules("site", 2, 5, 5, 10, 3, 5, -1);
        SeverityTracker tracker = new SeverityTracker(limited);
        for (int i = 1; i <= 10; i++) {
            tracker.lot("L" + i, true, 1, true);
        }
        assertEquals(Severity.NORMAL, tracker.severity(), "10 found in the 10 lots exceeds the limit 3");
    }

    @Test
    void fiveLotsNotAcceptedOnTightenedDiscontinueInspectionUntilACorrectiveAction() {
        SeverityTracker tracker = new SeverityTracker(SwitchingRules.CURRENT);
        feed(tracker, "rr");
        SeverityTracker.Switch change = feed(tracker, "rarararar");
        assertEquals(Severity.DISCONTINUED, change.to());
        assertThrows(IllegalStateException.class, () -> tracker.lot("L10", true, 0, true));
        assertEquals(Severity.TIGHTENED, tracker.correctiveAction("new die, invented").to());
    }

    @Test
    void theOlderEditionDiscontinuesAfterTenLotsOnTightened() {
        SeverityTracker tracker = new SeverityTracker(SwitchingRules.OLDER);
        feed(tracker, "rr");
        SeverityTracker.Switch change = feed(tracker, "aaaraaaara");
        assertEquals(Severity.DISCONTINUED, change.to());
        assertTrue(change.reason().startsWith("10 consecutive lots on tightened inspection"));
    }
}
