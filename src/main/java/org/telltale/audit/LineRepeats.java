package org.telltale.audit;

import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.Iterator;
import java.util.Map;
import java.util.Set;
import org.telltale.text.Span;

/**
 * Counts, for every line long enough to be boilerplate, how many documents contain it verbatim
 * (after trimming), in bounded memory. Lines are keyed by a 64-bit hash; when the table is full,
 * the entries seen in the fewest documents are dropped and the floor rises, as in lossy counting
 * (Manku and Motwani 2002): a line repeated in many documents survives, a line seen once may be
 * forgotten, and a count is low by at most the floor.
 *
 * <p>Not thread-safe.
 */
public final class LineRepeats {
    /** Lines shorter than this (trimmed) are never boilerplate: "Thanks," or "Hi Sam," is not a footer. */
    static final int MIN_LENGTH = 12;

    private final int capacity;
    private final Map<Long, int[]> counts = new HashMap<>();
    private int floor;
    private long documents;

    LineRepeats(int capacity) {
        if (capacity < 16) {
            throw new IllegalArgumentException("capacity must be >= 16: " + capacity);
        }
        this.capacity = capacity;
    }

    /**
     * Exact counts from a distributed count: {@code counts} maps the {@link #lineKeys} of a corpus's
     * documents to the number of documents that have them, over {@code documents} documents. Only
     * the counts that reach {@link #minRepeats} matter; others may be left out.
     */
    public static LineRepeats ofCounts(Map<Long, Integer> counts, long documents) {
        LineRepeats repeats = new LineRepeats(Math.max(16, counts.size()));
        counts.forEach((key, n) -> repeats.counts.put(key, new int[] {n}));
        repeats.documents = documents;
        return repeats;
    }

    /** The per-document step: the keys of the distinct long lines of {@code text}, each once. */
    public static Set<Long> lineKeys(String text) {
        Set<Long> seen = new LinkedHashSet<>();
        for (Span line : TextLines.of(text)) {
            String trimmed = text.substring(line.start(), line.end()).strip();
            if (trimmed.length() >= MIN_LENGTH) {
                seen.add(hash(trimmed));
            }
        }
        return seen;
    }

    /** Counts each distinct long line of {@code text} once. */
    void add(String text) {
        documents++;
        for (long key : lineKeys(text)) {
            counts.computeIfAbsent(key, k -> new int[] {floor})[0]++;
        }
        if (counts.size() > capacity) {
            prune();
        }
    }

    /** Documents that contain {@code line} (trimmed), as far as the bounded table remembers. */
    int count(String line) {
        String trimmed = line.strip();
        if (trimmed.length() < MIN_LENGTH) {
            return 0;
        }
        int[] c = counts.get(hash(trimmed));
        return c == null ? 0 : c[0];
    }

    long documents() {
        return documents;
    }

    /**
     * The number of documents a line must appear in to count as boilerplate: 3, or 1% of the
     * corpus when that is more (common practice for "repeated across many documents").
     */
    public static int minRepeats(long documents) {
        return (int) Math.max(3, Math.ceil(documents * 0.01));
    }

    int minRepeats() {
        return minRepeats(documents);
    }

    public boolean isBoilerplate(String line) {
        return count(line) >= minRepeats();
    }

    private void prune() {
        while (counts.size() > capacity * 3 / 4) {
            floor++;
            for (Iterator<int[]> it = counts.values().iterator(); it.hasNext(); ) {
                if (it.next()[0] <= floor) {
                    it.remove();
                }
            }
        }
    }

    /** 64-bit FNV-1a over the UTF-8 bytes (Fowler, Noll, Vo; the published offset basis and prime). */
    static long hash(String line) {
        long h = 0xcbf29ce484222325L;
        for (byte b : line.getBytes(StandardCharsets.UTF_8)) {
            h ^= b & 0xff;
            h *= 0x100000001b3L;
        }
        return h;
    }
}
