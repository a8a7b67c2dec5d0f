package org.telltale.spark;

import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import org.telltale.ExitCodes;
import org.telltale.OptionWords;
import org.telltale.TelltaleException;

/**
 * What the Spark fronts share at their edge: results on stdout, one-line errors on stderr (the
 * stack trace with {@code --verbose}), and the exit codes of {@code telltale}. An error raised in
 * a task reaches the driver wrapped by Spark; the first Telltale error in the chain is the one shown.
 */
final class SparkMain {
    interface Body {
        int run(PrintStream out, PrintStream err) throws Exception;
    }

    private SparkMain() {
    }

    static int run(String[] args, Body body) {
        PrintStream out = new PrintStream(new java.io.FileOutputStream(java.io.FileDescriptor.out), true, StandardCharsets.UTF_8);
        PrintStream err = new PrintStream(new java.io.FileOutputStream(java.io.FileDescriptor.err), true, StandardCharsets.UTF_8);
        boolean verbose = java.util.Arrays.asList(args).contains("--verbose");
        try {
            return body.run(out, err);
        } catch (Exception e) {
            TelltaleException known = find(e);
            err.println("telltale: " + oneLine(e));
            if (verbose) {
                e.printStackTrace(err);
            }
            err.flush();
            return known != null ? known.exitCode() : ExitCodes.ERROR;
        } finally {
            out.flush();
        }
    }

    /**
     * The line shown for {@code e}: the first Telltale error's message in the options' words
     * ({@link OptionWords#render}: the core's {@code {force}} reads {@code --force}), or else the
     * failure's type and message with a hint to {@code --verbose}.
     */
    static String oneLine(Throwable e) {
        TelltaleException known = find(e);
        Throwable shown = known != null ? known : e;
        String message = shown.getMessage() == null ? shown.getClass().getSimpleName()
                : OptionWords.render(shown.getMessage()).replace('\n', ' ');
        return known != null ? message : shown.getClass().getSimpleName() + ": " + message + " (rerun with --verbose for details)";
    }

    private static TelltaleException find(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof TelltaleException te) {
                return te;
            }
            if (t.getCause() == t) {
                break;
            }
        }
        return null;
    }
}
