package org.telltale.overlap;

/**
 * The counts of an overlap run.
 *
 * @param trainDocuments      documents read from train
 * @param testDocuments       documents read from test
 * @param trainEmpty          train documents without a single word, left out of pairing
 * @param testEmpty           test documents without a single word, left out of pairing
 * @param trainTestPairs      train–test pairs, exact and near
 * @param exactTrainTestPairs train–test pairs that are exact duplicates
 * @param withinTrainPairs    pairs inside train
 * @param withinTestPairs     pairs inside test
 * @param testSeen            test documents with at least one train duplicate (exact or near)
 * @param testSeenExact       test documents with an exact train duplicate
 * @param testSeenConflicting test documents with a train duplicate that carries a different label
 * @param trainSeen           train documents with at least one test duplicate
 * @param candidates          candidate pairs of distinct texts that banding produced and Jaccard verified
 */
public record OverlapSummary(long trainDocuments, long testDocuments, long trainEmpty, long testEmpty,
                             long trainTestPairs, long exactTrainTestPairs, long withinTrainPairs,
                             long withinTestPairs, long testSeen, long testSeenExact, long testSeenConflicting,
                             long trainSeen, long candidates) {
    /** testSeen / testDocuments, or 0 for an empty test set. */
    public double testSeenShare() {
        return testDocuments == 0 ? 0.0 : (double) testSeen / testDocuments;
    }
}
