package lotgate.cli;

import lotgate.jobs.Checks;
import lotgate.sampling.OcModel;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** The OC model and lot size options shared by the commands that compute curves and plans. */
final class ModelOptions {
    enum ModelName { binomial, hypergeometric, poisson }

    @Option(names = {"-m", "--model"}, paramLabel = "MODEL", descriptionKey = "model",
            description = "OC model: binomial (units from a process or a large lot, type B; the default),"
                    + " hypergeometric (an isolated lot of --lot-size units, type A), or poisson (nonconformities"
                    + " per unit rather than nonconforming units).")
    ModelName model;

    @Mixin
    SharedOptions.LotSize lot;

    /** The lot size given, or null. */
    Integer lotSize() {
        return lot.size;
    }

    int lotSizeOrZero() {
        return lot.size == null ? 0 : lot.size;
    }

    /** The model named, or null when the user named none. */
    String named() {
        return model == null ? null : model.name();
    }

    /** The model named (binomial when none) for the lot size given; the hypergeometric model needs one. */
    OcModel resolve() {
        return Checks.model(named(), lot.size);
    }
}
