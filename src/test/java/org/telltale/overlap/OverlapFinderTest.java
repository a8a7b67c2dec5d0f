package org.telltale.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;
import org.telltale.TelltaleException;
import org.telltale.text.Document;

class OverlapFinderTest {
    private static final OverlapSettings SETTINGS = new OverlapSettings(0.8, 5, 128, null, 11L, 2, false);

    @Test
    void findsPlantedNearDuplicatesAndNothingAmongUnrelatedTickets() {
        // Acceptance check of the overlap issue (common practice for near-duplicate detection,
        // MMDS §3.4): recall ≥ 0.95 of planted pairs at or above the threshold, no false pair.
        SupportTickets tickets = new SupportTickets(2026);
        List<Document> train = new ArrayList<>();
        List<Document> test = new ArrayList<>();
        for (int i = 0; i < 600; i++) {
            train.add(new Document("tr-" + i, tickets.ticket(), tickets.label()));
            test.add(new Document("te-" + i, tickets.ticket(), tickets.label()));
        }
        Map<String, String> planted = new HashMap<>(); // test id -> train id
        Map<String, String> drift = new HashMap<>();
        int conflictingPlanted = 0;
        for (int i = 0; i < 300; i++) {
            Document original = train.get(i);
            String[] drifted = tickets.drift(original.text());
            boolean relabel = i % 10 == 0;
            String label = relabel ? "billing".equals(original.label()) ? "booking" : "billing" : original.label();
            conflictingPlanted += relabel ? 1 : 0;
            String id = "copy-" + i;
            test.add(new Document(id, drifted[1], label));
            planted.put(id, original.id());
            drift.put(id, drifted[0]);
        }
        OverlapResult result = find(train, test);

        Map<String, Document> byId = new HashMap<>();
        train.forEach(d -> byId.put(d.id(), d));
        test.forEach(d -> byId.put(d.id(), d));
        Shingler shingler = new Shingler(5);
        int above = 0;
        int found = 0;
        Set<String> foundCopies = new HashSet<>();
        for (OverlapPair pair : result.pairs(PairKind.TRAIN_TEST)) {
            assertEquals(planted.get(pair.second()), pair.first(), "false pair " + pair);
            assertTrue(pair.similarity() >= 0.8, pair.toString());
            foundCopies.add(pair.second());
        }
        List<String> missed = new ArrayList<>();
        for (Map.Entry<String, String> e : planted.entrySet()) {
            double truth = Shingler.jaccard(shingler.shingles(byId.get(e.getKey()).text()),
                    shingler.shingles(byId.get(e.getValue()).text()));
            if (truth >= 0.8) {
                above++;
                if (foundCopies.contains(e.getKey())) {
                    found++;
                } else {
                    missed.add(e.getKey() + " (" + drift.get(e.getKey()) + ", J=" + truth + ")");
                }
            }
        }
        assertTrue(above >= 0.9 * planted.size(), "planted pairs at or above the threshold: " + above);
        assertTrue(found >= 0.95 * above, "recall " + found + "/" + above + ", missed " + missed);
        assertTrue(result.pairs(PairKind.WITHIN_TRAIN).isEmpty(), result.pairs(PairKind.WITHIN_TRAIN).toString());
        assertTrue(result.pairs(PairKind.WITHIN_TEST).isEmpty(), result.pairs(PairKind.WITHIN_TEST).toString());
        assertEquals(foundCopies.size(), result.summary().testSeen());
        long conflictingFound = foundCopies.stream().filter(id -> id.endsWith("0") && Integer.parseInt(id.substring(5)) % 10 == 0).count();
        assertEquals(conflictingFound, result.summary().testSeenConflicting());
        assertTrue(conflictingFound >= 0.9 * conflictingPlanted);
    }

    @Test
    void agreesWithBruteForceJaccardOverAllPairs() {
        // Ground truth by brute force: exact Jaccard of every pair of documents (definition,
        // Broder 1997); banding may only miss pairs, with recall ≥ 0.95, and never invent one.
        SupportTickets tickets = new SupportTickets(77);
        List<Document> train = new ArrayList<>();
        List<Document> test = new ArrayList<>();
        List<Document> all = new ArrayList<>();
        for (int i = 0; i < 150; i++) {
            String base = tickets.ticket();
            train.add(new Document("a" + i, base, null));
            if (i % 2 == 0) {
                test.add(new Document("b" + i, tickets.wordEdit(tickets.wordEdit(base)), null));
            }
            if (i % 5 == 0) {
                train.add(new Document("a" + i + "x", tickets.wordEdit(base), null));
            }
        }
        all.addAll(train);
        all.addAll(test);
        OverlapResult result = find(train, test);
        Shingler shingler = new Shingler(5);
        Set<String> truth = new HashSet<>();
        for (int i = 0; i < all.size(); i++) {
            for (int j = i + 1; j < all.size(); j++) {
                double s = Shingler.jaccard(shingler.shingles(all.get(i).text()), shingler.shingles(all.get(j).text()));
                if (s >= 0.8) {
                    truth.add(all.get(i).id() + "|" + all.get(j).id());
                }
            }
        }
        Set<String> reported = new HashSet<>();
        for (OverlapPair pair : result.pairs()) {
            reported.add(pair.first() + "|" + pair.second());
        }
        assertTrue(truth.containsAll(reported), "reported but below threshold: " + minus(reported, truth));
        assertTrue(truth.size() > 30, "truth pairs " + truth.size());
        assertTrue(reported.size() >= 0.95 * truth.size(), "recall " + reported.size() + "/" + truth.size());
    }

    @Test
    void reportsExactDuplicatesWithinEachSetAndAcrossWithLabels() {
        List<Document> train = List.of(
                new Document("t1", "My cabin key card stopped working on the night crossing.", "booking"),
                new Document("t2", "MY CABIN KEY CARD   stopped working on the night crossing.", "booking"),
                new Document("t3", "The deck chair was broken and I want compensation for it now.", "billing"),
                new Document("t4", "   ", "billing"));
        List<Document> test = List.of(
                new Document("s1", "> my cabin key card stopped working on the night crossing.", "lost-property"),
                new Document("s2", "A wholly different question about bicycle spaces on the morning boat.", "booking"),
                new Document("s3", "A wholly different question about bicycle spaces on the morning boat.", null));
        OverlapResult result = find(train, test);
        List<OverlapPair> cross = result.pairs(PairKind.TRAIN_TEST);
        assertEquals(2, cross.size(), cross.toString());
        for (OverlapPair pair : cross) {
            assertEquals("s1", pair.second());
            assertTrue(pair.exact());
            assertEquals(1.0, pair.similarity());
            assertFalse(pair.sameLabel());
        }
        OverlapPair withinTrain = result.pairs(PairKind.WITHIN_TRAIN).get(0);
        assertEquals("t1", withinTrain.first());
        assertEquals("t2", withinTrain.second());
        assertTrue(withinTrain.sameLabel());
        OverlapPair withinTest = result.pairs(PairKind.WITHIN_TEST).get(0);
        assertEquals(null, withinTest.sameLabel());
        OverlapSummary summary = result.summary();
        assertEquals(4, summary.trainDocuments());
        assertEquals(1, summary.trainEmpty());
        assertEquals(1, summary.testSeen());
        assertEquals(1, summary.testSeenExact());
        assertEquals(1, summary.testSeenConflicting());
        assertEquals(2, summary.trainSeen());
        assertEquals(2, summary.exactTrainTestPairs());
        assertEquals(1, summary.withinTrainPairs());
        assertEquals(1, summary.withinTestPairs());
        assertEquals(java.util.Set.of("s1"), result.seenTestIds());
    }

    @Test
    void nearPairsOfExactGroupsExpandToEveryMember() {
        String base = "The ferry from the north port left two hours late and we missed our train connection home. "
                + "Nobody on board could tell us when we would arrive, and the cafe had closed too. "
                + "We had booked this crossing weeks ago precisely because it matched the last train. "
                + "I would like to know what Harbourline offers passengers who miss connections like this.";
        String near = base.replace("two hours", "three hours");
        List<Document> train = List.of(new Document("a", base, "x"), new Document("b", base.toUpperCase(java.util.Locale.ROOT), "x"));
        List<Document> test = List.of(new Document("c", near, "x"), new Document("d", near + "  ", "y"));
        OverlapResult result = find(train, test);
        List<OverlapPair> cross = result.pairs(PairKind.TRAIN_TEST);
        assertEquals(4, cross.size(), cross.toString());
        double expected = Shingler.jaccard(new Shingler(5).shingles(base), new Shingler(5).shingles(near));
        for (OverlapPair pair : cross) {
            assertFalse(pair.exact());
            assertEquals(expected, pair.similarity(), 1e-12);
        }
        assertEquals(1, result.summary().testSeenConflicting());
    }

    @Test
    void keepsTextsOfPairedDocumentsWhenAsked() {
        List<Document> train = List.of(new Document("a", "Lost a blue umbrella on the evening sailing.", null),
                new Document("z", "Unrelated question about pets in cabins on long routes.", null));
        List<Document> test = List.of(new Document("b", "lost a BLUE umbrella on the evening sailing.", null));
        OverlapResult result = new OverlapFinder(SETTINGS.withKeepTexts(true), s -> { }).find(
                DocumentSource.of("train", train), DocumentSource.of("test", test));
        assertEquals(Map.of("a", "Lost a blue umbrella on the evening sailing."), result.trainTexts());
        assertEquals(Map.of("b", "lost a BLUE umbrella on the evening sailing."), result.testTexts());
    }

    @Test
    void failsWithThePlaceWhenACorpusChangesBetweenReadings() {
        List<Document> first = List.of(new Document("a", "Refund my ticket for the cancelled crossing please.", null),
                new Document("b", "Refund my ticket for the cancelled crossing please!", null));
        List<Document> second = List.of(new Document("a", "Refund my ticket for the cancelled crossing please.", null),
                new Document("q", "Something else entirely.", null));
        int[] reads = {0};
        DocumentSource changing = new DocumentSource() {
            @Override
            public String name() {
                return "train.jsonl";
            }

            @Override
            public void forEach(Consumer<? super Document> sink) {
                (reads[0]++ == 0 ? first : second).forEach(sink);
            }
        };
        TelltaleException e = assertThrows(TelltaleException.class, () -> new OverlapFinder(SETTINGS, s -> { })
                .find(changing, DocumentSource.of("test", List.of())));
        assertTrue(e.getMessage().contains("train.jsonl") && e.getMessage().contains("document 2")
                && e.getMessage().contains("q"), e.getMessage());
    }

    @Test
    void resultsDoNotDependOnTheNumberOfThreads() {
        SupportTickets tickets = new SupportTickets(5);
        List<Document> train = new ArrayList<>();
        List<Document> test = new ArrayList<>();
        for (int i = 0; i < 3000; i++) {
            String t = tickets.ticket();
            train.add(new Document("a" + i, t, null));
            if (i % 3 == 0) {
                test.add(new Document("b" + i, tickets.drift(t)[1], null));
            }
        }
        OverlapResult one = new OverlapFinder(new OverlapSettings(0.8, 5, 128, null, 3L, 1, false), s -> { })
                .find(DocumentSource.of("train", train), DocumentSource.of("test", test));
        OverlapResult two = new OverlapFinder(new OverlapSettings(0.8, 5, 128, null, 3L, 2, false), s -> { })
                .find(DocumentSource.of("train", train), DocumentSource.of("test", test));
        assertEquals(one.pairs(), two.pairs());
        assertTrue(one.pairs().size() > 900);
    }

    private static OverlapResult find(List<Document> train, List<Document> test) {
        return new OverlapFinder(SETTINGS, s -> { }).find(DocumentSource.of("train", train), DocumentSource.of("test", test));
    }

    private static Set<String> minus(Set<String> a, Set<String> b) {
        Set<String> out = new HashSet<>(a);
        out.removeAll(b);
        return out;
    }
}
