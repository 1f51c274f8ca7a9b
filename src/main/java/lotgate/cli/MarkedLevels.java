package lotgate.cli;

import picocli.CommandLine.Mixin;

/** The AQL and LTPD at which a command reads a plan's curves (curve marks them, compare compares there). */
final class MarkedLevels {
    @Mixin
    SharedOptions.Aql aql;

    @Mixin
    SharedOptions.Ltpd ltpd;
}
