package lotgate.cli;

import lotgate.jobs.Checks;
import lotgate.sampling.OcModel;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;

/** The OC model and lot size options shared by the commands that compute curves and plans. */
final class ModelOptions {
    enum ModelName { binomial, hypergeometric, poisson }

    @Option(names = {"-m", "--model"}, paramLabel = "MODEL", descriptionKey = "model",
            description = "OC model: binomial (units from a process or a large lot, type B; the default),"
                    + " hypergeometric (an isolated lot of --lot-size units, type A), or poisson (nonconformities"
                    + " per unit rather than nonconforming units).")
    ModelName model;

    @Option(names = {"-N", "--lot-size"}, paramLabel = "N", converter = Values.Count.class,
            description = "Lot size N: required by the hypergeometric model; with the others it is used for AOQ"
                    + " and ATI and bounds the sample.")
    Integer lotSize;

    /** The same lot size without a model, for saved plans that carry their own model. */
    ModelOptions withoutModel() {
        ModelOptions copy = new ModelOptions();
        copy.lotSize = lotSize;
        return copy;
    }

    /** Whether the user named a model or lot size (so that a saved plan's own must not be overridden). */
    boolean given() {
        return model != null || lotSize != null;
    }

    int lotSizeOrZero() {
        return lotSize == null ? 0 : lotSize;
    }

    String modelName() {
        return model == null ? "binomial" : model.name();
    }

    /** The model named, or null when the user named none. */
    String named() {
        return model == null ? null : model.name();
    }

    OcModel resolve(CommandSpec spec) {
        return Checks.model(named(), lotSize);
    }
}
