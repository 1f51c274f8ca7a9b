package lotgate.history;

/**
 * The rule for the names a record is filed under (lot, supplier, part, inspector): printable text
 * only, so that an id can neither forge a line of plain-text output nor drive a terminal; and the
 * escaping of free text (reasons, cell text) before it reaches plain-text output.
 */
public final class Identifiers {
    private Identifiers() {
    }

    /** Whether a character would act on a terminal or on the text's direction rather than be shown. */
    public static boolean isControl(int c) {
        return c < 0x20 || c == 0x7f || (c >= 0x80 && c <= 0x9f) // C0, DEL, C1
                || c == 0x061c || c == 0x200e || c == 0x200f // Arabic letter mark, left-to-right and right-to-left marks
                || (c >= 0x202a && c <= 0x202e) // bidi embeddings and overrides
                || (c >= 0x2066 && c <= 0x2069) // bidi isolates
                || c == 0x2028 || c == 0x2029; // line and paragraph separators
    }

    /**
     * Why an identifier is refused, or null when it is clean.
     *
     * @param field the field's name as the user knows it (e.g. "--lot", "supplier")
     */
    public static String problem(String field, String value) {
        if (value == null) {
            return null;
        }
        for (int i = 0; i < value.length(); ) {
            int c = value.codePointAt(i);
            if (isControl(c)) {
                return field + " '" + escape(value) + "' holds the control character " + String.format("U+%04X", c)
                        + " at position " + (value.codePointCount(0, i) + 1) + "; an id must be printable text";
            }
            i += Character.charCount(c);
        }
        return null;
    }

    /** Throws {@link IllegalArgumentException} with the problem's message when an identifier is not clean. */
    public static String require(String field, String value) {
        String problem = problem(field, value);
        if (problem != null) {
            throw new IllegalArgumentException(problem);
        }
        return value;
    }

    /** The text with every control character shown as an escape (\n, \t, \e, \\u202e...), for plain-text output. */
    public static String escape(String text) {
        if (text == null) {
            return null;
        }
        StringBuilder out = null;
        for (int i = 0; i < text.length(); ) {
            int c = text.codePointAt(i);
            int width = Character.charCount(c);
            if (isControl(c)) {
                if (out == null) {
                    out = new StringBuilder(text.length() + 8).append(text, 0, i);
                }
                switch (c) {
                    case '\n' -> out.append("\\n");
                    case '\r' -> out.append("\\r");
                    case '\t' -> out.append("\\t");
                    case 0x1b -> out.append("\\e");
                    default -> out.append(String.format("\\u%04x", c));
                }
            } else if (out != null) {
                out.appendCodePoint(c);
            }
            i += width;
        }
        return out == null ? text : out.toString();
    }
}
