package org.telltale.overlap;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;

class ShinglerTest {

    @Test
    void countsTheWordShinglesOfASentence() {
        // MMDS §3.2.1: a text of n tokens has n − k + 1 shingles of k tokens.
        assertEquals(4, new Shingler(3).shingles("the quick brown fox jumps over").length);
        assertEquals(1, new Shingler(5).shingles("only three words").length);
        assertEquals(0, new Shingler(5).shingles("  ... !!! ").length);
    }

    @Test
    void jaccardOfHashedShinglesEqualsJaccardOfShingleStrings() {
        // Definition of Jaccard similarity of shingle sets (Broder 1997), computed independently on
        // the shingles as strings: hashing must not change the figure.
        Random random = new Random(7);
        String[] vocabulary = {"refund", "parcel", "late", "order", "invoice", "account", "locked", "password",
            "reset", "delivery", "address", "changed", "please", "help", "thanks"};
        for (int trial = 0; trial < 200; trial++) {
            List<String> a = randomWords(random, vocabulary, 8 + random.nextInt(30));
            List<String> b = new ArrayList<>(a);
            int edits = random.nextInt(6);
            for (int e = 0; e < edits; e++) {
                b.set(random.nextInt(b.size()), vocabulary[random.nextInt(vocabulary.length)]);
            }
            int k = 1 + random.nextInt(5);
            Shingler shingler = new Shingler(k);
            double hashed = Shingler.jaccard(shingler.shingles(String.join(" ", a)), shingler.shingles(String.join(" ", b)));
            assertEquals(stringJaccard(a, b, k), hashed, 1e-12, "trial " + trial);
        }
    }

    @Test
    void reorderedSentencesAndParagraphsKeepTheShingleSet() {
        Shingler shingler = new Shingler(5);
        String original = "My card was charged twice for one ferry ticket. I would like the second charge refunded.\n\n"
                + "The booking reference is on the receipt I attached! Thank you for looking into it.";
        String reordered = "The booking reference is on the receipt I attached! Thank you for looking into it.\n\n"
                + "I would like the second charge refunded. My card was charged twice for one ferry ticket.";
        assertArrayEquals(shingler.shingles(original), shingler.shingles(reordered));
    }

    @Test
    void jaccardFollowsItsDefinitionOnSmallSets() {
        // Definition: |A ∩ B| / |A ∪ B|; MMDS Example 3.1 has |A ∩ B| = 3, |A ∪ B| = 8, SIM = 3/8.
        assertEquals(3.0 / 8.0, Shingler.jaccard(new long[] {1, 2, 3, 4, 5}, new long[] {3, 4, 5, 6, 7, 8}), 1e-15);
        assertEquals(1.0, Shingler.jaccard(new long[0], new long[0]));
        assertEquals(0.0, Shingler.jaccard(new long[] {1}, new long[] {2}));
    }

    private static List<String> randomWords(Random random, String[] vocabulary, int n) {
        List<String> words = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            words.add(vocabulary[random.nextInt(vocabulary.length)]);
        }
        return words;
    }

    private static double stringJaccard(List<String> a, List<String> b, int k) {
        Set<String> sa = shingleStrings(a, k);
        Set<String> sb = shingleStrings(b, k);
        Set<String> inter = new HashSet<>(sa);
        inter.retainAll(sb);
        Set<String> union = new HashSet<>(sa);
        union.addAll(sb);
        return (double) inter.size() / union.size();
    }

    private static Set<String> shingleStrings(List<String> words, int k) {
        Set<String> out = new HashSet<>();
        if (words.size() < k) {
            out.add(String.join(" ", words));
            return out;
        }
        for (int i = 0; i + k <= words.size(); i++) {
            out.add(String.join(" ", words.subList(i, i + k)));
        }
        return out;
    }
}
