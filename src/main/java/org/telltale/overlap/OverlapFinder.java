package org.telltale.overlap;

import java.util.BitSet;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Consumer;

/**
 * Finds exact and near-duplicate documents between a train and a test corpus, and within each.
 *
 * <ol>
 *   <li>First reading: per document, a 128-bit key of the normalised text ({@link TextNormalizer})
 *       and the band keys of a MinHash signature of its word shingles ({@link Shingler},
 *       {@link MinHasher}, {@link Banding}); signatures are computed on worker threads.</li>
 *   <li>Exact groups by key; representatives of the groups enter banding, which yields candidates.</li>
 *   <li>Second reading: shingle sets of the candidates' documents; every candidate is kept only
 *       if its exact Jaccard similarity reaches the threshold.</li>
 * </ol>
 * Memory: about 8·(b + 2) bytes and an id per document, plus shingle sets of candidates. The
 * corpora must read the same twice.
 */
public final class OverlapFinder {
    private final OverlapSettings settings;
    private final Consumer<String> progress;

    /** @param progress receives progress lines (for stderr); pass {@code s -> {}} for silence */
    public OverlapFinder(OverlapSettings settings, Consumer<String> progress) {
        this.settings = settings;
        this.progress = progress;
    }

    private static String seconds(long since) {
        return String.format(Locale.ROOT, "%.1f s", (System.nanoTime() - since) / 1e9);
    }

    public OverlapResult find(DocumentSource train, DocumentSource test) {
        ExecutorService pool = Executors.newFixedThreadPool(settings.threads(), runnable -> {
            Thread t = new Thread(runnable, "telltale-overlap");
            t.setDaemon(true);
            return t;
        });
        try {
            long start = System.nanoTime();
            DocumentTable table = new SignaturePass(settings, pool, progress).read(train, test);
            progress.accept(String.format(Locale.ROOT, "signed %,d train and %,d test documents (%s)",
                    table.trainCount, table.size() - table.trainCount, seconds(start)));
            start = System.nanoTime();
            int[] rep = ExactGroups.representatives(table);
            long[] candidates = CandidatePairs.find(table, rep, progress);
            progress.accept("exact groups and banding (" + seconds(start) + ")");
            start = System.nanoTime();
            PairAssembler assembler = new PairAssembler(table, rep);
            BitSet keepText = settings.keepTexts() ? assembler.groupedDocuments() : new BitSet();
            VerificationPass.Verified verified = new VerificationPass(settings, pool)
                    .run(train, test, table, candidates, keepText);
            OverlapResult result = assembler.assemble(train.name(), test.name(), settings, verified,
                    PairAssembler.Counts.of(table, candidates.length));
            progress.accept(String.format(Locale.ROOT, "second reading and verification: %,d near pairs of distinct texts (%s)",
                    verified.pairs().length, seconds(start)));
            return result;
        } finally {
            pool.shutdownNow();
        }
    }
}
