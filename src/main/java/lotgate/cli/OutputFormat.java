package lotgate.cli;

import picocli.CommandLine.Option;

/** The --format option: text for people, json and csv for programs and spreadsheets. */
final class OutputFormat {
    enum Kind { text, json, csv }

    @Option(names = {"-f", "--format"}, paramLabel = "FORMAT", defaultValue = "text",
            description = "Output format: text (the default), json or csv.")
    Kind kind;
}
