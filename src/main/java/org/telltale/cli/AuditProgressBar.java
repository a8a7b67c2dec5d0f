package org.telltale.cli;

import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import org.telltale.audit.Auditor;

/** The audit's phases as a progress bar on stderr; only used when stderr is a terminal. */
final class AuditProgressBar implements Auditor.Progress {
    private ProgressBar bar;

    /** A bar when the process has a terminal and {@code quiet} is off; otherwise silence. */
    static Auditor.Progress forTerminal(boolean quiet) {
        return quiet || System.console() == null ? Auditor.Progress.SILENT : new AuditProgressBar();
    }

    @Override
    public void phase(String name, long total) {
        done();
        bar = new ProgressBarBuilder().setTaskName(name).setInitialMax(total).setStyle(ProgressBarStyle.ASCII)
                .setConsumer(new ConsoleProgressBarConsumer(System.err)).setUpdateIntervalMillis(250).build();
    }

    @Override
    public void advance(long steps) {
        if (bar != null) {
            bar.stepBy(steps);
        }
    }

    @Override
    public void done() {
        if (bar != null) {
            bar.close();
            bar = null;
        }
    }
}
