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

    /** Below this (in percent) a probability prints as "< 0.0001%": no reader acts on its digits. */
    private static final double SMALLEST_SHOWN = 0.0001;

    /**
     * A probability with four significant digits, such as 95.58%, 95.20%, 4.425% or 0.0003917%; a whole value as
     * it is (95%); one below 0.0001% as "< 0.0001%". Every output prints probabilities and estimated fractions
     * this way.
     */
    public static String probability(double fraction) {
        if (fraction == 0) {
            return "0%";
        }
        double percent = fraction * 100;
        if (Math.abs(percent) < SMALLEST_SHOWN) {
            return (percent < 0 ? "> -" : "< ") + "0.0001%";
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
