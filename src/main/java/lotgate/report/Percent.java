package lotgate.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/** Fractions shown as percent: quality levels as typed, probabilities with four significant digits. */
public final class Percent {
    private static final MathContext FOUR_DIGITS = new MathContext(4, RoundingMode.HALF_EVEN);

    private Percent() {
    }

    /** A quality level in its shortest exact form, such as 1%, 0.65% or 2.5%. */
    public static String level(double fraction) {
        return plain(new BigDecimal(Double.toString(fraction)).movePointRight(2)
                .round(new MathContext(10, RoundingMode.HALF_EVEN))) + "%";
    }

    /** A probability with four significant digits, such as 95.58%, 4.425% or 6.420e-06%. */
    public static String probability(double fraction) {
        if (fraction == 0) {
            return "0%";
        }
        double percent = fraction * 100;
        if (Math.abs(percent) < 0.001) {
            return String.format(java.util.Locale.ROOT, "%.3e%%", percent);
        }
        BigDecimal rounded = new BigDecimal(percent).round(FOUR_DIGITS);
        return rounded.toPlainString() + "%";
    }

    /** A quality level read off a curve, to four significant digits. */
    public static String measured(double fraction) {
        return probability(fraction);
    }

    private static String plain(BigDecimal value) {
        BigDecimal stripped = value.stripTrailingZeros();
        return stripped.scale() < 0 ? stripped.setScale(0).toPlainString() : stripped.toPlainString();
    }
}
