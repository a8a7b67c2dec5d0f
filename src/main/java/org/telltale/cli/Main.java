package org.telltale.cli;

import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import org.telltale.ExitCodes;
import org.telltale.OptionWords;
import picocli.CommandLine;

/** Entry point of {@code telltale}: builds the command tree and maps every outcome to an exit code. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        System.exit(run(args));
    }

    /** Runs one command line and returns its exit code; used by tests without exiting the JVM. */
    public static int run(String... args) {
        CommandLine cli = commandLine();
        try {
            return cli.execute(args);
        } catch (Error e) {
            // picocli hands only exceptions to ErrorHandler; an Error (the JVM out of stack or
            // memory where no document could be named) still ends the run with one line.
            PrintWriter err = cli.getErr();
            err.println("telltale: " + ErrorHandler.oneLine(e));
            if (java.util.Arrays.asList(args).contains("--verbose")) {
                e.printStackTrace(err);
            }
            return ExitCodes.ERROR;
        } finally {
            cli.getOut().flush();
            cli.getErr().flush();
        }
    }

    /** The full command tree, configured with Telltale's error handling and exit codes. */
    public static CommandLine commandLine() {
        CommandLine cli = new CommandLine(new TelltaleCommand());
        // Document text is printed as UTF-8 whatever the platform's default charset, so a POSIX
        // locale does not turn every non-ASCII character into '?'.
        cli.setOut(utf8(System.out));
        cli.setErr(utf8(System.err));
        cli.setExecutionExceptionHandler(new ErrorHandler());
        cli.setParameterExceptionHandler(new UsageErrorHandler());
        cli.setExitCodeExceptionMapper(e -> ExitCodes.ERROR);
        cli.setCaseInsensitiveEnumValuesAllowed(true);
        return cli;
    }

    private static PrintWriter utf8(OutputStream stream) {
        return new PrintWriter(new OutputStreamWriter(stream, StandardCharsets.UTF_8), true);
    }

    /** Usage errors: one line naming the problem, a hint to --help, exit 2. */
    static final class UsageErrorHandler implements CommandLine.IParameterExceptionHandler {
        @Override
        public int handleParseException(CommandLine.ParameterException ex, String[] args) {
            PrintWriter err = ex.getCommandLine().getErr();
            err.println("telltale: " + OptionWords.render(ex.getMessage()));
            err.println("Try '" + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help' for more information.");
            err.flush();
            return ExitCodes.USAGE;
        }
    }
}
