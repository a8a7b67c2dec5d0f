package org.telltale.overlap;

import java.util.BitSet;

/**
 * What overlap detection keeps per document after the first reading: id, label, a 128-bit key of
 * the normalised text and the b band keys of its MinHash signature — about 8·(b + 2) bytes plus
 * the id, whatever the length of the text. Train documents come first (positions
 * {@code 0 .. trainCount-1}), then test documents.
 */
final class DocumentTable {
    final String[] ids;
    final String[] labels;
    final long[] exactHi;
    final long[] exactLo;
    /** bandKeys[i * bands + j] is band j of document i. */
    final long[] bandKeys;
    final int bands;
    /** Documents without a single word: no shingles, left out of pairing. */
    final BitSet empty;
    final int trainCount;

    DocumentTable(String[] ids, String[] labels, long[] exactHi, long[] exactLo, long[] bandKeys, int bands,
                  BitSet empty, int trainCount) {
        this.ids = ids;
        this.labels = labels;
        this.exactHi = exactHi;
        this.exactLo = exactLo;
        this.bandKeys = bandKeys;
        this.bands = bands;
        this.empty = empty;
        this.trainCount = trainCount;
    }

    int size() {
        return ids.length;
    }

    boolean isTrain(int position) {
        return position < trainCount;
    }
}
