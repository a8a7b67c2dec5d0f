package org.telltale.report.sarif;

import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/**
 * Runs {@code validate} of the SARIF Multitool (npm {@code @microsoft/sarif-multitool-linux},
 * fetched into target/npm by src/test/npm/fetch.sh) on a log and returns what it reports at level
 * {@code error}: JSON schema violations (JSONnnnn) and SARIF rule errors (SARIF1nnn).
 *
 * <p>The validator exits 0 whatever it finds and, for some malformed logs (an unknown enum value),
 * finds no schema error, then silently runs none of its SARIF rules. So a log without errors is
 * checked again as a canary: a copy without the tool's version, on which rule SARIF2005 must fire (it runs
 * only once the log has been read as SARIF). When it does not, the validator did not read the log
 * and the check fails instead of passing.
 *
 * <p>Missing tool: tests are skipped locally with a message and fail under {@code CI}.
 */
public final class SarifMultitool {
    public static final Path TOOL = Path.of("target/npm/node_modules/@microsoft/sarif-multitool-linux/Sarif.Multitool");
    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final long LIMIT_SECONDS = 120;

    private SarifMultitool() {
    }

    /** Skips the calling test (fails it under CI) when the validator has not been fetched. */
    public static void require() {
        boolean present = Files.isExecutable(TOOL);
        if (!present && System.getenv("CI") != null) {
            fail("CI is set but " + TOOL + " is missing; `mvn generate-test-resources` fetches it with npm");
        }
        assumeTrue(present, "SARIF validation skipped: " + TOOL + " is missing (install npm, run mvn generate-test-resources)");
    }

    /** The validator's errors on {@code log}, each as {@code RULE error: message}; empty when the log is valid. */
    public static List<String> errors(Path log) throws IOException, InterruptedException {
        require();
        Path dir = Files.createTempDirectory(log.toAbsolutePath().getParent(), ".sarif-validate");
        List<String> errors = run(log, dir.resolve("out.sarif")).stream().filter(r -> r.contains(" error: ")).toList();
        if (!errors.isEmpty()) {
            return errors;
        }
        Path canary = dir.resolve("canary.sarif");
        ObjectNode tree = (ObjectNode) MAPPER.readTree(log.toFile());
        ((ObjectNode) tree.path("runs").path(0).path("tool").path("driver")).remove(List.of("version", "semanticVersion"));
        Files.writeString(canary, MAPPER.writeValueAsString(tree), StandardCharsets.UTF_8);
        if (run(canary, dir.resolve("canary-out.sarif")).stream().noneMatch(r -> r.startsWith("SARIF2005"))) {
            throw new AssertionError("the SARIF Multitool did not analyse " + log + " (a copy without the tool version "
                    + "drew no SARIF2005): the log is likely malformed beyond what validate reports");
        }
        return errors;
    }

    /** Every result of the validator on {@code log}, as {@code RULE level: message}. */
    private static List<String> run(Path log, Path out) throws IOException, InterruptedException {
        List<String> command = List.of(TOOL.toAbsolutePath().toString(), "validate", log.toAbsolutePath().toString(),
                "--output", out.toAbsolutePath().toString(), "--log", "ForceOverwrite", "--quiet");
        ProcessBuilder builder = new ProcessBuilder(command).redirectErrorStream(true)
                .redirectOutput(out.resolveSibling(out.getFileName() + ".console").toFile());
        // .NET without ICU (a minimal machine) stops at start-up; the validator needs no culture data.
        builder.environment().put("DOTNET_SYSTEM_GLOBALIZATION_INVARIANT", "1");
        Process p = builder.start();
        if (!p.waitFor(LIMIT_SECONDS, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("the SARIF Multitool did not finish in " + LIMIT_SECONDS + " s on " + log);
        }
        if (!Files.isRegularFile(out)) {
            throw new AssertionError("the SARIF Multitool wrote no output for " + log + " (exit " + p.exitValue() + "): "
                    + Files.readString(out.resolveSibling(out.getFileName() + ".console"), StandardCharsets.UTF_8));
        }
        JsonNode run = MAPPER.readTree(out.toFile()).path("runs").path(0);
        Map<String, String> defaults = new HashMap<>();
        for (JsonNode rule : run.path("tool").path("driver").path("rules")) {
            defaults.put(rule.path("id").asText(), rule.path("defaultConfiguration").path("level").asText("warning"));
        }
        List<String> results = new ArrayList<>();
        for (JsonNode result : run.path("results")) {
            String rule = result.path("ruleId").asText();
            // SARIF 2.1.0 §3.27.10: a result without a level takes its rule's default, and that defaults to warning.
            String level = result.path("level").asText(defaults.getOrDefault(rule, "warning"));
            results.add(rule + " " + level + ": " + describe(result, run));
        }
        return results;
    }

    /** The result's message: its text, or its rule's message string with the arguments filled in. */
    private static String describe(JsonNode result, JsonNode run) {
        JsonNode message = result.path("message");
        if (message.has("text")) {
            return message.get("text").asText();
        }
        String id = message.path("id").asText();
        for (JsonNode rule : run.path("tool").path("driver").path("rules")) {
            if (rule.path("id").asText().equals(result.path("ruleId").asText())) {
                String text = rule.path("messageStrings").path(id).path("text").asText(id);
                int i = 0;
                for (JsonNode arg : message.path("arguments")) {
                    text = text.replace("{" + i++ + "}", arg.asText());
                }
                return text;
            }
        }
        return id + " " + message.path("arguments");
    }
}
