package lotgate.inspection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.DateTimeException;
import java.time.LocalDate;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.NumericChars;
import net.jqwik.api.constraints.StringLength;
import net.jqwik.api.constraints.Chars;

/** Days written as text are read exactly as the JDK's ISO date parser (java.time.LocalDate.parse) reads them. */
class DaysProperties {
    @Property(tries = 2000)
    void aDayInRangeReadsAsTheIsoParserReadsIt(@ForAll @IntRange(min = 0, max = 109_572) int offset) {
        LocalDate expected = Days.FIRST.plusDays(offset);
        assertEquals(expected, Days.of(Cell.text(0, expected.toString()), "received"));
        assertEquals(expected, Days.of(Cell.text(0, " " + expected + " "), "received"));
    }

    @Property(tries = 2000)
    void anyTenCharacterTextIsRefusedOrReadAsTheIsoParserDoes(
            @ForAll @StringLength(10) @NumericChars @Chars({'-', 'x'}) String text) {
        LocalDate byParser;
        try {
            byParser = LocalDate.parse(text);
        } catch (DateTimeException e) {
            byParser = null;
        }
        if (byParser == null || byParser.isBefore(Days.FIRST) || byParser.isAfter(Days.LAST)) {
            assertThrows(IllegalArgumentException.class, () -> Days.of(Cell.text(0, text), "received"), text);
        } else {
            assertEquals(byParser, Days.of(Cell.text(0, text), "received"), text);
        }
    }

    @Property(tries = 500)
    void anImpossibleDayGivesTheParsersRefusal(@ForAll @IntRange(min = 1900, max = 2199) int year,
            @ForAll @IntRange(min = 0, max = 99) int month, @ForAll @IntRange(min = 0, max = 99) int day) {
        String text = String.format("%04d-%02d-%02d", year, month, day);
        boolean valid;
        try {
            LocalDate.parse(text);
            valid = true;
        } catch (DateTimeException e) {
            valid = false;
        }
        if (!valid) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                    () -> Days.of(Cell.text(0, text), "received"));
            assertEquals("received '" + text + "' is not a date such as 2026-03-14", e.getMessage());
        }
    }
}
