package lotgate.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collection;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.Function;
import lotgate.report.Json;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** The --format option: text for people, json and csv for programs and spreadsheets. */
final class OutputFormat {
    enum Kind { text, json, csv }

    @Option(names = {"-f", "--format"}, paramLabel = "FORMAT", defaultValue = "text",
            description = "Output format: text (the default), json or csv.")
    Kind kind;

    @Spec(Spec.Target.MIXEE)
    CommandSpec command;

    /** The folders of the command's output files that did not exist before it ran (its writes create them). */
    private final Set<Path> newFolders = new LinkedHashSet<>();

    /**
     * Notes, before the command writes, which of its output files' folders do not exist yet, so that {@link #written}
     * can say they were created. Each argument is a file, a collection of files, or null.
     */
    void outputs(Object... files) {
        for (Object file : files) {
            for (Object each : each(file)) {
                Path folder = ((Path) each).getParent();
                if (folder != null && !Files.isDirectory(folder)) {
                    newFolders.add(folder);
                }
            }
        }
    }

    private static Collection<?> each(Object file) {
        return file instanceof Collection<?> many ? many
                : file == null ? List.of() : List.of(file);
    }

    /** Prints a job's result in the format asked for; only that format's rendering is made. */
    <R> void print(R result, Function<R, String> text, Function<R, ObjectNode> json, Function<R, String> csv) {
        PrintWriter out = command.commandLine().getOut();
        switch (kind) {
            case json -> out.println(Json.text(json.apply(result)));
            case csv -> out.print(csv.apply(result));
            case text -> out.print(text.apply(result));
        }
        out.flush();
    }

    /**
     * After a text output, one line per file the command wrote, "  OC chart written to FILE", as sentence words its
     * report and chart, then one line per folder it created for them (noted by {@link #outputs}); JSON and CSV output
     * stay the result alone. Each pair is a label and its file (or files), null when not written.
     */
    void written(Object... labelsAndFiles) {
        if (kind != Kind.text) {
            return;
        }
        StringBuilder lines = new StringBuilder();
        for (int i = 0; i < labelsAndFiles.length; i += 2) {
            for (Object each : each(labelsAndFiles[i + 1])) {
                lines.append("  ").append(labelsAndFiles[i]).append(" written to ").append(each)
                        .append(System.lineSeparator());
            }
        }
        for (Path folder : newFolders) {
            if (Files.isDirectory(folder)) {
                lines.append("  folder ").append(folder).append(" did not exist and was created")
                        .append(System.lineSeparator());
            }
        }
        if (lines.length() > 0) {
            PrintWriter out = command.commandLine().getOut();
            out.print(System.lineSeparator() + lines);
            out.flush();
        }
    }
}
