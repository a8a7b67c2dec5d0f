package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;
import org.telltale.ExitCodes;
import picocli.CommandLine;

class MainTest {

    private static String[] run(String... args) {
        CommandLine cli = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cli.setOut(new PrintWriter(out));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute(args);
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    @Test
    void versionPrintsTheBuildVersionAndExitsZero() {
        String[] r = run("--version");
        assertEquals("0", r[0]);
        assertTrue(r[1].startsWith("telltale "), r[1]);
    }

    @Test
    void unknownOptionIsAUsageErrorOnOneLinePlusHint() {
        String[] r = run("--no-such-option");
        assertEquals(Integer.toString(ExitCodes.USAGE), r[0]);
        assertTrue(r[2].startsWith("telltale: Unknown option"), r[2]);
        assertEquals(2, r[2].strip().split("\n").length, r[2]);
    }

    @Test
    void everySubcommandOffersHelpAndVersion() {
        CommandLine cli = Main.commandLine();
        for (CommandLine sub : cli.getSubcommands().values()) {
            var spec = sub.getCommandSpec();
            assertTrue(spec.findOption("--help") != null, spec.name() + " lacks --help");
            assertTrue(spec.findOption("--version") != null, spec.name() + " lacks --version");
            assertTrue(spec.findOption("--verbose") != null, spec.name() + " lacks --verbose");
        }
    }
}
