package org.telltale.model;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A stratified, seeded holdout: within each label, the documents with the smallest
 * {@code hash(seed, id)} are held out, {@code round(fraction * n_label)} of them, but never all of
 * a label. Because the choice depends only on the seed and the ids, it does not change when the
 * corpus is reordered or documents of other labels are added.
 */
public final class HoldoutSplit {
    private HoldoutSplit() {
    }

    /**
     * @param ids      document ids, unique
     * @param labels   gold labels in the same order
     * @param fraction share of each label to hold out, in [0, 1)
     * @return the positions held out
     */
    public static BitSet choose(List<String> ids, List<String> labels, double fraction, long seed) {
        if (!(fraction >= 0 && fraction < 1)) {
            throw new IllegalArgumentException("holdout fraction must be in [0, 1): " + fraction);
        }
        Map<String, List<Integer>> byLabel = new LinkedHashMap<>();
        for (int i = 0; i < ids.size(); i++) {
            byLabel.computeIfAbsent(labels.get(i), l -> new ArrayList<>()).add(i);
        }
        long[] keys = new long[ids.size()];
        for (int i = 0; i < keys.length; i++) {
            keys[i] = mix(seed ^ fnv1a64(ids.get(i)));
        }
        BitSet holdout = new BitSet(ids.size());
        for (List<Integer> members : byLabel.values()) {
            int n = members.size();
            int take = Math.min((int) Math.floor(fraction * n + 0.5), n - 1);
            members.sort(Comparator.<Integer>comparingLong(i -> keys[i]).thenComparing(ids::get));
            for (int k = 0; k < take; k++) {
                holdout.set(members.get(k));
            }
        }
        return holdout;
    }

    /** FNV-1a, 64 bits, over the UTF-8 bytes (Fowler, Noll and Vo; offset basis and prime of the published spec). */
    static long fnv1a64(String s) {
        long h = 0xcbf29ce484222325L;
        for (byte b : s.getBytes(StandardCharsets.UTF_8)) {
            h ^= b & 0xff;
            h *= 0x100000001b3L;
        }
        return h;
    }

    /** The SplitMix64 finaliser (Steele, Lea and Flood, OOPSLA 2014), so nearby ids land far apart. */
    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }
}
