package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

class DemoCommandTest {
    @Test
    void aCorpusTooSmallForThePlantsIsAUsageErrorNamingTheOption() {
        // SupportCorpusGenerator checks the size once, in its words; OptionWords names the option.
        picocli.CommandLine cli = Main.commandLine();
        StringWriter err = new StringWriter();
        cli.setOut(new PrintWriter(new StringWriter()));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute("demo", "--size", "5", "--quiet");
        assertEquals("2 telltale: --size must be at least 200: 5", code + " " + err.toString().lines().findFirst().orElse(""));
    }
}
