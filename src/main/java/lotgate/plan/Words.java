package lotgate.plan;

import java.util.Locale;

/** The word for a constant of lotgate's enums in files, sheets and on screen: its name in lower case. */
public final class Words {
    private Words() {
    }

    /** The constant's word: critical, tightened, double. */
    public static String of(Enum<?> value) {
        return value.name().toLowerCase(Locale.ROOT);
    }

    /** The constant whose word is exactly this, or null. */
    public static <E extends Enum<E>> E named(E[] values, String word) {
        for (E value : values) {
            if (of(value).equals(word)) {
                return value;
            }
        }
        return null;
    }

    /** The constant found, or else an IllegalArgumentException with this message. */
    public static <E extends Enum<E>> E orRefused(E found, String message) {
        if (found == null) {
            throw new IllegalArgumentException(message);
        }
        return found;
    }

    /** The constant whose word this is, read with surrounding space and in any case, or null. */
    public static <E extends Enum<E>> E read(E[] values, String text) {
        return named(values, text.trim().toLowerCase(Locale.ROOT));
    }
}
