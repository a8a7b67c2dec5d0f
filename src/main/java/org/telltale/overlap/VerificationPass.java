package org.telltale.overlap;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Future;
import org.telltale.Futures;
import org.telltale.TelltaleException;
import org.telltale.text.Document;

/**
 * The second reading: shingle sets of the documents in candidate pairs only, then the exact
 * Jaccard similarity of every candidate. Memory is bounded by the candidates, not the corpora.
 */
final class VerificationPass {
    private final OverlapSettings settings;
    private final Shingler shingler;
    private final ExecutorService pool;

    /** Candidates at or above the threshold: pair codes as in {@link CandidatePairs}, and their similarity. */
    record Verified(long[] pairs, double[] similarity, String[] texts) {
    }

    VerificationPass(OverlapSettings settings, ExecutorService pool) {
        this.settings = settings;
        this.shingler = new Shingler(settings.shingle());
        this.pool = pool;
    }

    private record Item(int position, String text) {
    }

    /**
     * @param keepText documents whose text the result should carry (used only with keepTexts)
     */
    Verified run(DocumentSource train, DocumentSource test, DocumentTable table, long[] candidates, BitSet keepText) {
        int n = table.size();
        BitSet needed = new BitSet(n);
        for (long c : candidates) {
            needed.set((int) (c >>> 32));
            needed.set((int) c);
        }
        long[][] shingles = new long[n][];
        String[] texts = new String[n];
        boolean keep = settings.keepTexts();
        BatchRunner<Item, Void> runner = new BatchRunner<>(pool, SignaturePass.BATCH, 2 * settings.threads(), items -> {
            for (Item item : items) {
                shingles[item.position] = shingler.shingles(item.text);
            }
            return null;
        });
        int[] position = {0};
        for (DocumentSource source : List.of(train, test)) {
            int end = source == train ? table.trainCount : n;
            source.forEach((Document doc) -> {
                int at = position[0]++;
                if (at >= end || !doc.id().equals(table.ids[at])) {
                    throw changed(source, at - (source == train ? 0 : table.trainCount), doc,
                            at < end ? table.ids[at] : null);
                }
                if (needed.get(at)) {
                    runner.add(new Item(at, doc.text()));
                }
                if (keep && (needed.get(at) || keepText.get(at))) {
                    texts[at] = doc.text();
                }
            });
            if (position[0] != end) {
                throw new TelltaleException(source.name() + " changed while it was read: it now has "
                        + (position[0] - (source == train ? 0 : table.trainCount)) + " documents, before "
                        + (end - (source == train ? 0 : table.trainCount)));
            }
        }
        runner.finish();
        return verify(candidates, shingles, texts);
    }

    private static TelltaleException changed(DocumentSource source, int index, Document doc, String before) {
        return new TelltaleException(source.name() + " changed while it was read: document " + (index + 1)
                + " is now " + doc.describe() + (before == null ? ", past the end of the first reading"
                : ", where it was '" + before + "' before") + "; overlap reads each corpus twice");
    }

    private Verified verify(long[] candidates, long[][] shingles, String[] texts) {
        double threshold = settings.threshold();
        int chunk = Math.max(1024, candidates.length / (4 * settings.threads()) + 1);
        List<Future<double[]>> parts = new ArrayList<>();
        for (int from = 0; from < candidates.length; from += chunk) {
            int lo = from;
            int hi = Math.min(candidates.length, from + chunk);
            parts.add(pool.submit(() -> {
                double[] sims = new double[hi - lo];
                for (int c = lo; c < hi; c++) {
                    sims[c - lo] = Shingler.jaccard(shingles[(int) (candidates[c] >>> 32)], shingles[(int) candidates[c]]);
                }
                return sims;
            }));
        }
        LongList kept = new LongList();
        List<Double> keptSims = new ArrayList<>();
        int c = 0;
        for (Future<double[]> part : parts) {
            for (double s : Futures.await(part, "a worker")) {
                if (PairRules.isNear(s, threshold)) {
                    kept.add(candidates[c]);
                    keptSims.add(s);
                }
                c++;
            }
        }
        double[] sims = keptSims.stream().mapToDouble(Double::doubleValue).toArray();
        return new Verified(kept.toArray(), sims, texts);
    }
}
