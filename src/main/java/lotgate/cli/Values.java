package lotgate.cli;

import lotgate.jobs.TypedValues;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/**
 * Parsing of the values a quality engineer types: quality levels and risks as "1%", "0.5%" or a
 * fraction such as "0.01", whole numbers and sheet rows (each read by jobs.TypedValues).
 */
final class Values {
    private Values() {
    }

    /** The most steps a curve table takes. */
    static final int MAX_STEPS = 10_000;

    /** A value read by the parser every face shares; its refusal becomes picocli's, which names the option. */
    private static <T> T typed(java.util.function.Supplier<T> read) {
        try {
            return read.get();
        } catch (IllegalArgumentException e) {
            throw new TypeConversionException(e.getMessage());
        }
    }

    /** A fraction from "1%" or "0.01"; a bare value of 1 or more is refused with a hint. */
    static double fraction(String text) {
        return typed(() -> TypedValues.fraction(text));
    }

    /** Quality levels: fractions nonconforming, or nonconformities per unit for the Poisson model. */
    static final class Quality implements ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            return fraction(text);
        }
    }

    /** Risks alpha and beta: strictly between 0% and 100%. */
    static final class Risk implements ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            return typed(() -> TypedValues.risk(text));
        }
    }

    /** Calendar days written as 2026-03-14. */
    static final class Day implements ITypeConverter<java.time.LocalDate> {
        @Override
        public java.time.LocalDate convert(String text) {
            try {
                return java.time.LocalDate.parse(text.trim());
            } catch (java.time.format.DateTimeParseException e) {
                throw new TypeConversionException("'" + text + "' is not a date; write it as 2026-03-14");
            }
        }
    }

    /** Whole numbers of 1 or more (sample and lot sizes). */
    static final class Count implements ITypeConverter<Integer> {
        @Override
        public Integer convert(String text) {
            return wholeNumber(text, 1);
        }
    }

    /** A history record's sequence number: 1 or more. */
    static final class Sequence implements ITypeConverter<Long> {
        @Override
        public Long convert(String text) {
            return typed(() -> TypedValues.sequenceNumber(text));
        }
    }

    /** Whole numbers of 0 or more (acceptance numbers). */
    static final class Acceptance implements ITypeConverter<Integer> {
        @Override
        public Integer convert(String text) {
            return wholeNumber(text, 0);
        }
    }

    /** Steps of a curve table: 1 to {@link #MAX_STEPS}. */
    static final class Steps implements ITypeConverter<Integer> {
        @Override
        public Integer convert(String text) {
            return atMost(text, MAX_STEPS, "is more than " + MAX_STEPS + " steps");
        }
    }

    /** The truncation of a sequential plan: 1 to {@link TypedValues#MOST_TRUNCATION} units. */
    static final class Truncation implements ITypeConverter<Integer> {
        @Override
        public Integer convert(String text) {
            return typed(() -> TypedValues.truncation(text));
        }
    }

    /** Limits, measurements and constants in the characteristic's own unit: finite numbers. */
    static final class Measure implements ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            return typed(() -> TypedValues.number(text));
        }
    }

    /** Sheet rows: 1 to 1,048,576, the rows a spreadsheet has. */
    static final class SheetRow implements ITypeConverter<Integer> {
        @Override
        public Integer convert(String text) {
            return typed(() -> TypedValues.sheetRow(text));
        }
    }

    /** A whole number from 1 to {@code most}; above it, refused with the problem given. */
    private static int atMost(String text, int most, String problem) {
        int value = wholeNumber(text, 1);
        if (value > most) {
            throw new TypeConversionException("'" + text + "' " + problem);
        }
        return value;
    }

    private static int wholeNumber(String text, int least) {
        return typed(() -> TypedValues.wholeNumber(text, least));
    }
}
