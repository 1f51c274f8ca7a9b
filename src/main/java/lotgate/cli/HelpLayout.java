package lotgate.cli;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;

/**
 * Keeps file names, paths and option names whole in the help. picocli wraps descriptions where the JDK's line
 * breaker allows, which includes after a '.' or '/' inside a word ("plans/bolts." then "json"); a reader copying
 * such a path gets it wrong. The option and parameter lists are drawn as picocli draws them, then every word it
 * split is moved whole to the next line, and the lines after it are filled again.
 */
final class HelpLayout {
    private HelpLayout() {
    }

    /** Applies the layout to a command line and every command under it. */
    static void apply(CommandLine cli) {
        for (String key : List.of(CommandLine.Model.UsageMessageSpec.SECTION_KEY_OPTION_LIST,
                CommandLine.Model.UsageMessageSpec.SECTION_KEY_PARAMETER_LIST)) {
            CommandLine.IHelpSectionRenderer drawn = cli.getHelpSectionMap().get(key);
            if (drawn != null) {
                cli.getHelpSectionMap().put(key, help -> mend(drawn.render(help), words(help.commandSpec()),
                        help.commandSpec().usageMessage().width()));
            }
        }
        cli.getSubcommands().values().forEach(HelpLayout::apply);
    }

    /** Every whitespace-separated word of the command's option and parameter descriptions. */
    private static Set<String> words(CommandLine.Model.CommandSpec spec) {
        Set<String> words = new HashSet<>();
        List<ArgSpec> args = new ArrayList<>(spec.options());
        args.addAll(spec.positionalParameters());
        for (ArgSpec arg : args) {
            for (String line : arg.description()) {
                String text;
                try {
                    text = String.format(Locale.ROOT, line);
                } catch (java.util.IllegalFormatException e) {
                    text = line;
                }
                for (String word : text.split("\\s+")) {
                    if (!word.isEmpty()) {
                        words.add(word);
                    }
                }
            }
        }
        return words;
    }

    /**
     * Moves each word split over two lines whole onto the second line, then refills the lines of that entry that
     * follow (lines with the same indent) within the width.
     */
    static String mend(String drawn, Set<String> words, int width) {
        String newline = drawn.contains("\r\n") ? "\r\n" : "\n";
        List<String> lines = new ArrayList<>(List.of(drawn.split("\r?\n", -1)));
        for (int i = 0; i + 1 < lines.size(); i++) {
            String line = lines.get(i);
            String next = lines.get(i + 1);
            int indent = indent(next);
            if (indent == 0 || next.isBlank() || line.isBlank() || line.endsWith(" ")) {
                continue;
            }
            int cut = line.lastIndexOf(' ') + 1;
            String head = line.substring(cut);
            String rest = next.substring(indent);
            int end = rest.indexOf(' ');
            String tail = end < 0 ? rest : rest.substring(0, end);
            if (cut <= indent || words.contains(head) || !words.contains(head + tail)) {
                continue;
            }
            lines.set(i, line.substring(0, cut).stripTrailing());
            // The split word, whole, begins the next line; that line and the continuation lines after it are
            // filled again, since it grew.
            StringBuilder text = new StringBuilder(head).append(rest);
            int last = i + 1;
            while (last + 1 < lines.size() && indent(lines.get(last + 1)) == indent
                    && !lines.get(last + 1).isBlank()) {
                last++;
                text.append(' ').append(lines.get(last).substring(indent));
            }
            List<String> filled = fill(text.toString(), indent, width);
            for (int k = last; k > i; k--) {
                lines.remove(k);
            }
            lines.addAll(i + 1, filled);
        }
        return String.join(newline, lines);
    }

    private static List<String> fill(String text, int indent, int width) {
        List<String> out = new ArrayList<>();
        String pad = " ".repeat(indent);
        StringBuilder line = new StringBuilder(pad);
        for (String word : text.trim().split(" +")) {
            if (line.length() > indent && line.length() + 1 + word.length() > width) {
                out.add(line.toString());
                line = new StringBuilder(pad);
            }
            if (line.length() > indent) {
                line.append(' ');
            }
            line.append(word);
        }
        out.add(line.toString());
        return out;
    }

    private static int indent(String line) {
        int i = 0;
        while (i < line.length() && line.charAt(i) == ' ') {
            i++;
        }
        return i;
    }
}
