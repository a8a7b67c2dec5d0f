package org.telltale.text;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;

/**
 * Rebuilds a document without some of its units by cutting their spans out of the original
 * string, optionally writing a filler in each cut's place. Every character outside the cut spans
 * stays exactly as it was.
 *
 * <p>Immutable and thread-safe.
 */
public final class Masker {
    private final String filler;

    /** @param filler written in place of each removed span; empty to cut cleanly */
    public Masker(String filler) {
        this.filler = filler == null ? "" : filler;
    }

    public static Masker cutting() {
        return new Masker("");
    }

    public String filler() {
        return filler;
    }

    /** The text of {@code index} without the units whose bits are set in {@code removed}. */
    public String mask(TermIndex index, BitSet removed) {
        if (removed.isEmpty()) {
            return index.text();
        }
        List<Span> cuts = new ArrayList<>();
        for (int u = removed.nextSetBit(0); u >= 0; u = removed.nextSetBit(u + 1)) {
            cuts.addAll(index.units().get(u).spans());
        }
        cuts.sort(null);
        String text = index.text();
        StringBuilder out = new StringBuilder(text.length());
        int cursor = 0;
        for (Span cut : cuts) {
            if (cut.end() <= cursor) {
                continue; // wholly inside a cut already made
            }
            int start = Math.max(cut.start(), cursor);
            out.append(text, cursor, start);
            if (start == cut.start()) {
                out.append(filler);
            }
            cursor = cut.end();
        }
        out.append(text, cursor, text.length());
        return out.toString();
    }
}
