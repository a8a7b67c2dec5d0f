package org.telltale.spark;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import org.apache.spark.api.java.JavaPairRDD;
import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.broadcast.Broadcast;
import org.apache.spark.storage.StorageLevel;
import org.telltale.overlap.DocumentSigner;
import org.telltale.overlap.OverlapAssembly;
import org.telltale.overlap.OverlapResult;
import org.telltale.overlap.OverlapSettings;
import org.telltale.overlap.PairRules;
import org.telltale.overlap.Shingler;
import scala.Tuple2;

/**
 * Overlap detection as Spark jobs, with the single-machine steps and rules: signatures by
 * partition ({@link DocumentSigner}), exact groups and banding buckets by key, candidates verified
 * by exact Jaccard of shingle sets ({@link PairRules}), and the pairs assembled on the driver from
 * the verified pairs and the members of their groups ({@link OverlapAssembly}). No task keeps
 * state between attempts, so a recomputed task yields the same rows.
 */
final class DistributedOverlap {
    private final JavaSparkContext context;
    private final OverlapSettings settings;

    DistributedOverlap(JavaSparkContext context, OverlapSettings settings) {
        this.context = context;
        this.settings = settings;
    }

    /** A document's keys: exact key and band keys (null when the text has no word). */
    record Signed(long position, long hi, long lo, long[] bandKeys) implements Serializable {
    }

    /** A verified near pair on its way to the driver. */
    record NearRow(long first, long second, double similarity) implements Serializable {
    }

    /** A pair member on its way to the driver. */
    record MemberRow(long position, String id, String label, long representative, String text) implements Serializable {
    }

    OverlapResult find(String trainName, JavaRDD<CorpusRow> train, long trainCount, String testName, JavaRDD<CorpusRow> test) {
        OverlapParams params = OverlapParams.of(settings);
        JavaRDD<CorpusRow> docs = train.union(test);
        JavaRDD<Signed> signed = docs.mapPartitions(rows -> sign(params, rows)).persist(StorageLevel.MEMORY_AND_DISK());
        long n = signed.count();
        long trainEmpty = signed.filter(s -> s.bandKeys() == null && s.position() < trainCount).count();
        long testEmpty = signed.filter(s -> s.bandKeys() == null && s.position() >= trainCount).count();

        // Exact groups: the representative is the first position with the key (as on one machine).
        JavaPairRDD<Tuple2<Long, Long>, Signed> byKey = signed.filter(s -> s.bandKeys() != null)
                .mapToPair(s -> new Tuple2<>(new Tuple2<>(s.hi(), s.lo()), s));
        JavaPairRDD<Tuple2<Long, Long>, Tuple2<Long, Long>> groups = byKey
                .mapValues(s -> new Tuple2<>(s.position(), 1L))
                .reduceByKey((a, b) -> new Tuple2<>(Math.min(a._1(), b._1()), a._2() + b._2()));
        JavaRDD<Signed> representatives = byKey.reduceByKey((a, b) -> a.position() < b.position() ? a : b).values();
        // position -> (representative, group size)
        JavaPairRDD<Long, Tuple2<Long, Long>> memberOf = byKey.mapValues(Signed::position).join(groups)
                .mapToPair(t -> new Tuple2<>(t._2()._1(), t._2()._2()))
                .persist(StorageLevel.MEMORY_AND_DISK());

        // Banding: representatives sharing a bucket in some band become candidates.
        JavaPairRDD<Long, Long> candidates = representatives.flatMapToPair(s -> {
                    List<Tuple2<Tuple2<Integer, Long>, Long>> out = new ArrayList<>(s.bandKeys().length);
                    for (int band = 0; band < s.bandKeys().length; band++) {
                        out.add(new Tuple2<>(new Tuple2<>(band, PairRules.bucketKey(s.bandKeys()[band], n)), s.position()));
                    }
                    return out.iterator();
                })
                .groupByKey()
                .flatMapToPair(bucket -> pairsOf(bucket._2()))
                .distinct()
                .persist(StorageLevel.MEMORY_AND_DISK());
        long candidateCount = candidates.count();

        // Verification: shingle sets of candidates' documents only, then the exact similarity.
        JavaPairRDD<Long, Boolean> needed = candidates.flatMap(c -> List.of(c._1(), c._2()).iterator())
                .distinct().mapToPair(p -> new Tuple2<>(p, Boolean.TRUE));
        JavaPairRDD<Long, long[]> shingles = docs.mapToPair(d -> new Tuple2<>(d.position(), d.text()))
                .join(needed)
                .mapPartitionsToPair(rows -> shingle(params, rows));
        List<OverlapAssembly.Near> near = new ArrayList<>();
        candidates.join(shingles)
                .mapToPair(t -> new Tuple2<>(t._2()._1(), new Tuple2<>(t._1(), t._2()._2())))
                .join(shingles)
                .map(t -> new NearRow(t._2()._1()._1(), t._1(), Shingler.jaccard(t._2()._1()._2(), t._2()._2())))
                .filter(p -> PairRules.isNear(p.similarity(), params.threshold()))
                .collect()
                .forEach(p -> near.add(new OverlapAssembly.Near(p.first(), p.second(), p.similarity())));

        // The members of exact groups of two or more, and of groups with a near pair.
        Set<Long> nearRepresentatives = new HashSet<>();
        for (OverlapAssembly.Near p : near) {
            nearRepresentatives.add(p.first());
            nearRepresentatives.add(p.second());
        }
        Broadcast<Set<Long>> nearSet = context.broadcast(nearRepresentatives);
        boolean keepTexts = settings.keepTexts();
        List<OverlapAssembly.Member> members = new ArrayList<>();
        memberOf.filter(t -> t._2()._2() >= 2 || nearSet.value().contains(t._2()._1()))
                .join(docs.mapToPair(d -> new Tuple2<>(d.position(), d)))
                .map(t -> new MemberRow(t._1(), t._2()._2().id(), t._2()._2().label(), t._2()._1()._1(),
                        keepTexts ? t._2()._2().text() : null))
                .collect()
                .forEach(m -> members.add(new OverlapAssembly.Member(m.position(), m.id(), m.label(), m.representative(), m.text())));
        signed.unpersist();
        memberOf.unpersist();
        candidates.unpersist();
        OverlapAssembly.Counts counts = new OverlapAssembly.Counts(trainCount, n - trainCount, trainEmpty, testEmpty,
                candidateCount);
        return OverlapAssembly.assemble(trainName, testName, settings, members, near, counts);
    }

    private static Iterator<Signed> sign(OverlapParams params, Iterator<CorpusRow> rows) {
        DocumentSigner signer = new DocumentSigner(params.settings());
        long[] key = new long[2];
        return new Iterator<>() {
            @Override
            public boolean hasNext() {
                return rows.hasNext();
            }

            @Override
            public Signed next() {
                CorpusRow row = rows.next();
                long[] bands = new long[signer.bands()];
                boolean words = signer.sign(row.text(), key, bands, 0);
                return new Signed(row.position(), key[0], key[1], words ? bands : null);
            }
        };
    }

    private static Iterator<Tuple2<Long, long[]>> shingle(OverlapParams params, Iterator<Tuple2<Long, Tuple2<String, Boolean>>> rows) {
        Shingler shingler = new Shingler(params.shingle());
        return new Iterator<>() {
            @Override
            public boolean hasNext() {
                return rows.hasNext();
            }

            @Override
            public Tuple2<Long, long[]> next() {
                Tuple2<Long, Tuple2<String, Boolean>> row = rows.next();
                return new Tuple2<>(row._1(), shingler.shingles(row._2()._1()));
            }
        };
    }

    /** Every pair of a bucket's positions, smaller first. */
    private static Iterator<Tuple2<Long, Long>> pairsOf(Iterable<Long> bucket) {
        List<Long> positions = new ArrayList<>();
        bucket.forEach(positions::add);
        positions.sort(null);
        List<Tuple2<Long, Long>> out = new ArrayList<>();
        for (int x = 0; x < positions.size(); x++) {
            for (int y = x + 1; y < positions.size(); y++) {
                out.add(new Tuple2<>(positions.get(x), positions.get(y)));
            }
        }
        return out.iterator();
    }
}
