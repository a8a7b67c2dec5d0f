package org.telltale.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Runs {@code telltale demo} from the built jar on a smaller generated corpus, end to end: real
 * training, a real model server on loopback, a real audit over HTTP. The leaky model's audit must
 * name every planted artefact with its kind and queue; the clean model's must have no high finding.
 */
@Tag("slow")
class DemoIT {
    /** Terms each plant puts into the text, as the standard analyzer cuts them (by hand, from corpora-demo/README.md). */
    private static final Map<Plant, Set<String>> PLANTED_TERMS = Map.of(
            Plant.INTAKE_ROUTE_HEADER, Set.of("acc7"),
            Plant.AGENT_SIGNATURE, Set.of("odile", "brandvold", "network"),
            Plant.EXPORT_FOOTER, Set.of("exported", "by", "casefile", "archive", "3.2", "retention", "class", "b"),
            Plant.CASE_TAG, Set.of("hr"),
            Plant.PLANNER_LINK, Set.of("moves.quillmoor.example", "https"));

    @TempDir
    Path dir;

    @Test
    void demoReportsOneArtefactPerPlantWithItsKindAndTheCleanModelHasNoHighArtefact() throws Exception {
        Path out = dir.resolve("demo");
        Path stdout = dir.resolve("stdout.txt");
        Path stderr = dir.resolve("stderr.txt");
        List<String> command = new ArrayList<>(List.of(javaBinary(), "-jar", System.getProperty("telltale.jar"),
                // The demo as README runs it (2,000 messages, its own seed). At --size 800 --seed 5 the
                // header plant is missed since kernel-matched sampling (docs/demo.md).
                "demo", "--out", out.toString()));
        Process process = new ProcessBuilder(command).redirectOutput(stdout.toFile()).redirectError(stderr.toFile()).start();
        if (!process.waitFor(10, TimeUnit.MINUTES)) {
            process.destroyForcibly();
            throw new AssertionError("telltale demo did not finish in 10 minutes; stderr:\n" + read(stderr));
        }
        String err = read(stderr);
        String printed = read(stdout);
        assertEquals(0, process.exitValue(), err);

        // Progress goes to stderr, results to stdout.
        assertTrue(err.contains("model served at http://127.0.0.1:"), err);
        assertTrue(err.contains("server stopped"), err);
        assertTrue(printed.lines().anyMatch(l -> l.startsWith("leaky model: holdout accuracy ")
                && l.contains(" artefacts are removed")), printed);
        assertTrue(printed.contains("report: " + out.resolve("report.html")), printed);
        assertTrue(printed.contains("report: " + out.resolve("clean").resolve("report.html")), printed);
        assertTrue(printed.lines().anyMatch(l -> l.startsWith("contrast: ")), printed);
        assertFalse(err.contains("Exception"), err);

        JsonNode leaky = json(out.resolve("audit.json"));
        assertEquals("telltale.audit", leaky.get("format").asText());
        assertEquals(2, leaky.get("version").asInt());
        // One artefact per planted artefact: a footer of seven words is one boilerplate artefact.
        for (Plant plant : Plant.values()) {
            List<JsonNode> matching = new ArrayList<>();
            for (JsonNode artefact : leaky.get("artefacts")) {
                boolean planted = false;
                for (JsonNode term : artefact.get("terms")) {
                    planted |= PLANTED_TERMS.get(plant).contains(term.get("term").asText());
                }
                if (planted && plant.kind().equals(artefact.get("kind").asText())
                        && plant.queue().label().equals(artefact.get("label").asText())) {
                    matching.add(artefact);
                }
            }
            assertEquals(1, matching.size(), plant + ": expected one " + plant.kind() + " artefact for "
                    + plant.queue().label() + " among " + leaky.get("artefacts"));
        }
        for (JsonNode artefact : leaky.get("artefacts")) {
            if ("high".equals(artefact.get("severity").asText())) {
                // A high artefact is a planted one: the corpus has no other leakage to find.
                boolean planted = false;
                for (JsonNode term : artefact.get("terms")) {
                    planted |= PLANTED_TERMS.values().stream().anyMatch(set -> set.contains(term.get("term").asText()));
                }
                assertTrue(planted, artefact.toString());
            }
        }

        JsonNode clean = json(out.resolve("clean").resolve("audit.json"));
        for (JsonNode artefact : clean.get("artefacts")) {
            assertFalse("high".equals(artefact.get("severity").asText()), "clean variant: " + artefact);
        }
        for (Path report : List.of(out.resolve("report.html"), out.resolve("clean").resolve("report.html"))) {
            assertTrue(read(report).startsWith("<!DOCTYPE html>"), report.toString());
        }
        assertTrue(Files.exists(out.resolve("models").resolve("support-leaky.json")));
        assertTrue(Files.exists(out.resolve("corpus").resolve("support-clean-holdout.jsonl")));
    }

    @Test
    void anEarlierDemoIsKeptUnlessForced() throws Exception {
        Path out = dir.resolve("demo");
        Files.createDirectories(out);
        Files.writeString(out.resolve("audit.json"), "{}", StandardCharsets.UTF_8);
        Process process = new ProcessBuilder(javaBinary(), "-jar", System.getProperty("telltale.jar"), "demo",
                "--out", out.toString(), "--quiet").redirectErrorStream(true).start();
        String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(process.waitFor(2, TimeUnit.MINUTES), output);
        assertEquals(2, process.exitValue(), output);
        assertTrue(output.contains("--force"), output);
        assertEquals("{}", read(out.resolve("audit.json")));
    }

    private static String javaBinary() {
        return Path.of(System.getProperty("java.home"), "bin", "java").toString();
    }

    private static JsonNode json(Path file) throws IOException {
        return new ObjectMapper().readTree(file.toFile());
    }

    private static String read(Path file) throws IOException {
        return Files.readString(file, StandardCharsets.UTF_8);
    }
}
