package org.telltale;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** Keeps the package arrows of ARCHITECTURE.md pointing one way (common practice: layered imports). */
class ArchitectureTest {
    private static final Path MAIN = Path.of("src/main/java/org/telltale");

    /** package -> packages it must never import. */
    private static final Map<String, List<String>> FORBIDDEN = Map.of(
            "text", List.of("model", "connect", "explain", "audit", "overlap", "report", "serve", "cli"),
            "model", List.of("connect", "explain", "audit", "overlap", "report", "serve", "cli"),
            "connect", List.of("explain", "audit", "overlap", "report", "serve", "cli"),
            "explain", List.of("connect", "audit", "overlap", "report", "serve", "cli"),
            "audit", List.of("connect", "report", "serve", "cli"),
            "overlap", List.of("explain", "audit", "report", "serve", "cli", "connect"),
            "report", List.of("connect", "serve", "cli"),
            "serve", List.of("explain", "audit", "overlap", "report", "cli"),
            "demo", List.of("cli"),
            // The strict JSON reader serves every package, so it depends on none of them.
            "json", List.of("text", "model", "connect", "explain", "audit", "overlap", "report", "serve", "demo", "cli"));

    @Test
    void picocliIsImportedOnlyInCli() throws IOException {
        List<String> offenders = new ArrayList<>();
        for (Path file : javaFiles()) {
            if (!file.startsWith(MAIN.resolve("cli")) && read(file).contains("import picocli")) {
                offenders.add(file.toString());
            }
        }
        assertTrue(offenders.isEmpty(), "picocli outside cli: " + offenders);
    }

    @Test
    void packagesImportOnlyDownward() throws IOException {
        List<String> offenders = new ArrayList<>();
        for (Path file : javaFiles()) {
            String pkg = MAIN.relativize(file).getName(0).toString();
            String source = read(file);
            for (String banned : FORBIDDEN.getOrDefault(pkg, List.of())) {
                if (source.contains("import org.telltale." + banned + ".")
                        || source.contains("import static org.telltale." + banned + ".")) {
                    offenders.add(file + " imports " + banned);
                }
            }
        }
        assertTrue(offenders.isEmpty(), String.join("\n", offenders));
    }

    private static List<Path> javaFiles() throws IOException {
        try (Stream<Path> walk = Files.walk(MAIN)) {
            return walk.filter(p -> p.toString().endsWith(".java") && MAIN.relativize(p).getNameCount() > 1).toList();
        }
    }

    private static String read(Path file) throws IOException {
        return Files.readString(file, StandardCharsets.UTF_8);
    }
}
