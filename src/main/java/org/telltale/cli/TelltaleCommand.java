package org.telltale.cli;

import picocli.CommandLine.Command;

/** The top-level {@code telltale} command; it only holds the subcommands. */
@Command(
        name = "telltale",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Audits text classifiers trained by someone else: explains predictions, finds leaked artefacts.",
        subcommands = {DemoCommand.class, OverlapCommand.class, TrainCommand.class, ScoreCommand.class, ServeCommand.class,
                ReportCommand.class, AuditCommand.class, ExplainCommand.class})
final class TelltaleCommand implements Runnable {
    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
