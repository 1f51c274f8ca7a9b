package lotgate.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Option;

/**
 * The options that several commands take, each declared once as a mixin. A command says in its own words what
 * the option does there (a lot report is not an audit report): the descriptions are in OptionTexts.properties,
 * keyed by command and option, so that each command's help reads as before.
 */
final class SharedOptions {
    private SharedOptions() {
    }

    /** --confidence: the confidence level of the bounds or intervals a command gives. */
    static final class Confidence {
        @Option(names = "--confidence", paramLabel = "LEVEL", defaultValue = "95%", converter = Values.Risk.class)
        double level;
    }

    /** --report: report files to write, .xlsx or .html, repeatable. */
    static final class Reports {
        @Option(names = "--report", paramLabel = "FILE")
        List<Path> files = new ArrayList<>();
    }

    /** --chart: the command's main chart, .png or .svg. */
    static final class Chart {
        @Option(names = "--chart", paramLabel = "FILE")
        Path file;
    }

    /** --asn-chart: the ASN curve (average units inspected per lot), .png or .svg. */
    static final class AsnChart {
        @Option(names = "--asn-chart", paramLabel = "FILE")
        Path file;
    }

    /** --record: the lot's decision record as a JSON file. */
    static final class RecordFile {
        @Option(names = "--record", paramLabel = "FILE")
        Path file;
    }

    /** --supplier: the supplier a command is about. */
    static final class Supplier {
        @Option(names = "--supplier", paramLabel = "NAME")
        String name;
    }

    /** --part: the part a command is about. */
    static final class Part {
        @Option(names = "--part", paramLabel = "PART")
        String name;
    }

    /** --columns: the site's own header names of an inspection sheet. */
    static final class ColumnNames {
        @Option(names = "--columns", paramLabel = "MAPPING")
        String mapping;
    }

    /** --result-words: the site's own pass and fail words. */
    static final class ResultWords {
        @Option(names = "--result-words", paramLabel = "MAPPING")
        String mapping;
    }

    /** --sheet: the workbook sheet to read. */
    static final class Sheet {
        @Option(names = "--sheet", paramLabel = "NAME")
        String name;
    }

    /** --curtailed: a double plan's ASN with inspection stopped at the rejection number. */
    static final class Curtailed {
        @Option(names = "--curtailed")
        boolean on;
    }

    /** --aql and --ltpd where they mark levels on a plan's curves rather than design it. */
    static final class MarkedLevels {
        @Option(names = "--aql", paramLabel = "LEVEL", converter = Values.Quality.class)
        Double aql;

        @Option(names = "--ltpd", paramLabel = "LEVEL", converter = Values.Quality.class)
        Double ltpd;
    }
}
