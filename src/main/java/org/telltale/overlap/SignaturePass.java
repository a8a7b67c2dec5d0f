package org.telltale.overlap;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.function.Consumer;
import org.telltale.text.Document;

/**
 * The first reading of both corpora: for every document the exact key and the band keys of its
 * MinHash signature, computed on worker threads in batches while the reader goes on.
 */
final class SignaturePass {
    static final int BATCH = 1024;

    private final Shingler shingler;
    private final MinHasher hasher;
    private final Banding banding;
    private final ExecutorService pool;
    private final int threads;
    private final Consumer<String> progress;

    SignaturePass(OverlapSettings settings, ExecutorService pool, Consumer<String> progress) {
        this.shingler = new Shingler(settings.shingle());
        this.banding = settings.banding();
        this.hasher = new MinHasher(banding.hashes(), settings.seed());
        this.pool = pool;
        this.threads = settings.threads();
        this.progress = progress;
    }

    private record Batch(String[] ids, String[] labels, long[] hi, long[] lo, long[] keys, BitSet empty) {
    }

    DocumentTable read(DocumentSource train, DocumentSource test) {
        Map<String, String> labelPool = new HashMap<>();
        List<Batch> trainBatches = readOne(train, labelPool);
        List<Batch> testBatches = readOne(test, labelPool);
        List<Batch> all = new ArrayList<>(trainBatches);
        all.addAll(testBatches);
        int trainCount = count(trainBatches);
        int n = count(all);
        int b = banding.bands();
        String[] ids = new String[n];
        String[] labels = new String[n];
        long[] hi = new long[n];
        long[] lo = new long[n];
        long[] keys = new long[Math.multiplyExact(n, b)];
        BitSet empty = new BitSet(n);
        int at = 0;
        for (Batch batch : all) {
            int m = batch.ids.length;
            System.arraycopy(batch.ids, 0, ids, at, m);
            System.arraycopy(batch.labels, 0, labels, at, m);
            System.arraycopy(batch.hi, 0, hi, at, m);
            System.arraycopy(batch.lo, 0, lo, at, m);
            System.arraycopy(batch.keys, 0, keys, at * b, m * b);
            for (int i = batch.empty.nextSetBit(0); i >= 0; i = batch.empty.nextSetBit(i + 1)) {
                empty.set(at + i);
            }
            at += m;
        }
        return new DocumentTable(ids, labels, hi, lo, keys, b, empty, trainCount);
    }

    private List<Batch> readOne(DocumentSource source, Map<String, String> labelPool) {
        BatchRunner<Document, Batch> runner = new BatchRunner<>(pool, BATCH, 2 * threads, this::signatures);
        long[] seen = {0};
        source.forEach(doc -> {
            // Labels repeat across a corpus: keep one String per distinct label.
            String label = doc.label() == null ? null : labelPool.computeIfAbsent(doc.label(), l -> l);
            runner.add(new Document(doc.id(), doc.text(), label));
            if (++seen[0] % 100_000 == 0) {
                progress.accept(String.format(java.util.Locale.ROOT, "%s: %,d documents signed", source.name(), seen[0]));
            }
        });
        return runner.finish();
    }

    private Batch signatures(List<Document> docs) {
        int m = docs.size();
        int b = banding.bands();
        String[] ids = new String[m];
        String[] labels = new String[m];
        long[] hi = new long[m];
        long[] lo = new long[m];
        long[] keys = new long[m * b];
        BitSet empty = new BitSet(m);
        DocumentSigner signer = new DocumentSigner(shingler, hasher, banding);
        long[] key = new long[2];
        for (int i = 0; i < m; i++) {
            Document doc = docs.get(i);
            ids[i] = doc.id();
            labels[i] = doc.label();
            if (!signer.sign(doc.text(), key, keys, i * b)) {
                empty.set(i);
            }
            hi[i] = key[0];
            lo[i] = key[1];
        }
        return new Batch(ids, labels, hi, lo, keys, empty);
    }

    private static int count(List<Batch> batches) {
        long n = 0;
        for (Batch batch : batches) {
            n += batch.ids.length;
        }
        return Math.toIntExact(n);
    }
}
