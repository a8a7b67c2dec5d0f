package org.telltale.cli;

import java.io.PrintWriter;
import org.telltale.ExitCodes;
import org.telltale.OptionWords;
import org.telltale.TelltaleException;
import picocli.CommandLine;

/**
 * The one place where failures become output: a one-line message on stderr, in the options' words
 * ({@link OptionWords#render}: the core's {@code {force}} reads {@code --force}), the stack trace
 * only when {@code --verbose} was given, and the exit code the error carries.
 */
final class ErrorHandler implements CommandLine.IExecutionExceptionHandler {

    @Override
    public int handleExecutionException(Exception ex, CommandLine cmd, CommandLine.ParseResult parsed) {
        PrintWriter err = cmd.getErr();
        err.println("telltale: " + oneLine(ex));
        if (isVerbose(parsed)) {
            ex.printStackTrace(err);
        }
        err.flush();
        return ex instanceof TelltaleException te ? te.exitCode() : ExitCodes.ERROR;
    }

    static String oneLine(Throwable ex) {
        String message = OptionWords.render(ex.getMessage());
        if (ex instanceof TelltaleException && message != null) {
            return message.replace('\n', ' ');
        }
        // An unexpected failure: name its type so a bug report can be matched to the code.
        String kind = ex.getClass().getSimpleName();
        return (message == null ? kind : kind + ": " + message.replace('\n', ' '))
                + " (rerun with --verbose for details)";
    }

    private static boolean isVerbose(CommandLine.ParseResult parsed) {
        for (CommandLine.ParseResult p = parsed; p != null; p = p.subcommand()) {
            if (p.hasMatchedOption("--verbose")) {
                return true;
            }
        }
        return false;
    }
}
