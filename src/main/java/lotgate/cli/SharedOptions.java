package lotgate.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Mixin;
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

    /**
     * A chart option named by what it draws, with the name all of them once shared, --chart, kept as a hidden alias
     * so that command lines written before still work.
     */
    abstract static class NamedChart {
        @Option(names = "--chart", paramLabel = "FILE", hidden = true)
        Path formerName;

        abstract Path named();

        /** The file asked for under the option's name, or else under --chart. */
        Path file() {
            return named() != null ? named() : formerName;
        }
    }

    /** --curves-chart: OC, AOQ and ATI stacked in one chart, .png or .svg. */
    static final class CurvesChart extends NamedChart {
        @Option(names = "--curves-chart", paramLabel = "FILE")
        Path file;

        @Override
        Path named() {
            return file;
        }
    }

    /** --oc-chart: the OC curve alone, or those of the plans compared on one chart. */
    static final class OcChart {
        @Option(names = "--oc-chart", paramLabel = "FILE")
        Path file;
    }

    /** --oc-chart where --chart once drew the same (compare). */
    static final class OcCurvesChart extends NamedChart {
        @Mixin
        OcChart chart;

        @Override
        Path named() {
            return chart.file;
        }
    }

    /** --sampling-chart: a lot's count against the units inspected, with the plan's acceptance and rejection. */
    static final class SamplingChart extends NamedChart {
        @Option(names = "--sampling-chart", paramLabel = "FILE")
        Path file;

        @Override
        Path named() {
            return file;
        }
    }

    /** --asn-chart: the ASN curve (average units inspected per lot), .png or .svg. */
    static final class AsnChart {
        @Option(names = "--asn-chart", paramLabel = "FILE")
        Path file;
    }

    /** --scheme: the kind of plan (single, double, ...); each command checks the kinds it offers. */
    static final class Scheme {
        @Option(names = "--scheme", paramLabel = "SCHEME", defaultValue = "single")
        String name;
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

    /** --aql: the acceptable quality level a plan is designed for, or marked on its curves. */
    static final class Aql {
        @Option(names = "--aql", paramLabel = "LEVEL", converter = Values.Quality.class)
        Double level;
    }

    /** --ltpd: the lot tolerance percent defective a plan protects against, or marked on its curves. */
    static final class Ltpd {
        @Option(names = "--ltpd", paramLabel = "LEVEL", converter = Values.Quality.class)
        Double level;
    }

    /** --beta: the consumer's risk, the largest P(accept) allowed at the LTPD. */
    static final class ConsumerRisk {
        @Option(names = "--beta", paramLabel = "RISK", defaultValue = "10%", converter = Values.Risk.class)
        double beta;
    }

    /** -N, --lot-size: the lot size, for a model's curves and plans or for the lot sentenced. */
    static final class LotSize {
        @Option(names = {"-N", "--lot-size"}, paramLabel = "N", converter = Values.Count.class)
        Integer size;
    }

    /** -n, --sample-size: the sample size of a plan given as numbers. */
    static final class SampleSize {
        @Option(names = {"-n", "--sample-size"}, paramLabel = "N", converter = Values.Count.class)
        Integer n;
    }

    /** -c, --acceptance: the acceptance number of a plan given as numbers, or fixed in a design. */
    static final class Acceptance {
        @Option(names = {"-c", "--acceptance"}, paramLabel = "C", converter = Values.Acceptance.class)
        Integer c;
    }

    /** --replace: overwrite an existing file that the command would write (a plan, a plan family). */
    static final class Replace {
        @Option(names = "--replace")
        boolean on;
    }

    /** --switching: the edition of the switching rules, or (where a command says so) a plan family's rules. */
    static final class Switching {
        @Option(names = "--switching", paramLabel = "RULES", defaultValue = "current")
        String rules;
    }
}
