package org.telltale;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
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

    /**
     * Core code names a setting in its own words, and only the fronts write option names
     * (DEVELOPERS.md, "Validating a setting"): no string literal outside cli holds {@code --name},
     * and every placeholder {@code {name}} in one is a setting {@link OptionWords} can render.
     */
    @Test
    void coreCodeWritesNoOptionNamesOnlyPlaceholdersTheFrontsRender() throws IOException {
        Pattern literal = Pattern.compile("\"(?:[^\"\\\\]|\\\\.)*\"");
        Pattern option = Pattern.compile("--(?!tt-)[a-z]"); // --tt-…: the reports' CSS custom properties (Palette)
        Pattern placeholder = Pattern.compile("\\{([a-z][A-Za-z0-9]*)\\}");
        // The demo generator's document templates fill slots of their own ("charged twice for {month}").
        List<Path> ownSlots = List.of(MAIN.resolve("demo/Phrasebook.java"), MAIN.resolve("demo/MessageComposer.java"));
        List<String> offenders = new ArrayList<>();
        for (Path file : javaFiles()) {
            if (file.startsWith(MAIN.resolve("cli"))) {
                continue;
            }
            boolean slots = ownSlots.contains(file);
            List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
            for (int i = 0; i < lines.size(); i++) {
                String line = lines.get(i).strip();
                if (line.startsWith("*") || line.startsWith("/*") || line.startsWith("//")) {
                    continue;
                }
                Matcher m = literal.matcher(line);
                while (m.find()) {
                    String text = m.group();
                    if (option.matcher(text).find()) {
                        offenders.add(file + ":" + (i + 1) + ": option name in " + text);
                    }
                    Matcher p = placeholder.matcher(text);
                    while (!slots && p.find()) {
                        if (!OptionWords.knows(p.group(1))) {
                            offenders.add(file + ":" + (i + 1) + ": no setting '" + p.group(1) + "' in OptionWords: " + text);
                        }
                    }
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
