package lotgate.jobs;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import lotgate.sampling.Stage;

/**
 * The values a quality engineer types, read the same way by every face (command options, workbench
 * fields): quality levels and risks as "1%", "0.5%" or a fraction such as "0.01", and whole numbers.
 * A value that cannot be read is refused with an IllegalArgumentException whose message the face shows
 * after the option or field it came from.
 */
public final class TypedValues {
    private TypedValues() {
    }

    /** The smallest quality level, risk or confidence level taken: 0.0001%. */
    public static final BigDecimal SMALLEST = new BigDecimal("0.000001");

    /** A fraction from "1%" or "0.01", at least 0.0001%; a bare value of 1 or more is refused with a hint. */
    public static double fraction(String text) {
        String trimmed = text.trim();
        boolean percent = trimmed.endsWith("%");
        String number = percent ? trimmed.substring(0, trimmed.length() - 1).trim() : trimmed;
        BigDecimal value;
        try {
            value = new BigDecimal(number);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + text + "' is not a number; write a percent such as 1% or a"
                    + " fraction such as 0.01");
        }
        if (percent) {
            value = value.movePointLeft(2);
        } else if (value.compareTo(BigDecimal.ONE) >= 0) {
            throw new IllegalArgumentException("'" + text + "' is not a fraction below 1; did you mean "
                    + value.stripTrailingZeros().toPlainString() + "%?");
        }
        if (value.signum() <= 0) {
            throw new IllegalArgumentException("'" + text + "' must be above 0");
        }
        if (value.compareTo(SMALLEST) < 0) {
            throw new IllegalArgumentException("'" + text + "' is below 0.0001%, the smallest level lotgate takes");
        }
        return value.doubleValue();
    }

    /** A risk (alpha, beta, a confidence level): a fraction from 0.0001% to 99.9999%. */
    public static double risk(String text) {
        double value = fraction(text);
        if (value >= 1) {
            throw new IllegalArgumentException("'" + text + "' is not a risk; give a value between 0% and 100%,"
                    + " such as 5%");
        }
        if (value > 0.999999) {
            throw new IllegalArgumentException("'" + text + "' is above 99.9999%, the largest risk or confidence"
                    + " lotgate takes");
        }
        return value;
    }

    /** A whole number of {@code least} or more (1 for sample and lot sizes, 0 for acceptance numbers). */
    public static int wholeNumber(String text, int least) {
        try {
            int value = Integer.parseInt(text.trim().replace("_", ""));
            if (value < least) {
                throw new IllegalArgumentException("'" + text + "' must be a whole number of " + least + " or more");
            }
            return value;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + text + "' is not a whole number from " + least + " to "
                    + Integer.MAX_VALUE);
        }
    }

    /** The most units a sequential plan may be truncated at: its exact lattice stays within memory. */
    public static final int MOST_TRUNCATION = 1_000_000;

    /** The truncation of a sequential plan: a whole number of units from 1 to {@link #MOST_TRUNCATION}. */
    public static int truncation(String text) {
        int value = wholeNumber(text, 1);
        if (value > MOST_TRUNCATION) {
            throw new IllegalArgumentException("'" + text + "' is more than " + MOST_TRUNCATION + " units");
        }
        return value;
    }

    /**
     * A double plan's second sample as a multiple of the first, 0.25 to 10, or null for 'free' (every second
     * sample size searched); the message names the option as the command line writes it.
     */
    public static Double secondRatio(String text) {
        String trimmed = text.trim();
        if (trimmed.equalsIgnoreCase("free")) {
            return null;
        }
        double ratio;
        try {
            ratio = Double.parseDouble(trimmed);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("--second-ratio " + text + ": give a number such as 1 or 2, or 'free'");
        }
        if (!(ratio >= 0.25 && ratio <= 10)) {
            throw new IllegalArgumentException("--second-ratio " + text + ": give a ratio from 0.25 to 10, or 'free'");
        }
        return ratio;
    }

    /** A measurement or limit in the characteristic's own unit: any finite number, such as 12.5 or -0.02. */
    public static double number(String text) {
        try {
            double value = Double.parseDouble(text.trim());
            if (Double.isFinite(value)) {
                return value;
            }
        } catch (NumberFormatException e) {
            // Falls through to the message below.
        }
        throw new IllegalArgumentException("'" + text + "' is not a number");
    }

    /**
     * The stages of a double or multiple plan, each written N:C:R (C may be - where the stage cannot accept; the
     * last may be N:C, its R then C + 1); the message names the stage as the command line writes it.
     */
    public static List<Stage> stages(List<String> specs) {
        List<Stage> stages = new ArrayList<>();
        for (int i = 0; i < specs.size(); i++) {
            String spec = specs.get(i);
            String[] parts = spec.split(":");
            boolean last = i == specs.size() - 1;
            if (parts.length != 3 && !(last && parts.length == 2)) {
                throw new IllegalArgumentException("--stage " + spec + ": write N:C:R, such as 50:1:4 (the last stage"
                        + " may be N:C)");
            }
            try {
                int n = Integer.parseInt(parts[0].trim());
                int c = parts[1].trim().equals("-") ? Stage.NO_ACCEPTANCE : Integer.parseInt(parts[1].trim());
                int r = parts.length == 3 ? Integer.parseInt(parts[2].trim()) : c + 1;
                stages.add(new Stage(n, c, r));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("--stage " + spec + ": N, C and R must be whole numbers (C may be"
                        + " - for none)");
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("--stage " + spec + ": " + e.getMessage());
            }
        }
        return stages;
    }

    /** The last row a spreadsheet has (xlsx). */
    public static final int LAST_SHEET_ROW = 1_048_576;

    /** A sheet row: a whole number from 1 to {@link #LAST_SHEET_ROW}. */
    public static int sheetRow(String text) {
        int value = wholeNumber(text, 1);
        if (value > LAST_SHEET_ROW) {
            throw new IllegalArgumentException("'" + text + "' is past the last row a sheet has, " + LAST_SHEET_ROW);
        }
        return value;
    }

    /** The first and last sheet row of a sample written FIRST-LAST (as in 2-126). */
    public static int[] rowRange(String text) {
        String[] parts = text.trim().split("-", -1);
        if (parts.length == 2) {
            try {
                int first = Integer.parseInt(parts[0].trim());
                int last = Integer.parseInt(parts[1].trim());
                if (first >= 1 && last >= first && last <= LAST_SHEET_ROW) {
                    return new int[] {first, last};
                }
            } catch (NumberFormatException e) {
                // Falls through to the message below.
            }
        }
        throw new IllegalArgumentException("give the first and last sheet row of the sample, as in 2-126 (rows 1 to "
                + LAST_SHEET_ROW + ", the first no later than the last)");
    }

    /** How a CSV sheet separates its values: comma, semicolon or tab (or the character itself). */
    public static char delimiter(String text) {
        return switch (text.trim().toLowerCase(java.util.Locale.ROOT)) {
            case "comma", "," -> ',';
            case "semicolon", ";" -> ';';
            case "tab", "\\t" -> '\t';
            default -> throw new IllegalArgumentException("give comma, semicolon or tab");
        };
    }

    /** A history record's sequence number: a whole number of 1 or more. */
    public static long sequenceNumber(String text) {
        try {
            long value = Long.parseLong(text.trim().replace("_", ""));
            if (value >= 1) {
                return value;
            }
        } catch (NumberFormatException e) {
            // Falls through to the message below.
        }
        throw new IllegalArgumentException("'" + text + "' is not a record's sequence number (a whole number of 1"
                + " or more, as the history lists it)");
    }
}
