package org.telltale.demo;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import org.telltale.model.HoldoutSplit;
import org.telltale.text.Document;

/**
 * The demo's split of a corpus into the messages a model is trained on and the held-out messages
 * it is audited on: exactly the stratified, seeded holdout of {@code telltale train --holdout},
 * so the held-out file the demo writes is the part the trained model never saw. The choice
 * depends only on ids, labels and the seed, so the leaky and the clean variant split alike.
 *
 * @param train   training messages, in corpus order
 * @param holdout held-out messages, in corpus order
 */
public record DemoSplit(List<Document> train, List<Document> holdout) {
    public DemoSplit {
        train = List.copyOf(train);
        holdout = List.copyOf(holdout);
    }

    /** Holds out {@code share} of each label's messages, rounded, chosen with {@code seed}. */
    public static DemoSplit of(List<Document> docs, double share, long seed) {
        if (!(share > 0 && share < 1)) {
            throw new IllegalArgumentException("holdout share must lie in (0, 1): " + share);
        }
        BitSet held = HoldoutSplit.choose(docs.stream().map(Document::id).toList(),
                docs.stream().map(Document::label).toList(), share, seed);
        List<Document> train = new ArrayList<>();
        List<Document> holdout = new ArrayList<>();
        for (int i = 0; i < docs.size(); i++) {
            (held.get(i) ? holdout : train).add(docs.get(i));
        }
        return new DemoSplit(train, holdout);
    }
}
