package org.telltale.overlap;

/**
 * The two rules that decide pairs, in one place for the single-machine finder and the Spark front:
 * which documents share a banding bucket, and which verified similarity makes a near duplicate.
 */
public final class PairRules {
    private PairRules() {
    }

    /**
     * The bucket of a band key among {@code documents} documents: the key without the low bits that
     * the single-machine sort uses for a document position. Cutting them only adds chance
     * candidates, and every candidate is verified; cutting the same bits everywhere keeps the
     * candidate count the same in every run.
     */
    public static long bucketKey(long bandKey, long documents) {
        return bandKey & ~ExactGroups.indexMask(Math.toIntExact(documents));
    }

    /** Whether an exact Jaccard similarity reaches the threshold (a tiny tolerance so that 4/5 read back as 0.8 counts). */
    public static boolean isNear(double similarity, double threshold) {
        return similarity >= threshold - 1e-12;
    }
}
