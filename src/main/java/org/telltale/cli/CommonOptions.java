package org.telltale.cli;

import picocli.CommandLine.Option;

/**
 * Options every subcommand carries: {@code --verbose} (stack traces on error) and the standard
 * {@code --help}/{@code --version}. Use as {@code @Mixin CommonOptions common;}.
 */
final class CommonOptions {
    @Option(names = "--verbose", description = "Print stack traces with errors.")
    boolean verbose;

    @Option(names = {"-h", "--help"}, usageHelp = true, description = "Show this help and exit.")
    boolean help;

    @Option(names = {"-V", "--version"}, versionHelp = true, description = "Print version and exit.")
    boolean version;
}
