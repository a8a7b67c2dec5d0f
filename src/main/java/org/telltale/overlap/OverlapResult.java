package org.telltale.overlap;

import java.util.List;
import java.util.Map;

/**
 * Everything an overlap run found.
 *
 * @param trainName  name of the train corpus
 * @param testName   name of the test corpus
 * @param settings   the settings used, with the banding that was chosen
 * @param pairs      all pairs, train–test first, then within train, then within test; each group by
 *                   falling similarity, then ids
 * @param summary    the counts
 * @param trainTexts texts of train documents in pairs by id (empty unless {@code keepTexts})
 * @param testTexts  texts of test documents in pairs by id (empty unless {@code keepTexts})
 * @param inflation  accuracy with and without the seen test documents, or {@code null} without a model
 */
public record OverlapResult(String trainName, String testName, OverlapSettings settings, List<OverlapPair> pairs,
                            OverlapSummary summary, Map<String, String> trainTexts,
                            Map<String, String> testTexts, Inflation inflation) {
    public OverlapResult {
        pairs = List.copyOf(pairs);
        trainTexts = Map.copyOf(trainTexts);
        testTexts = Map.copyOf(testTexts);
    }

    /** The pairs of one kind, in result order. */
    public List<OverlapPair> pairs(PairKind kind) {
        return pairs.stream().filter(p -> p.kind() == kind).toList();
    }

    /** Ids of the test documents that have a train duplicate. */
    public java.util.Set<String> seenTestIds() {
        java.util.Set<String> ids = new java.util.HashSet<>();
        for (OverlapPair pair : pairs) {
            if (pair.kind() == PairKind.TRAIN_TEST) {
                ids.add(pair.second());
            }
        }
        return ids;
    }

    /** This result without the documents' texts (for outputs that must not carry them). */
    public OverlapResult withoutTexts() {
        return new OverlapResult(trainName, testName, settings, pairs, summary, Map.of(), Map.of(), inflation);
    }

    /** This result with the accuracy figures of a model added. */
    public OverlapResult withInflation(Inflation figures) {
        return new OverlapResult(trainName, testName, settings, pairs, summary, trainTexts, testTexts, figures);
    }
}
