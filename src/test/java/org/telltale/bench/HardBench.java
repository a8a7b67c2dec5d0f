package org.telltale.bench;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.Set;
import org.telltale.explain.ExplainSettings;
import org.telltale.explain.Explainer;
import org.telltale.explain.Explanation;
import org.telltale.explain.LexiconCheck;
import org.telltale.explain.Sampling;
import org.telltale.explain.Selection;
import org.telltale.explain.Weighting;
import org.telltale.model.TextClassifier;
import org.telltale.text.Document;

/**
 * The harder faithfulness benchmark: longer documents, words that co-occur, a deeper tree with
 * several of its decision words present in a document. Each variant of the explainer's settings is
 * measured by gold recall of the top 10 (Ribeiro, Singh &amp; Guestrin 2016, §5.2) on a planted
 * depth-7 tree and a planted sparse logistic model, and by the AFINN-111 lexicon check (Nielsen
 * 2011; {@link LexiconCheck}), so that a choice is kept only when it wins on both kinds of model.
 *
 * <p>Corpus: 200–400 background tokens per document drawn from 3,000 invented words with
 * Zipf–Mandelbrot frequencies (weight 1/(rank + 10)), so common words repeat and a document has
 * about 200 distinct words; 60 signal words in 15 topics of four that co-occur (a document takes
 * 5 topics, each of its words with probability 0.8, each present word 1–3 times) plus 3 signal
 * words at random. The tree is a random complete tree of depth 7 over the signal words; its gold
 * set is the path's words present in the document (2.0 on average); the logistic model's gold set
 * is every signal word present (17 on average), of which K = 10 places can hold at most ten, so
 * its recall is counted against min(|gold|, K).
 */
final class HardBench {
    static final String DEFAULT_VARIANTS = "sampling=uniform;sampling=kernel";
    /** The budgets measured; {@code -Dtelltale.bench.budgets=500,20000} measures others (e.g. a converged ceiling). */
    static final int[] BUDGETS = java.util.Arrays.stream(System.getProperty("telltale.bench.budgets", "500,1000,2000")
            .split(",")).mapToInt(v -> Integer.parseInt(v.strip())).toArray();
    static final int K = 10;

    private HardBench() {
    }

    /** The generated documents and the two planted models of one seed. */
    record Corpus(List<Document> docs, FaithfulnessBench.PresenceTree tree, FaithfulnessBench.SparseLogistic logistic) {
    }

    static Corpus corpus(int documents, long seed) {
        Random random = new Random(seed);
        List<String> background = FaithfulnessBench.words(random, 3000, new HashSet<>());
        List<String> signal = FaithfulnessBench.words(random, 60, new HashSet<>(background));
        double[] zipf = new double[background.size()];
        double sum = 0;
        for (int i = 0; i < zipf.length; i++) {
            sum += 1.0 / (i + 10);
            zipf[i] = sum;
        }
        List<Document> docs = new ArrayList<>();
        for (int i = 0; i < documents; i++) {
            docs.add(document("h" + i, random, background, zipf, signal));
        }
        FaithfulnessBench.PresenceTree tree = new FaithfulnessBench.PresenceTree(signal, 7, random);
        FaithfulnessBench.SparseLogistic logistic = new FaithfulnessBench.SparseLogistic(signal, random);
        return new Corpus(docs, tree, logistic);
    }

    static void run(int documents, long seed, String variants) throws Exception {
        Corpus corpus = corpus(documents, seed);
        List<Document> docs = corpus.docs();
        FaithfulnessBench.PresenceTree tree = corpus.tree();
        FaithfulnessBench.SparseLogistic logistic = corpus.logistic();
        double gold = docs.stream().mapToInt(d -> tree.gold(d.text()).size()).average().orElse(0);
        long withGold = docs.stream().filter(d -> !tree.gold(d.text()).isEmpty()).count();
        System.out.printf(Locale.ROOT, "hard: documents %d, seed %d, K = %d, mean distinct words %.1f,"
                        + " tree gold words per document %.2f (%d documents with at least one), logistic %.1f%n",
                documents, seed, K, docs.stream().mapToInt(d -> FaithfulnessBench.tokens(d.text()).size()).average()
                        .orElse(0), gold, withGold,
                docs.stream().mapToInt(d -> logistic.gold(d.text()).size()).average().orElse(0));
        for (String variant : variants.split(";")) {
            ExplainSettings settings = apply(ExplainSettings.defaults().withWords(K), variant.strip());
            StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "%-40s", variant.strip()));
            for (int budget : BUDGETS) {
                line.append(String.format(Locale.ROOT, "  tree@%d %.3f", budget,
                        recall(tree, docs, tree::gold, settings.withProbes(budget))));
            }
            for (int budget : BUDGETS) {
                line.append(String.format(Locale.ROOT, "  logistic@%d %.3f", budget,
                        recall(logistic, docs, logistic::gold, settings.withProbes(budget))));
            }
            if (LexiconCheck.available() && !Boolean.getBoolean("telltale.bench.skipLexicon")) {
                for (int budget : new int[] {1000, 2000}) {
                    LexiconCheck.Result r = LexiconCheck.measure(settings.withProbes(budget));
                    line.append(String.format(Locale.ROOT, "  afinn@%d precision %.3f rho %.3f", budget,
                            r.precision(), r.meanRank()));
                }
            } else {
                line.append("  (AFINN-111 not fetched: run mvn generate-test-resources)");
            }
            System.out.println(line);
        }
    }

    /** Settings from "key=value,key=value": sampling, bandwidth, weighting, select, ridge. */
    static ExplainSettings apply(ExplainSettings s, String variant) {
        if (variant.isEmpty() || variant.equals("defaults")) {
            return s;
        }
        for (String pair : variant.split(",")) {
            String[] kv = pair.split("=", 2);
            String value = kv.length > 1 ? kv[1].strip() : "";
            s = switch (kv[0].strip()) {
                case "sampling" -> s.withSampling(Sampling.fromKey(value));
                case "bandwidth" -> s.withBandwidth(Double.parseDouble(value));
                case "weighting" -> s.withWeighting(Weighting.fromKey(value));
                case "select" -> s.withSelect(Selection.fromKey(value));
                case "ridge" -> s.withRidge(Double.parseDouble(value));
                case "bandwidth-choice" -> s.withChooseBandwidth(Boolean.parseBoolean(value));
                case "pairing" -> s.withPairing(org.telltale.explain.Pairing.fromKey(value));
                default -> throw new IllegalArgumentException("unknown variant setting: " + pair);
            };
        }
        return s;
    }

    private static double recall(TextClassifier model, List<Document> docs, FaithfulnessBench.Gold gold,
            ExplainSettings settings) {
        Explainer explainer = new Explainer(model, settings);
        double sum = 0;
        int counted = 0;
        for (Document doc : docs) {
            Set<String> g = gold.of(doc.text());
            if (g.isEmpty()) {
                continue;
            }
            Explanation e = explainer.explain(doc, null);
            // A document may hold more gold words than K places: recall of what K places can hold.
            sum += GoldRecall.recall(e.terms(), g, K) * g.size() / Math.min(g.size(), K);
            counted++;
        }
        return sum / counted;
    }

    private static Document document(String id, Random random, List<String> background, double[] zipf,
            List<String> signal) {
        List<String> tokens = new ArrayList<>();
        int length = 200 + random.nextInt(201);
        for (int i = 0; i < length; i++) {
            double u = random.nextDouble() * zipf[zipf.length - 1];
            int at = java.util.Arrays.binarySearch(zipf, u);
            tokens.add(background.get(at >= 0 ? at : -at - 1));
        }
        List<Integer> topics = new ArrayList<>();
        for (int t = 0; t < signal.size() / 4; t++) {
            topics.add(t);
        }
        Collections.shuffle(topics, random);
        Set<String> present = new HashSet<>();
        for (int t : topics.subList(0, 5)) {
            for (int w = 0; w < 4; w++) {
                if (random.nextDouble() < 0.8) {
                    present.add(signal.get(4 * t + w));
                }
            }
        }
        for (int i = 0; i < 3; i++) {
            present.add(signal.get(random.nextInt(signal.size())));
        }
        for (String s : new java.util.TreeSet<>(present)) {
            int copies = 1 + random.nextInt(3);
            for (int c = 0; c < copies; c++) {
                tokens.add(random.nextInt(tokens.size() + 1), s);
            }
        }
        return new Document(id, String.join(" ", tokens), null);
    }
}
