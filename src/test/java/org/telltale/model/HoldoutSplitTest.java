package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

class HoldoutSplitTest {
    @Test
    void fnvMatchesThePublishedTestVectors() {
        // FNV-1a 64-bit test vectors of the FNV reference (from memory: "" is the offset basis).
        assertEquals(0xcbf29ce484222325L, HoldoutSplit.fnv1a64(""));
        assertEquals(0xaf63dc4c8601ec8cL, HoldoutSplit.fnv1a64("a"));
        assertEquals(0x85944171f73967e8L, HoldoutSplit.fnv1a64("foobar"));
    }

    private static List<String> ids(int n, String prefix) {
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            ids.add(prefix + i);
        }
        return ids;
    }

    @Test
    void holdsOutTheRoundedShareOfEachLabelButNeverAllOfOne() {
        List<String> ids = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        int[] sizes = {50, 7, 1, 2};
        for (int c = 0; c < sizes.length; c++) {
            for (String id : ids(sizes[c], "L" + c + "-")) {
                ids.add(id);
                labels.add("L" + c);
            }
        }
        BitSet held = HoldoutSplit.choose(ids, labels, 0.3, 4);
        int[] heldPer = new int[sizes.length];
        held.stream().forEach(i -> heldPer[Integer.parseInt(labels.get(i).substring(1))]++);
        // round(0.3 n): 15 of 50, 2 of 7, none of 1, 1 of 2 (capped at n - 1) — common practice.
        assertEquals(15, heldPer[0]);
        assertEquals(2, heldPer[1]);
        assertEquals(0, heldPer[2]);
        assertEquals(1, heldPer[3]);
    }

    @Test
    void choiceDependsOnSeedAndIdsNotOnOrder() {
        List<String> ids = ids(200, "doc-");
        List<String> labels = Collections.nCopies(200, "x");
        Set<String> first = heldIds(ids, labels, 11);
        List<String> shuffled = new ArrayList<>(ids);
        Collections.shuffle(shuffled, new java.util.Random(3));
        assertEquals(first, heldIds(shuffled, labels, 11));
        assertNotEquals(first, heldIds(ids, labels, 12));
        assertEquals(40, first.size());
    }

    private static Set<String> heldIds(List<String> ids, List<String> labels, long seed) {
        Set<String> out = new HashSet<>();
        HoldoutSplit.choose(ids, labels, 0.2, seed).stream().forEach(i -> out.add(ids.get(i)));
        return out;
    }
}
