package lotgate.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
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
}
