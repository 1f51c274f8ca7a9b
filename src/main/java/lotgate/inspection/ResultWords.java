package lotgate.inspection;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * The words that record a unit as passed or failed, in a sheet's result column and at the inspection bench.
 * Case and surrounding spaces are ignored. The standard words are {@link #STANDARD_PASS} and
 * {@link #STANDARD_FAIL}; a site adds its own, as in "pass=GO,OK;fail=NOGO,SCRAP".
 */
public final class ResultWords {
    public static final List<String> STANDARD_PASS = List.of("pass", "p", "ok", "good");
    public static final List<String> STANDARD_FAIL = List.of("fail", "f", "nc", "ng", "bad");
    /** The site's own words, in the same form as --result-words; read by the command-line faces. */
    public static final String SITE_VARIABLE = "LOTGATE_RESULT_WORDS";

    private final Set<String> pass;
    private final Set<String> fail;

    private ResultWords(Set<String> pass, Set<String> fail) {
        this.pass = pass;
        this.fail = fail;
    }

    public static ResultWords standard() {
        return new ResultWords(new LinkedHashSet<>(STANDARD_PASS), new LinkedHashSet<>(STANDARD_FAIL));
    }

    /**
     * These words with a site's own added, as in "pass=GO,OK;fail=NOGO,SCRAP" (either part may be left out).
     *
     * @throws IllegalArgumentException naming the bad part
     */
    public ResultWords with(String mapping) {
        Set<String> morePass = new LinkedHashSet<>(pass);
        Set<String> moreFail = new LinkedHashSet<>(fail);
        for (String part : mapping.split(";")) {
            if (part.isBlank()) {
                continue;
            }
            int equals = part.indexOf('=');
            String side = equals < 0 ? "" : normal(part.substring(0, equals));
            if (!side.equals("pass") && !side.equals("fail")) {
                throw new IllegalArgumentException("'" + part.trim() + "' is not pass=WORD,WORD or fail=WORD,WORD, as"
                        + " in pass=GO,OK;fail=NOGO");
            }
            for (String word : part.substring(equals + 1).split(",")) {
                String normal = normal(word);
                if (normal.isEmpty()) {
                    continue;
                }
                Set<String> own = side.equals("pass") ? morePass : moreFail;
                Set<String> other = side.equals("pass") ? moreFail : morePass;
                if (other.contains(normal)) {
                    throw new IllegalArgumentException("'" + word.trim() + "' cannot mean " + side + ": it already"
                            + " means " + (side.equals("pass") ? "fail" : "pass"));
                }
                if (normal.length() > 40) {
                    throw new IllegalArgumentException("'" + word.trim() + "' is longer than 40 characters");
                }
                own.add(normal);
            }
        }
        return new ResultWords(morePass, moreFail);
    }

    /** True for a fail word, false for a pass word, null for any other text. */
    public Boolean failed(String text) {
        String normal = normal(text);
        if (fail.contains(normal)) {
            return true;
        }
        return pass.contains(normal) ? false : null;
    }

    /** The longest fail word that begins the text and is followed by a space, or null. */
    public String failPrefix(String text) {
        String normal = normal(text);
        String best = null;
        for (String word : fail) {
            if (normal.startsWith(word + " ") && (best == null || word.length() > best.length())) {
                best = word;
            }
        }
        return best;
    }

    /** For messages: "pass, p, ok, good (pass) or fail, f, nc, ng, bad (fail)". */
    public String accepted() {
        return String.join(", ", pass) + " (pass) or " + String.join(", ", fail) + " (fail)";
    }

    public List<String> passWords() {
        return new ArrayList<>(pass);
    }

    public List<String> failWords() {
        return new ArrayList<>(fail);
    }

    private static String normal(String text) {
        return text.trim().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
    }
}
