package lotgate.cli;

import lotgate.jobs.TypedValues;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.TypeConversionException;

/**
 * Parsing of the values a quality engineer types: quality levels and risks as "1%", "0.5%" or a
 * fraction such as "0.01", whole numbers, and sheet row ranges.
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

    /** The first and last sheet row of --rows FIRST-LAST, or {0, 0} when the option is not given. */
    static int[] rowRange(CommandSpec spec, String rows) {
        if (rows == null) {
            return new int[] {0, 0};
        }
        String[] parts = rows.trim().split("-", -1);
        try {
            int first = Integer.parseInt(parts[0].trim());
            int last = Integer.parseInt(parts[1].trim());
            if (parts.length == 2 && first >= 1 && last >= first && last <= 1_048_576) {
                return new int[] {first, last};
            }
        } catch (NumberFormatException | ArrayIndexOutOfBoundsException e) {
            // Falls through to the message below.
        }
        throw new ParameterException(spec.commandLine(), "--rows " + rows + ": give the first and last sheet row of"
                + " the sample, as in 2-126 (rows 1 to 1048576, the first no later than the last)");
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
            return atMost(text, 1_048_576, "is past the last row a sheet has, 1048576");
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
