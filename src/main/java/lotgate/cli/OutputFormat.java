package lotgate.cli;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.function.Supplier;
import lotgate.report.Json;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;

/** The --format option: text for people, json and csv for programs and spreadsheets. */
final class OutputFormat {
    enum Kind { text, json, csv }

    @Option(names = {"-f", "--format"}, paramLabel = "FORMAT", defaultValue = "text",
            description = "Output format: text (the default), json or csv.")
    Kind kind;

    /** Prints a result in the format asked for, each rendering made only when it is the one asked for. */
    void print(CommandSpec spec, Supplier<String> text, Supplier<ObjectNode> json, Supplier<String> csv) {
        PrintWriter out = spec.commandLine().getOut();
        switch (kind) {
            case json -> out.println(Json.text(json.get()));
            case csv -> out.print(csv.get());
            case text -> out.print(text.get());
        }
        out.flush();
    }
}
