package org.telltale.demo;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.telltale.text.Document;

/**
 * The demo's split of a corpus into the messages a model is trained on and the held-out messages
 * it is audited on, stratified by label: each label keeps its share of the held-out part.
 * Depends only on ids, labels and the seed, so the leaky and the clean variant split alike.
 *
 * @param train   training messages, in corpus order
 * @param holdout held-out messages, in corpus order
 */
public record DemoSplit(List<Document> train, List<Document> holdout) {
    public DemoSplit {
        train = List.copyOf(train);
        holdout = List.copyOf(holdout);
    }

    /** Holds out {@code share} of each label's messages, rounded, chosen at random with {@code seed}. */
    public static DemoSplit of(List<Document> docs, double share, long seed) {
        if (!(share > 0 && share < 1)) {
            throw new IllegalArgumentException("holdout share must lie in (0, 1): " + share);
        }
        Map<String, List<String>> idsByLabel = new LinkedHashMap<>();
        for (Document doc : docs) {
            idsByLabel.computeIfAbsent(doc.label(), l -> new ArrayList<>()).add(doc.id());
        }
        Set<String> heldOut = new HashSet<>();
        Random random = new Random(seed);
        idsByLabel.keySet().stream().sorted().forEach(label -> {
            List<String> ids = new ArrayList<>(idsByLabel.get(label));
            Collections.shuffle(ids, random);
            heldOut.addAll(ids.subList(0, (int) Math.round(share * ids.size())));
        });
        List<Document> train = new ArrayList<>();
        List<Document> holdout = new ArrayList<>();
        for (Document doc : docs) {
            (heldOut.contains(doc.id()) ? holdout : train).add(doc);
        }
        return new DemoSplit(train, holdout);
    }
}
