package lotgate.report;

/** Counts in words, with the noun in the number it needs ("1 record", "3 records", "1 switch", "2 switches"). */
public final class Words {
    private Words() {
    }

    /** The count and the noun, whose plural adds an s. */
    public static String count(long n, String noun) {
        return count(n, noun, noun + "s");
    }

    public static String count(long n, String singular, String plural) {
        return n + " " + (n == 1 ? singular : plural);
    }
}
