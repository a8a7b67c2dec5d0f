package org.telltale.demo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.telltale.text.Document;

class SupportCorpusGeneratorTest {
    private static final Path COMMITTED = Path.of("corpora-demo");
    private static final DemoCorpus STANDARD = SupportCorpusGenerator.standard().generate();

    @Test
    void committedCorpusFilesEqualTheGeneratorOutputForTheCommittedSeed() throws IOException {
        // If this fails, the generator changed: rebuild with `telltale demo --generate corpora-demo`
        // and update corpora-demo/README.md's counts.
        assertArrayEquals(CorpusFiles.jsonLines(STANDARD.leaky()), Files.readAllBytes(COMMITTED.resolve(CorpusFiles.LEAKY)));
        assertArrayEquals(CorpusFiles.jsonLines(STANDARD.clean()), Files.readAllBytes(COMMITTED.resolve(CorpusFiles.CLEAN)));
    }

    @Test
    void committedFilesAreValidJsonLinesWithIdTextAndLabel() throws IOException {
        ObjectMapper json = new ObjectMapper();
        List<String> lines = Files.readAllLines(COMMITTED.resolve(CorpusFiles.LEAKY), StandardCharsets.UTF_8);
        assertEquals(SupportCorpusGenerator.DEFAULT_SIZE, lines.size());
        Set<String> ids = new HashSet<>();
        for (int i = 0; i < lines.size(); i++) {
            JsonNode node = json.readTree(lines.get(i));
            assertEquals(List.of("id", "text", "label"), fieldNames(node), "line " + (i + 1));
            assertTrue(ids.add(node.get("id").asText()), "duplicate id on line " + (i + 1));
            assertEquals(STANDARD.leaky().get(i).text(), node.get("text").asText(), "line " + (i + 1));
        }
    }

    @Test
    void queuesGetTheirWeightedShareOfTheMessages() {
        SupportCorpusGenerator generator = SupportCorpusGenerator.standard();
        int total = 0;
        for (SupportQueue queue : SupportQueue.values()) {
            int n = count(STANDARD.clean(), queue.label());
            // 2000 messages split 30/25/20/15/10 percent (the scenario's documented weights).
            assertEquals(SupportCorpusGenerator.DEFAULT_SIZE * queue.weight() / 100, n, queue.label());
            assertEquals(generator.queueSize(queue), n, queue.label());
            total += n;
        }
        assertEquals(SupportCorpusGenerator.DEFAULT_SIZE, total);
    }

    @Test
    void everyPlantSitsInExactlyItsShareOfItsOwnQueueAndNowhereElse() {
        for (Plant plant : Plant.values()) {
            int queueSize = count(STANDARD.leaky(), plant.queue().label());
            long expected = Math.round(plant.share() * queueSize);
            List<String> carrying = new ArrayList<>();
            for (Document doc : STANDARD.leaky()) {
                if (doc.text().contains(plant.marker())) {
                    assertEquals(plant.queue().label(), doc.label(), plant + " planted in " + doc.id());
                    carrying.add(doc.id());
                }
            }
            assertEquals(expected, carrying.size(), plant.toString());
            assertEquals(STANDARD.planted().get(plant), carrying, plant.toString());
        }
    }

    @Test
    void cleanVariantHasTheSameMessagesWithoutAnyPlant() {
        assertEquals(STANDARD.leaky().size(), STANDARD.clean().size());
        Set<String> plantedIds = new HashSet<>();
        STANDARD.planted().values().forEach(plantedIds::addAll);
        for (int i = 0; i < STANDARD.size(); i++) {
            Document leaky = STANDARD.leaky().get(i);
            Document clean = STANDARD.clean().get(i);
            assertEquals(leaky.id(), clean.id());
            assertEquals(leaky.label(), clean.label());
            for (Plant plant : Plant.values()) {
                assertFalse(clean.text().contains(plant.marker()), plant + " in clean " + clean.id());
            }
            if (plantedIds.contains(leaky.id())) {
                assertSameApartFromSignature(clean.text().lines().toList(), withoutPlants(leaky.text()), leaky.id());
            } else {
                assertEquals(clean.text(), leaky.text(), leaky.id());
            }
        }
    }

    /** Undoes each plant by hand, so the check does not reuse the generator's own code. */
    private static List<String> withoutPlants(String leakyText) {
        List<String> lines = new ArrayList<>();
        for (String line : leakyText.lines().toList()) {
            if (line.equals("[Exported by Casefile Archive 3.2 · retention class B]")
                    || line.matches("https://moves\\.quillmoor\\.example/[a-z0-9]{6}")) {
                continue;
            }
            // The billing form's route code stands where other messages have the general route.
            lines.add(line.equals("X-Intake-Route: ACC7") ? "X-Intake-Route: GEN1" : line.replaceFirst(" \\[HR-\\d{5}\\]$", ""));
        }
        // A footer or link follows a blank separator line that the clean message does not have.
        if (!lines.isEmpty() && lines.get(lines.size() - 1).isEmpty()) {
            lines.remove(lines.size() - 1);
        }
        // The outage agent's signature replaced one of the shared agents' signatures.
        lines.replaceAll(l -> l.equals("> Odile Brandvold | Network Care") ? SHARED_SIGNATURE_PLACEHOLDER : l);
        return lines;
    }

    private static final String SHARED_SIGNATURE_PLACEHOLDER = "> (shared agent signature)";

    private static void assertSameApartFromSignature(List<String> clean, List<String> stripped, String id) {
        assertEquals(clean.size(), stripped.size(), id + "\n" + String.join("\n", stripped));
        Set<String> shared = Set.of("> Ines Haverkamp | Customer Care", "> Jonah Pellegrew | Customer Care",
                "> Quillmoor Customer Care", "> Ravi Anstruther | Customer Care");
        for (int i = 0; i < clean.size(); i++) {
            if (stripped.get(i).equals(SHARED_SIGNATURE_PLACEHOLDER)) {
                assertTrue(shared.contains(clean.get(i)), id + " line " + (i + 1) + ": " + clean.get(i));
            } else {
                assertEquals(clean.get(i), stripped.get(i), id + " line " + (i + 1));
            }
        }
    }

    @Test
    void theSameSeedRebuildsTheSameBytesAndAnotherSeedDoesNot() {
        DemoCorpus a = new SupportCorpusGenerator(7, 400).generate();
        DemoCorpus b = new SupportCorpusGenerator(7, 400).generate();
        DemoCorpus c = new SupportCorpusGenerator(8, 400).generate();
        assertArrayEquals(CorpusFiles.jsonLines(a.leaky()), CorpusFiles.jsonLines(b.leaky()));
        assertNotEquals(a.leaky().get(0).text() + a.leaky().get(1).text(), c.leaky().get(0).text() + c.leaky().get(1).text());
    }

    @Test
    void smallCorporaStillCarryEveryPlantInItsShare() {
        for (long seed = 1; seed <= 20; seed++) {
            DemoCorpus corpus = new SupportCorpusGenerator(seed, SupportCorpusGenerator.MIN_SIZE).generate();
            for (Plant plant : Plant.values()) {
                int queueSize = count(corpus.leaky(), plant.queue().label());
                assertEquals(Math.round(plant.share() * queueSize), corpus.planted().get(plant).size(), "seed " + seed + " " + plant);
            }
        }
    }

    @Test
    void messagesShowTheVarietyOfRealSupportMail() {
        List<Document> docs = STANDARD.clean();
        // Ranges follow from the composer's documented shares (common practice: check a generator
        // by the frequencies it promises, with room for sampling noise).
        assertShare(docs, t -> t.contains("\n> ") && t.contains(" wrote:\n"), 0.40, 0.62, "replies quoting an agent");
        assertShare(docs, t -> t.contains("\n>> "), 0.05, 0.20, "replies quoting the customer's earlier message");
        assertShare(docs, t -> t.contains("---------- Forwarded message ---------"), 0.03, 0.12, "forwarded messages");
        assertShare(docs, t -> t.startsWith("X-Intake-Channel: "), 0.35, 0.55, "intake header blocks");
        assertShare(docs, t -> t.contains("Chat transcript"), 0.10, 0.20, "chat transcripts");
        assertShare(docs, t -> t.contains("Sent from my phone"), 0.03, 0.15, "phone signatures");
        assertShare(docs, t -> t.lines().anyMatch(l -> l.length() > 40 && !l.startsWith("[") && !l.startsWith(">") && l.equals(l.toLowerCase(Locale.ROOT))),
                0.01, 0.10, "writers who never use capitals");
        int shortest = docs.stream().mapToInt(d -> d.text().length()).min().orElseThrow();
        int longest = docs.stream().mapToInt(d -> d.text().length()).max().orElseThrow();
        assertTrue(shortest < 150 && longest > 700, "lengths " + shortest + ".." + longest);
    }

    @Test
    void typosAppearButLeaveNumbersAndAddressesAlone() {
        // A hand-made sentence at a rate of 1 must misspell every plain word of four letters or more.
        String text = "Please refund £12.50 to anna@mail.example today";
        String sloppy = Typos.sprinkle(text, 1.0, new java.util.Random(3));
        String[] before = text.split(" ");
        String[] after = sloppy.split(" ");
        assertEquals(before.length, after.length);
        for (int i = 0; i < before.length; i++) {
            boolean plain = before[i].chars().allMatch(Character::isLetter) && before[i].length() >= 4;
            assertEquals(!plain, before[i].equals(after[i]), before[i] + " -> " + after[i]);
        }
    }

    @Test
    void everyAddressUsesNamesReservedForDocumentation() {
        Pattern email = Pattern.compile("[\\w.+-]+@([\\w.-]+)");
        Pattern url = Pattern.compile("https?://([\\w.-]+)");
        Pattern ipv4 = Pattern.compile("\\b(\\d{1,3})\\.(\\d{1,3})\\.(\\d{1,3})\\.\\d{1,3}\\b");
        Pattern phone = Pattern.compile("\\b07\\d{3} ?\\d{6}\\b");
        for (Document doc : STANDARD.leaky()) {
            for (Pattern p : List.of(email, url)) {
                Matcher m = p.matcher(doc.text());
                while (m.find()) {
                    // RFC 2606 §3 reserves the top-level domain "example" for documentation.
                    assertTrue(m.group(1).endsWith(".example"), doc.id() + ": " + m.group());
                }
            }
            Matcher ip = ipv4.matcher(doc.text());
            while (ip.find()) {
                // RFC 5737 §3: 192.0.2.0/24, 198.51.100.0/24 and 203.0.113.0/24 are for documentation.
                String net = ip.group(1) + "." + ip.group(2) + "." + ip.group(3);
                assertTrue(Set.of("192.0.2", "198.51.100", "203.0.113").contains(net), doc.id() + ": " + ip.group());
            }
            Matcher tel = phone.matcher(doc.text());
            while (tel.find()) {
                // Ofcom sets aside 07700 900000-900999 for drama and examples (from memory).
                assertTrue(tel.group().startsWith("07700 900"), doc.id() + ": " + tel.group());
            }
        }
    }

    private interface TextTest {
        boolean test(String text);
    }

    private static void assertShare(List<Document> docs, TextTest test, double low, double high, String what) {
        long n = docs.stream().filter(d -> test.test(d.text())).count();
        double share = n / (double) docs.size();
        assertTrue(share >= low && share <= high, String.format(Locale.ROOT, "%s: %.3f not in [%.2f, %.2f]", what, share, low, high));
    }

    private static int count(List<Document> docs, String label) {
        return (int) docs.stream().filter(d -> label.equals(d.label())).count();
    }

    private static List<String> fieldNames(JsonNode node) {
        List<String> names = new ArrayList<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }
}
