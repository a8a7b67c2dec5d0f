package org.telltale.audit;

import java.io.Serializable;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.PriorityQueue;
import java.util.TreeMap;

/**
 * Chooses N documents to explain while the corpus streams past, stratified by predicted label and,
 * where gold labels exist, by whether the prediction is correct. Each document gets a priority
 * from the run seed and its id alone, and each stratum keeps its N lowest priorities, so the
 * sample depends neither on corpus order nor on resumption, and memory stays at N ids per stratum.
 * At the end every non-empty stratum gets at least one place (when N allows) and the rest are
 * shared in proportion to stratum size, largest remainder first (Hamilton's method).
 *
 * <p>Samples of disjoint parts of a corpus, each drawn with the same size and seed, {@link #merge}
 * into the sample of the whole: a stratum's N lowest priorities are among the N lowest of each
 * part. Serializable, so that a distributed front can draw one per partition. Not thread-safe.
 */
public final class StratifiedSample implements Serializable {
    private static final long serialVersionUID = 1L;

    private record Candidate(String id, long priority) implements Serializable {
    }

    private static final Comparator<Candidate> BY_PRIORITY = (Comparator<Candidate> & Serializable) (a, b) ->
            a.priority != b.priority ? Long.compare(a.priority, b.priority) : a.id.compareTo(b.id);

    private final int size;
    private final long seed;
    /** Stratum key -> the lowest priorities so far, as a max-heap; TreeMap for a stable order. */
    private final Map<String, PriorityQueue<Candidate>> strata = new TreeMap<>();
    private final Map<String, Long> counts = new TreeMap<>();

    public StratifiedSample(int size, long seed) {
        if (size < 1) {
            throw new IllegalArgumentException("sample size must be >= 1: " + size);
        }
        this.size = size;
        this.seed = seed;
    }

    /** Offers one scored document; {@code gold} is {@code null} when the corpus has no label for it. */
    public void offer(String id, String predicted, String gold) {
        String stratum = predicted + (gold == null ? "" : gold.equals(predicted) ? " correct" : " incorrect");
        counts.merge(stratum, 1L, Long::sum);
        keep(stratum, new Candidate(id, priority(seed, id)));
    }

    /** Adds the documents offered to {@code other}, a sample of the same size and seed over other documents. */
    public void merge(StratifiedSample other) {
        if (other.size != size || other.seed != seed) {
            throw new IllegalArgumentException("samples of size " + size + ", seed " + seed + " and of size "
                    + other.size + ", seed " + other.seed + " do not merge");
        }
        other.counts.forEach((stratum, n) -> counts.merge(stratum, n, Long::sum));
        other.strata.forEach((stratum, heap) -> heap.forEach(c -> keep(stratum, c)));
    }

    private void keep(String stratum, Candidate c) {
        PriorityQueue<Candidate> heap = strata.computeIfAbsent(stratum, k -> new PriorityQueue<>(BY_PRIORITY.reversed()));
        if (heap.size() < size) {
            heap.add(c);
        } else if (BY_PRIORITY.compare(c, heap.peek()) < 0) {
            heap.poll();
            heap.add(c);
        }
    }

    /** Documents offered per stratum. */
    public Map<String, Long> strata() {
        return Map.copyOf(counts);
    }

    /** The chosen ids, in priority order. */
    public List<String> ids() {
        List<String> keys = new ArrayList<>(strata.keySet());
        long[] sizes = keys.stream().mapToLong(counts::get).toArray();
        int[] allocation = allocate(sizes, size);
        List<Candidate> chosen = new ArrayList<>();
        for (int h = 0; h < keys.size(); h++) {
            List<Candidate> sorted = new ArrayList<>(strata.get(keys.get(h)));
            sorted.sort(BY_PRIORITY);
            chosen.addAll(sorted.subList(0, allocation[h]));
        }
        chosen.sort(BY_PRIORITY);
        return chosen.stream().map(Candidate::id).toList();
    }

    /**
     * Shares {@code total} places among strata of the given sizes: one each first (largest strata
     * first, when there are fewer places than strata), then in proportion to size by largest
     * remainder, never more than a stratum holds.
     */
    static int[] allocate(long[] sizes, int total) {
        int h = sizes.length;
        int[] alloc = new int[h];
        long available = 0;
        for (long s : sizes) {
            available += s;
        }
        int remaining = (int) Math.min(total, available);
        Integer[] bySize = new Integer[h];
        for (int i = 0; i < h; i++) {
            bySize[i] = i;
        }
        java.util.Arrays.sort(bySize, (a, b) -> Long.compare(sizes[b], sizes[a]) != 0
                ? Long.compare(sizes[b], sizes[a]) : Integer.compare(a, b));
        for (int i : bySize) {
            if (remaining > 0 && sizes[i] > 0) {
                alloc[i] = 1;
                remaining--;
            }
        }
        while (remaining > 0) {
            long open = 0;
            for (int i = 0; i < h; i++) {
                if (alloc[i] < sizes[i]) {
                    open += sizes[i];
                }
            }
            double[] remainders = new double[h];
            boolean capped = false;
            int added = 0;
            for (int i = 0; i < h; i++) {
                if (alloc[i] < sizes[i]) {
                    double quota = (double) remaining * sizes[i] / open;
                    long room = sizes[i] - alloc[i];
                    capped |= Math.floor(quota) > room;
                    int whole = (int) Math.min((long) Math.floor(quota), room);
                    alloc[i] += whole;
                    added += whole;
                    remainders[i] = quota - Math.floor(quota);
                }
            }
            remaining -= added;
            if (capped) {
                continue; // a full stratum gave places back: share them out again
            }
            // Only fractions left: one more place each, largest remainder of this round first.
            Integer[] byRemainder = bySize.clone();
            java.util.Arrays.sort(byRemainder, (a, b) -> Double.compare(remainders[b], remainders[a]) != 0
                    ? Double.compare(remainders[b], remainders[a]) : Integer.compare(a, b));
            for (int i : byRemainder) {
                if (remaining > 0 && alloc[i] < sizes[i]) {
                    alloc[i]++;
                    remaining--;
                }
            }
        }
        return alloc;
    }

    /** A 64-bit priority from the seed and the id: FNV-1a of the id, mixed with the seed by SplitMix64's finaliser. */
    static long priority(long seed, String id) {
        long h = 0xcbf29ce484222325L;
        for (byte b : id.getBytes(StandardCharsets.UTF_8)) {
            h ^= b & 0xff;
            h *= 0x100000001b3L;
        }
        long z = h ^ (seed * 0x9e3779b97f4a7c15L);
        z = (z ^ (z >>> 30)) * 0xbf58476d1ce4e5b9L;
        z = (z ^ (z >>> 27)) * 0x94d049bb133111ebL;
        return z ^ (z >>> 31);
    }
}
