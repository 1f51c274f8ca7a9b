package lotgate.history;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * Finds a supplier or part as recorded from the name a person typed: the same name, or the one name that
 * differs only in case and spacing; else the closest recorded names, to suggest.
 */
public final class NameMatch {
    private NameMatch() {
    }

    /** The recorded name the given one stands for, or null when there is none or more than one. */
    public static String resolve(String given, Collection<String> recorded) {
        if (recorded.contains(given)) {
            return given;
        }
        String wanted = normal(given);
        List<String> same = recorded.stream().filter(name -> normal(name).equals(wanted)).distinct().toList();
        return same.size() == 1 ? same.get(0) : null;
    }

    /** Up to three recorded names closest to the given one (by edit distance, ignoring case), close ones only. */
    public static List<String> closest(String given, Collection<String> recorded) {
        String wanted = normal(given);
        List<String> candidates = new ArrayList<>();
        for (String name : recorded) {
            String normal = normal(name);
            int distance = distance(wanted, normal);
            if (distance <= Math.max(2, wanted.length() / 3) || normal.contains(wanted) || wanted.contains(normal)) {
                candidates.add(name);
            }
        }
        candidates.sort(Comparator.comparingInt((String name) -> distance(wanted, normal(name)))
                .thenComparing(Comparator.naturalOrder()));
        return candidates.stream().distinct().limit(3).toList();
    }

    /** For messages: "; did you mean 'A' or 'B'?", or "" when nothing is close. */
    public static String suggestion(String given, Collection<String> recorded) {
        List<String> closest = closest(given, recorded);
        if (closest.isEmpty()) {
            return "";
        }
        return "; did you mean " + String.join(" or ", closest.stream().map(n -> "'" + n + "'").toList()) + "?";
    }

    private static String normal(String name) {
        return name.trim().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
    }

    /**
     * The Levenshtein distance: the fewest inserted, deleted or changed characters that make one text the other;
     * texts longer than 200 characters are never close.
     */
    public static int distance(String a, String b) {
        if (a.length() > 200 || b.length() > 200) {
            return Integer.MAX_VALUE;
        }
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int change = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                current[j] = Math.min(Math.min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + change);
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }
}
