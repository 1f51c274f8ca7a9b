package lotgate.files;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.DateTimeException;
import java.time.Instant;
import java.time.LocalDate;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.Chars;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import net.jqwik.api.constraints.NumericChars;
import net.jqwik.api.constraints.StringLength;

/** The direct readers against the JDK's ISO parsers (java.time, Java 17), which they must match exactly. */
class IsoTextProperties {
    @Property(tries = 3000)
    void anInstantAsJavaWritesItReadsAsTheParserReadsIt(
            @ForAll @LongRange(min = -2_208_988_800L, max = 7_258_118_399L) long second,
            @ForAll @IntRange(min = 0, max = 999_999_999) int nanos, @ForAll @IntRange(min = 0, max = 3) int precision) {
        int kept = new int[] {0, 1_000_000, 1_000, 1}[precision];
        Instant instant = Instant.ofEpochSecond(second, kept == 0 ? 0 : nanos / kept * kept);
        String text = instant.toString();
        assertEquals(Instant.parse(text), IsoText.instant(text), text);
    }

    @Property(tries = 3000)
    void anyInstantLikeTextIsReadOrRefusedAsTheParserDoes(
            @ForAll @StringLength(min = 1, max = 11) @NumericChars @Chars({'.', ':', 'x'}) String tail,
            @ForAll @IntRange(min = 0, max = 40) int hour) {
        String text = "2026-03-14T" + String.format("%02d", hour) + ":" + tail + "Z";
        assertEquals(outcome(() -> Instant.parse(text)), outcome(() -> IsoText.instant(text)), text);
    }

    @Property(tries = 3000)
    void anyTenCharacterTextIsADayOrRefusedAsTheParserDoes(
            @ForAll @StringLength(10) @NumericChars @Chars({'-', '+'}) String text) {
        assertEquals(outcome(() -> LocalDate.parse(text)), outcome(() -> IsoText.day(text)), text);
    }

    private static Object outcome(java.util.function.Supplier<Object> reading) {
        try {
            return reading.get();
        } catch (DateTimeException e) {
            return "refused";
        }
    }
}
