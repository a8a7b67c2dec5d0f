import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.telltale.overlap.Shingler;

/**
 * Benchmark corpus for `telltale overlap` (run by bench/overlap.sh): seeded synthetic short
 * support tickets of an invented ferry operator, with planted near duplicates, and the recall
 * of a finished run against the planted truth.
 *
 *   java -cp target/telltale.jar bench/OverlapBench.java generate DIR TRAIN TEST PLANTED SEED
 *   java -cp target/telltale.jar bench/OverlapBench.java score DIR THRESHOLD
 */
public class OverlapBench {
    static final String[] LABELS = {"billing", "booking", "lost-property", "accessibility", "complaint"};
    static final String[] COMMON = {"the", "my", "to", "and", "is", "for", "on", "we", "a", "it", "ferry",
        "ticket", "crossing", "please", "refund", "cabin", "port", "deck"};
    static final String[] SYLLABLES = {"ka", "lo", "mer", "ti", "sun", "dra", "vel", "po", "ris", "an", "ob",
        "ul", "ze", "fin", "gor", "hal", "que", "wy", "es", "tor", "bri", "nak", "sel", "mu"};

    public static void main(String[] args) throws IOException {
        if (args.length >= 6 && args[0].equals("generate")) {
            generate(Path.of(args[1]), Integer.parseInt(args[2]), Integer.parseInt(args[3]), Integer.parseInt(args[4]),
                    Long.parseLong(args[5]));
        } else if (args.length >= 3 && args[0].equals("score")) {
            score(Path.of(args[1]), Double.parseDouble(args[2]));
        } else {
            System.err.println("usage: generate DIR TRAIN TEST PLANTED SEED | score DIR THRESHOLD");
            System.exit(2);
        }
    }

    // ---- generation ----

    static final class Tickets {
        final Random random;
        final List<String> lexicon = new ArrayList<>();

        Tickets(long seed) {
            random = new Random(seed);
            Set<String> seen = new HashSet<>();
            while (lexicon.size() < 30000) {
                StringBuilder w = new StringBuilder();
                int parts = 2 + random.nextInt(3);
                for (int p = 0; p < parts; p++) {
                    w.append(SYLLABLES[random.nextInt(SYLLABLES.length)]);
                }
                if (seen.add(w.toString())) {
                    lexicon.add(w.toString());
                }
            }
        }

        /** A short ticket: 3–5 sentences of 6–12 words, about 40 words. */
        String ticket() {
            List<String> sentences = new ArrayList<>();
            int n = 3 + random.nextInt(3);
            for (int s = 0; s < n; s++) {
                sentences.add(sentence());
            }
            return join(sentences);
        }

        String sentence() {
            int n = 6 + random.nextInt(7);
            StringBuilder out = new StringBuilder();
            for (int w = 0; w < n; w++) {
                String word = random.nextInt(10) < 3 ? COMMON[random.nextInt(COMMON.length)] : lexicon.get(random.nextInt(lexicon.size()));
                if (w == 0) {
                    word = Character.toUpperCase(word.charAt(0)) + word.substring(1);
                } else {
                    out.append(' ');
                }
                out.append(word);
            }
            return out.append(".!?".charAt(random.nextInt(3))).toString();
        }

        String join(List<String> sentences) {
            StringBuilder out = new StringBuilder();
            for (int s = 0; s < sentences.size(); s++) {
                out.append(s == 0 ? "" : s % 2 == 0 ? "\n\n" : " ").append(sentences.get(s));
            }
            return out.toString();
        }

        String label() {
            return LABELS[random.nextInt(LABELS.length)];
        }

        /** A drifted copy and the name of the drift. */
        String[] drift(String t) {
            return switch (random.nextInt(6)) {
                case 0 -> new String[] {"word-edit", wordEdit(t)};
                case 1 -> new String[] {"quoted", quoted(t)};
                case 2 -> new String[] {"reordered", reordered(t)};
                case 3 -> new String[] {"recased", random.nextBoolean() ? t.toUpperCase(Locale.ROOT) : t.toLowerCase(Locale.ROOT)};
                case 4 -> new String[] {"rewrapped", rewrapped(t)};
                default -> new String[] {"added-sentence", t + " " + sentence()};
            };
        }

        String wordEdit(String t) {
            String[] words = t.split(" ", -1);
            int at = random.nextInt(words.length);
            words[at] = lexicon.get(random.nextInt(lexicon.size())) + words[at].replaceAll("^[\\p{L}\\p{N}]+", "");
            return String.join(" ", words);
        }

        String quoted(String t) {
            StringBuilder out = new StringBuilder(random.nextBoolean() ? "On Monday the passenger wrote:\n" : "");
            for (String line : t.split("\n", -1)) {
                out.append(line.isEmpty() ? ">" : "> " + line).append('\n');
            }
            return out.toString();
        }

        String reordered(String t) {
            List<String> s = new ArrayList<>(List.of(t.split("(?<=[.!?])\\s+")));
            java.util.Collections.shuffle(s, random);
            return join(s);
        }

        String rewrapped(String t) {
            int width = 25 + random.nextInt(30);
            StringBuilder out = new StringBuilder("  ");
            int column = 0;
            for (String word : t.split(" ")) {
                if (column > 0 && column + word.length() > width) {
                    out.append('\n');
                    column = 0;
                } else if (column > 0) {
                    out.append(random.nextInt(4) == 0 ? " \t " : " ");
                }
                out.append(word);
                column += word.length() + 1;
            }
            return out.append("\n").toString();
        }
    }

    static void generate(Path dir, int trainSize, int testSize, int planted, long seed) throws IOException {
        Files.createDirectories(dir);
        Tickets tickets = new Tickets(seed);
        ObjectMapper json = new ObjectMapper();
        Shingler shingler = new Shingler(5);
        String[] trainTexts = new String[trainSize];
        try (BufferedWriter train = Files.newBufferedWriter(dir.resolve("train.jsonl"), StandardCharsets.UTF_8)) {
            for (int i = 0; i < trainSize; i++) {
                trainTexts[i] = tickets.ticket();
                line(json, train, "tr-" + i, trainTexts[i], tickets.label());
            }
        }
        try (BufferedWriter test = Files.newBufferedWriter(dir.resolve("test.jsonl"), StandardCharsets.UTF_8);
             BufferedWriter truth = Files.newBufferedWriter(dir.resolve("truth.tsv"), StandardCharsets.UTF_8)) {
            // The planted copies are spread through the test set at random positions.
            Set<Integer> copyAt = new HashSet<>();
            while (copyAt.size() < planted) {
                copyAt.add(tickets.random.nextInt(testSize));
            }
            for (int i = 0; i < testSize; i++) {
                if (copyAt.contains(i)) {
                    int source = tickets.random.nextInt(trainSize);
                    String[] drifted = tickets.drift(trainTexts[source]);
                    double similarity = Shingler.jaccard(shingler.shingles(trainTexts[source]), shingler.shingles(drifted[1]));
                    line(json, test, "te-" + i, drifted[1], tickets.label());
                    truth.write("tr-" + source + "\tte-" + i + "\t" + drifted[0] + "\t" + similarity + "\n");
                } else {
                    line(json, test, "te-" + i, tickets.ticket(), tickets.label());
                }
            }
        }
    }

    static void line(ObjectMapper json, BufferedWriter out, String id, String text, String label) throws IOException {
        out.write(json.writeValueAsString(Map.of("id", id, "text", text, "label", label)));
        out.write('\n');
    }

    // ---- scoring ----

    static void score(Path dir, double threshold) throws IOException {
        Set<String> found = new HashSet<>();
        JsonNode root = new ObjectMapper().readTree(dir.resolve("overlap.json").toFile());
        for (JsonNode pair : root.get("pairs")) {
            found.add(pair.get("train").asText() + "\t" + pair.get("test").asText());
        }
        Map<String, int[]> byDrift = new HashMap<>(); // drift -> {above threshold, found}
        int above = 0;
        int hit = 0;
        Set<String> planted = new HashSet<>();
        for (String line : Files.readAllLines(dir.resolve("truth.tsv"), StandardCharsets.UTF_8)) {
            String[] f = line.split("\t");
            String key = f[0] + "\t" + f[1];
            planted.add(key);
            if (Double.parseDouble(f[3]) >= threshold) {
                above++;
                int[] d = byDrift.computeIfAbsent(f[2], k -> new int[2]);
                d[0]++;
                if (found.contains(key)) {
                    hit++;
                    d[1]++;
                }
            }
        }
        long unplanted = found.stream().filter(k -> !planted.contains(k)).count();
        System.out.printf(Locale.ROOT, "planted %d, at or above %.2f: %d, found %d, recall %.4f; reported pairs not planted: %d%n",
                planted.size(), threshold, above, hit, above == 0 ? Double.NaN : (double) hit / above, unplanted);
        byDrift.entrySet().stream().sorted(Map.Entry.comparingByKey()).forEach(e -> System.out.printf(Locale.ROOT,
                "  %-15s %6d above threshold, recall %.4f%n", e.getKey(), e.getValue()[0], (double) e.getValue()[1] / e.getValue()[0]));
    }
}
