package org.telltale.overlap;

/**
 * The per-document step of overlap detection: the 128-bit exact key of a text's normalised form
 * and the band keys of the MinHash signature of its word shingles. The single-machine finder runs
 * it on worker threads, the Spark front in each partition; both get the same keys for the same
 * text and settings. Not thread-safe (it reuses a signature buffer): one per thread or partition.
 */
public final class DocumentSigner {
    private final Shingler shingler;
    private final MinHasher hasher;
    private final Banding banding;
    private final long[] signature;

    public DocumentSigner(OverlapSettings settings) {
        this(new Shingler(settings.shingle()), new MinHasher(settings.banding().hashes(), settings.seed()), settings.banding());
    }

    DocumentSigner(Shingler shingler, MinHasher hasher, Banding banding) {
        this.shingler = shingler;
        this.hasher = hasher;
        this.banding = banding;
        this.signature = new long[hasher.length()];
    }

    /** b, the number of band keys {@link #sign} writes. */
    public int bands() {
        return banding.bands();
    }

    /**
     * Writes the exact key into {@code key[0]} (high) and {@code key[1]} (low) and the band keys into
     * {@code bandKeys[offset .. offset + bands())}.
     *
     * @return false when the text has no word: it then has no shingles, takes no part in pairing,
     *         and its band keys are left as they were
     */
    public boolean sign(String text, long[] key, long[] bandKeys, int offset) {
        String norm = TextNormalizer.forShingles(text);
        long[] exact = Hash64.exactKey(norm);
        key[0] = exact[0];
        key[1] = exact[1];
        long[] shingles = shingler.shinglesOfNormalised(norm);
        if (shingles.length == 0) {
            return false;
        }
        hasher.signature(shingles, signature);
        for (int j = 0; j < banding.bands(); j++) {
            bandKeys[offset + j] = banding.bandKey(signature, j);
        }
        return true;
    }
}
