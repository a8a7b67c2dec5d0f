package org.telltale.spark;

import java.io.Serializable;
import org.telltale.text.Document;

/**
 * A document as it travels between Spark tasks, with its reading position: train documents take
 * positions 0 .. trainCount−1 in file order, test documents follow. Positions play the part that
 * reading order plays on one machine (representatives, tie order).
 */
record CorpusRow(long position, String id, String text, String label) implements Serializable {
    Document document() {
        return new Document(id, text, label);
    }
}
