package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** {@code telltale serve}'s settings: refused in ServerSettings' words, named by their option once. */
class ServeCommandTest {
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"--port|70000|--port must be within 0–65535: 70000",
            "--threads|0|--threads must be at least 1: 0", "--max-batch|0|--max-batch must be at least 1: 0",
            "--max-body|10|--max-body must be at least 64: 10"})
    void aRefusedSettingIsAUsageErrorNamingItsOption(String option, String value, String message) {
        picocli.CommandLine cli = Main.commandLine();
        StringWriter err = new StringWriter();
        cli.setOut(new PrintWriter(new StringWriter()));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute("serve", "--model", "desk.json", option, value);
        assertEquals("2 telltale: " + message, code + " " + err.toString().lines().findFirst().orElse(""));
    }
}
