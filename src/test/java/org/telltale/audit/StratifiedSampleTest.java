package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class StratifiedSampleTest {

    @Test
    void largestRemainderAllocationByHand() {
        // Hamilton's method by hand: 10 places over strata of 60, 30, 10 after one place each:
        // 7 left, quotas 7·0.6 = 4.2, 7·0.3 = 2.1, 7·0.1 = 0.7 → 4, 2, 0 with 1 left for the
        // largest remainder (0.7) → totals 1+4, 1+2, 1+0+1 = 5, 3, 2.
        assertArrayEquals(new int[] {5, 3, 2}, StratifiedSample.allocate(new long[] {60, 30, 10}, 10));
        // 10 over 100 and 2: one each, 8 left, quotas 7.84 and 0.16 → 7 and 0, the last place to
        // the larger remainder (0.84) → 9, 1.
        assertArrayEquals(new int[] {9, 1}, StratifiedSample.allocate(new long[] {100, 2}, 10));
        // A stratum never gets more than it holds; the rest flows to the others.
        assertArrayEquals(new int[] {2, 498}, StratifiedSample.allocate(new long[] {2, 1000}, 500));
        assertArrayEquals(new int[] {3, 3, 1}, StratifiedSample.allocate(new long[] {3, 3, 1}, 7));
        // Fewer places than strata: the largest strata first.
        assertArrayEquals(new int[] {0, 1, 1}, StratifiedSample.allocate(new long[] {5, 9, 7}, 2));
        // Everything, when the corpus is smaller than the sample.
        assertArrayEquals(new int[] {3, 1}, StratifiedSample.allocate(new long[] {3, 1}, 10));
    }

    @Test
    void sampleIgnoresCorpusOrderAndCoversRareStrata() {
        List<String[]> rows = new ArrayList<>();
        for (int i = 0; i < 1000; i++) {
            String predicted = i % 4 == 0 ? "outage" : "billing";
            String gold = i % 50 == 0 ? (predicted.equals("outage") ? "billing" : "outage") : predicted;
            rows.add(new String[] {"doc-" + i, predicted, gold});
        }
        StratifiedSample forward = new StratifiedSample(40, 11);
        rows.forEach(r -> forward.offer(r[0], r[1], r[2]));
        List<String[]> shuffled = new ArrayList<>(rows);
        Collections.shuffle(shuffled, new Random(5));
        StratifiedSample backward = new StratifiedSample(40, 11);
        shuffled.forEach(r -> backward.offer(r[0], r[1], r[2]));
        assertEquals(forward.ids(), backward.ids());
        assertEquals(40, forward.ids().size());
        assertEquals(40, new HashSet<>(forward.ids()).size());
        // i % 50 == 0 and i % 4 == 0 → outage predicted, wrong; it is rare (10 of 1000) but sampled.
        assertTrue(forward.ids().stream().anyMatch(id -> {
            int i = Integer.parseInt(id.substring(4));
            return i % 50 == 0 && i % 4 == 0;
        }));
        StratifiedSample otherSeed = new StratifiedSample(40, 12);
        rows.forEach(r -> otherSeed.offer(r[0], r[1], r[2]));
        assertNotEquals(forward.ids(), otherSeed.ids());
    }

    @Test
    void samplesOfPartsMergeIntoTheSampleOfTheWholeAlsoAfterSerialization() throws Exception {
        // Bottom-k samples are mergeable (Cohen and Kaplan, "Summarizing data using bottom-k
        // sketches", PODC 2007): the k lowest of a union are among the k lowest of each part.
        List<String[]> rows = new ArrayList<>();
        for (int i = 0; i < 1000; i++) {
            String predicted = i % 3 == 0 ? "outage" : i % 3 == 1 ? "billing" : "other";
            rows.add(new String[] {"doc-" + i, predicted, i % 7 == 0 ? "billing" : predicted});
        }
        StratifiedSample whole = new StratifiedSample(30, 5);
        rows.forEach(r -> whole.offer(r[0], r[1], r[2]));
        StratifiedSample merged = new StratifiedSample(30, 5);
        Random random = new Random(9);
        List<StratifiedSample> parts = new ArrayList<>();
        for (int p = 0; p < 4; p++) {
            parts.add(new StratifiedSample(30, 5));
        }
        rows.forEach(r -> parts.get(random.nextInt(4)).offer(r[0], r[1], r[2]));
        for (StratifiedSample part : parts) {
            java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
            try (java.io.ObjectOutputStream out = new java.io.ObjectOutputStream(bytes)) {
                out.writeObject(part);
            }
            try (java.io.ObjectInputStream in = new java.io.ObjectInputStream(new java.io.ByteArrayInputStream(bytes.toByteArray()))) {
                merged.merge((StratifiedSample) in.readObject());
            }
        }
        assertEquals(whole.strata(), merged.strata());
        assertEquals(whole.ids(), merged.ids());
        assertEquals(30, merged.ids().size());
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> merged.merge(new StratifiedSample(30, 6)));
    }
}
