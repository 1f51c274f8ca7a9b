package lotgate.cli;

import java.nio.file.Path;
import lotgate.jobs.PlanFromTables;
import lotgate.jobs.SaveTarget;
import lotgate.report.results.TableRendering;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.TypeConversionException;

/** Looks a plan up in the published attribute sampling tables and shows the risks they do not print. */
@Command(name = "lookup", header = "Look a plan up in the published attribute sampling tables, with its real risks.",
        description = {
                "Finds the sample size code letter for the lot size and inspection level, follows the table's arrow"
                        + " where the cell holds none, and gives the plan of the tables (MIL-STD-105E, kept by the"
                        + " later civil standards) for the AQL and severity. Then what the tables do not print: the"
                        + " exact producer's risk at the AQL, the LTPD at a consumer's risk of 10%% and 5%%, the"
                        + " quality accepted half the time, the AOQL for the lot size, and the ASN of a double plan."
                        + " --lot-size is required: the code letter depends on it.",
                "",
                "--save-family writes the normal, tightened and reduced plans with the switching rules in one step;"
                        + " 'lotgate sentence FAMILY SHEET' then applies the one the supplier's history calls for.",
                ""})
final class LookupCommand implements Runnable {
    @Spec
    CommandSpec spec;

    @Mixin
    ModelOptions models;

    @Option(names = {"-l", "--level"}, paramLabel = "LEVEL", defaultValue = "II",
            description = "Inspection level: general I, II (the default) or III, or special S-1, S-2, S-3, S-4 (small"
                    + " samples where larger risks are tolerable).")
    String level;

    @Option(names = "--aql", required = true, paramLabel = "AQL", converter = TableAql.class,
            description = "The AQL as the tables print it, in percent (0.65 or 0.65%%), from their preferred series"
                    + " 0.010 to 1000; above 10 it counts nonconformities per hundred units.")
    double aql;

    @Option(names = "--severity", paramLabel = "SEVERITY", defaultValue = "normal",
            description = "normal (the default), tightened or reduced inspection.")
    String severity;

    @Mixin
    SharedOptions.Scheme schemes;

    @ArgGroup(exclusive = false)
    DesignCommand.SaveOptions save;

    @ArgGroup(exclusive = false)
    FamilyOptions family;

    static final class FamilyOptions {
        @Option(names = "--save-family", required = true, paramLabel = "FILE",
                description = "Save the normal, tightened and reduced plans and the switching rules as a plan family"
                        + " (e.g. plans/bolts.json, with plans/bolts-normal.json and the others beside it).")
        Path file;

        @Option(names = "--family-description", paramLabel = "TEXT", defaultValue = "",
                description = "What the family is for, kept in its plan files.")
        String description;

        @Option(names = "--replace-family", description = "Overwrite an existing family and its plan files.")
        boolean replace;
    }

    @Mixin
    OutputFormat format;

    /** An AQL in percent as the tables print it: 0.65 or 0.65%. */
    static final class TableAql implements ITypeConverter<Double> {
        @Override
        public Double convert(String text) {
            String number = text.trim();
            if (number.endsWith("%")) {
                number = number.substring(0, number.length() - 1).trim();
            }
            try {
                double value = Double.parseDouble(number);
                if (value > 0 && !Double.isInfinite(value)) {
                    return value;
                }
            } catch (NumberFormatException e) {
                // refused below with the same message
            }
            throw new TypeConversionException("'" + text + "' is not an AQL; write it in percent as the tables print"
                    + " it, e.g. 0.65");
        }
    }

    @Override
    public void run() {
        SaveTarget target = DesignCommand.SaveOptions.target(save);
        format.outputs(save == null ? null : save.file, family == null ? null : family.file);
        PlanFromTables.FamilyTarget familyTarget = family == null ? null
                : new PlanFromTables.FamilyTarget(family.file, family.description, family.replace);
        PlanFromTables.Result result = PlanFromTables.run(new PlanFromTables.Request(models.lotSize(), level, aql,
                severity, schemes.name, models.named(), target, familyTarget));
        format.print(result, TableRendering::text, TableRendering::json, TableRendering::csv);
        format.written();
    }
}
