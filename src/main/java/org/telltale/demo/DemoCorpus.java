package org.telltale.demo;

import java.util.List;
import java.util.Map;
import org.telltale.text.Document;

/**
 * The two variants of the demo corpus: the same messages, with the same ids, labels and wording,
 * once with the planted leakage ({@code leaky}) and once without ({@code clean}).
 *
 * @param seed    the seed that produced it
 * @param leaky   messages with the plants
 * @param clean   the same messages without them
 * @param planted for each plant, the ids of the messages that carry it, in corpus order
 */
public record DemoCorpus(long seed, List<Document> leaky, List<Document> clean, Map<Plant, List<String>> planted) {
    public DemoCorpus {
        leaky = List.copyOf(leaky);
        clean = List.copyOf(clean);
        planted = Map.copyOf(planted);
        if (leaky.size() != clean.size()) {
            throw new IllegalArgumentException("variants differ in size: " + leaky.size() + " vs " + clean.size());
        }
    }

    public int size() {
        return leaky.size();
    }
}
