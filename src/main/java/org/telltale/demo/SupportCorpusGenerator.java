package org.telltale.demo;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import org.telltale.text.Document;

/**
 * Generates the demo corpus: invented inbound support messages of Quillmoor Broadband, a
 * fictional provider, labelled with the queue they were routed to, in a leaky and a clean
 * variant (see {@link DemoCorpus} and {@code corpora-demo/README.md}).
 *
 * <p>The output is a pure function of the seed and the size: queue sizes and plant counts are
 * exact shares (rounded), and each message draws from its own random stream, derived from the
 * seed and its position, so the corpus can be rebuilt byte for byte. {@link java.util.Random}'s
 * algorithm is fixed by its specification, which makes the streams the same on every JVM.
 */
public final class SupportCorpusGenerator {
    /** The seed of the committed corpus files. */
    public static final long DEFAULT_SEED = 20260301L;
    /** The size of the committed corpus files. */
    public static final int DEFAULT_SIZE = 2000;
    /** Fewer messages leave some plant without enough carriers to be found. */
    public static final int MIN_SIZE = 200;

    private final long seed;
    private final int size;

    public SupportCorpusGenerator(long seed, int size) {
        if (size < MIN_SIZE) {
            throw new IllegalArgumentException("size must be at least " + MIN_SIZE + ": " + size);
        }
        this.seed = seed;
        this.size = size;
    }

    public static SupportCorpusGenerator standard() {
        return new SupportCorpusGenerator(DEFAULT_SEED, DEFAULT_SIZE);
    }

    public DemoCorpus generate() {
        List<SupportQueue> queues = queueSequence();
        List<MessageDraft> drafts = new ArrayList<>(size);
        for (int i = 0; i < size; i++) {
            drafts.add(new MessageComposer(new Random(mix(seed, i))).compose(queues.get(i)));
        }
        Map<Plant, List<Integer>> carriers = chooseCarriers(queues, drafts);
        List<Document> leaky = new ArrayList<>(size);
        List<Document> clean = new ArrayList<>(size);
        Map<Plant, List<String>> planted = new EnumMap<>(Plant.class);
        for (Plant plant : Plant.values()) {
            planted.put(plant, new ArrayList<>());
        }
        for (int i = 0; i < size; i++) {
            String id = id(i);
            String label = queues.get(i).label();
            MessageDraft draft = drafts.get(i);
            clean.add(new Document(id, draft.render(), label));
            for (Plant plant : Plant.values()) {
                if (carriers.get(plant).contains(i)) {
                    draft = plant.apply(draft, new Random(mix(seed ^ (0x5DEECE66DL * (plant.ordinal() + 1)), i)));
                    planted.get(plant).add(id);
                }
            }
            leaky.add(new Document(id, draft.render(), label));
        }
        planted.replaceAll((plant, ids) -> List.copyOf(ids));
        return new DemoCorpus(seed, leaky, clean, planted);
    }

    /** The number of messages routed to {@code queue}: its weight's share of the size, rounded. */
    public int queueSize(SupportQueue queue) {
        int assigned = 0;
        SupportQueue[] all = SupportQueue.values();
        for (int q = 0; q < all.length - 1; q++) {
            int n = (int) Math.round(size * all[q].weight() / 100.0);
            if (all[q] == queue) {
                return n;
            }
            assigned += n;
        }
        return size - assigned; // the last queue takes the rounding remainder
    }

    private List<SupportQueue> queueSequence() {
        List<SupportQueue> queues = new ArrayList<>(size);
        for (SupportQueue queue : SupportQueue.values()) {
            queues.addAll(Collections.nCopies(queueSize(queue), queue));
        }
        Collections.shuffle(queues, new Random(seed));
        return queues;
    }

    /** For each plant, a seeded random choice of exactly its share of its queue, among messages it fits. */
    private Map<Plant, List<Integer>> chooseCarriers(List<SupportQueue> queues, List<MessageDraft> drafts) {
        Map<Plant, List<Integer>> carriers = new EnumMap<>(Plant.class);
        for (Plant plant : Plant.values()) {
            List<Integer> candidates = new ArrayList<>();
            for (int i = 0; i < size; i++) {
                if (queues.get(i) == plant.queue() && plant.fits(drafts.get(i))) {
                    candidates.add(i);
                }
            }
            int wanted = (int) Math.round(plant.share() * queueSize(plant.queue()));
            if (candidates.size() < wanted) {
                throw new IllegalStateException(String.format(Locale.ROOT,
                        "seed %d, size %d: only %d %s messages fit %s, %d needed",
                        seed, size, candidates.size(), plant.queue().label(), plant, wanted));
            }
            Collections.shuffle(candidates, new Random(mix(seed, -1 - plant.ordinal())));
            List<Integer> chosen = new ArrayList<>(candidates.subList(0, wanted));
            Collections.sort(chosen);
            carriers.put(plant, chosen);
        }
        return carriers;
    }

    static String id(int index) {
        return String.format(Locale.ROOT, "qm-%05d", index + 1);
    }

    /**
     * A well-spread seed for stream {@code index}: the SplitMix64 finaliser (Steele, Lea and
     * Flood, "Fast splittable pseudorandom number generators", OOPSLA 2014) of seed and index.
     */
    static long mix(long seed, long index) {
        long z = seed + 0x9E3779B97F4A7C15L * (index + 1);
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }
}
