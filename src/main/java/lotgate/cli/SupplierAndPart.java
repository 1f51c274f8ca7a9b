package lotgate.cli;

import picocli.CommandLine.Mixin;

/** The supplier and part of lots: the key under which the history keeps each sequence of lots. */
final class SupplierAndPart {
    @Mixin
    SharedOptions.Supplier supplier;

    @Mixin
    SharedOptions.Part part;
}
