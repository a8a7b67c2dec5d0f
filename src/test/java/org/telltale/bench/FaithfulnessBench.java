package org.telltale.bench;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import org.telltale.explain.ExplainSettings;
import org.telltale.explain.Explainer;
import org.telltale.explain.Explanation;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.text.Document;

/**
 * The faithfulness experiment of Ribeiro, Singh &amp; Guestrin 2016, §5.2, on a generated corpus:
 * two classifiers that use at most 10 features per document, whose gold features are therefore
 * known, are explained at several probe budgets, and the gold-feature recall of the top-10
 * explanation is reported against the number of probes. A second part compares the adaptive
 * budget ({@code --probes auto}) with fixed budgets by top-10 agreement with the answer at the
 * largest budget. Not a test: run by {@code bench/faithfulness.sh}.
 *
 * <p>Corpus: invented words (consonant-vowel syllables, seeded), 40–80 background tokens per
 * document drawn from 1,000 background words, plus 4–10 distinct signal words drawn from 30.
 * The models are planted, not fitted: the sparse logistic model has weights on the 30 signal words
 * only (so a document's gold set is its signal words, at most 10); the tree is a random complete
 * tree of depth 6 testing signal-word presence (gold set: the path's words present in the
 * document, at most 6 — removal can only reveal words that are there). {@link HardBench} is the
 * harder variant ({@code bench/faithfulness.sh 100 SEED hard}).
 */
public final class FaithfulnessBench {
    static final int[] BUDGETS = {250, 500, 1000, 2000, 5000};
    static final int K = 10;

    public static void main(String[] args) throws Exception {
        int documents = args.length > 0 ? Integer.parseInt(args[0]) : 100;
        long seed = args.length > 1 ? Long.parseLong(args[1]) : 20261201L;
        String mode = args.length > 2 ? args[2] : "easy";
        if (mode.equals("hard")) {
            HardBench.run(documents, seed, args.length > 3 ? args[3] : HardBench.DEFAULT_VARIANTS);
            return;
        }
        if (mode.equals("long")) {
            StabilityBench.seeds(documents, seed, args.length > 3 ? args[3] : "defaults");
            return;
        }
        if (mode.equals("nb")) {
            StabilityBench.naiveBayes(args.length > 3 ? args[3] : "defaults");
            return;
        }
        if (mode.equals("demo")) {
            StabilityBench.demo(documents, args.length > 3 ? args[3] : "defaults");
            return;
        }
        if (mode.equals("auto")) {
            StabilityBench.budget(documents, seed, args.length > 3 ? args[3] : "defaults");
            return;
        }
        if (!mode.equals("easy")) {
            throw new IllegalArgumentException("mode must be easy, hard, long, auto, demo or nb: " + mode);
        }
        Random random = new Random(seed);
        List<String> background = words(random, 1000, new HashSet<>());
        List<String> signal = words(random, 30, new HashSet<>(background));
        List<Document> docs = new ArrayList<>();
        for (int i = 0; i < documents; i++) {
            docs.add(document("d" + i, random, background, signal));
        }
        SparseLogistic logistic = new SparseLogistic(signal, random);
        PresenceTree tree = new PresenceTree(signal, 6, random);
        System.out.printf(Locale.ROOT, "documents %d, seed %d, K = %d, mean distinct words %.1f%n", documents, seed,
                K, docs.stream().mapToInt(d -> tokens(d.text()).size()).average().orElse(0));
        run("sparse logistic", logistic, docs, logistic::gold);
        run("decision tree", tree, docs, tree::gold);
    }

    interface Gold {
        Set<String> of(String text);
    }

    private static void run(String name, TextClassifier model, List<Document> docs, Gold gold) {
        ExplainSettings base = ExplainSettings.defaults().withWords(K);
        Map<Integer, List<Explanation>> byBudget = new TreeMap<>();
        for (int budget : BUDGETS) {
            Explainer explainer = new Explainer(model, base.withProbes(budget));
            long start = System.nanoTime();
            List<Explanation> out = new ArrayList<>();
            double sum = 0;
            int counted = 0;
            long probes = 0;
            for (Document doc : docs) {
                Explanation e = explainer.explain(doc, null);
                out.add(e);
                probes += e.probes();
                double r = GoldRecall.recall(e.terms(), gold.of(doc.text()), K);
                if (!Double.isNaN(r)) {
                    sum += r;
                    counted++;
                }
            }
            double seconds = (System.nanoTime() - start) / 1e9;
            byBudget.put(budget, out);
            System.out.printf(Locale.ROOT, "%s\tprobes %d\tgold recall %.4f\t(%d documents with gold features)\t%.0f probes/s%n",
                    name, budget, sum / counted, counted, probes / seconds);
        }
        List<Explanation> reference = byBudget.get(BUDGETS[BUDGETS.length - 1]);
        for (int budget : BUDGETS) {
            if (budget != BUDGETS[BUDGETS.length - 1]) {
                report(name, "fixed " + budget, byBudget.get(budget), reference);
            }
        }
        Explainer auto = new Explainer(model, base.withProbes(ExplainSettings.AUTO));
        List<Explanation> adaptive = new ArrayList<>();
        for (Document doc : docs) {
            adaptive.add(auto.explain(doc, null));
        }
        report(name, "auto", adaptive, reference);
    }

    private static void report(String name, String what, List<Explanation> runs, List<Explanation> reference) {
        double calls = 0;
        double agreement = 0;
        int atLeast = 0;
        for (int i = 0; i < runs.size(); i++) {
            calls += runs.get(i).method().calls();
            double a = GoldRecall.agreement(runs.get(i).terms(), reference.get(i).terms(), K);
            agreement += a;
            if (a >= 0.9) {
                atLeast++;
            }
        }
        int n = runs.size();
        System.out.printf(Locale.ROOT, "%s\t%s\tmean calls %.0f\tmean top-10 agreement with %d probes %.3f\tshare >= 0.9 %.2f%n",
                name, what, calls / n, BUDGETS[BUDGETS.length - 1], agreement / n, (double) atLeast / n);
    }

    static List<String> words(Random random, int count, Set<String> taken) {
        String consonants = "bdfgklmnprstvz";
        String vowels = "aeiou";
        List<String> out = new ArrayList<>();
        while (out.size() < count) {
            StringBuilder w = new StringBuilder();
            int syllables = 3 + random.nextInt(2);
            for (int s = 0; s < syllables; s++) {
                w.append(consonants.charAt(random.nextInt(consonants.length())));
                w.append(vowels.charAt(random.nextInt(vowels.length())));
            }
            if (taken.add(w.toString())) {
                out.add(w.toString());
            }
        }
        return out;
    }

    private static Document document(String id, Random random, List<String> background, List<String> signal) {
        List<String> tokens = new ArrayList<>();
        int length = 40 + random.nextInt(41);
        for (int i = 0; i < length; i++) {
            tokens.add(background.get(random.nextInt(background.size())));
        }
        List<String> pool = new ArrayList<>(signal);
        java.util.Collections.shuffle(pool, random);
        int signals = 4 + random.nextInt(7);
        for (String s : pool.subList(0, signals)) {
            tokens.add(random.nextInt(tokens.size() + 1), s);
        }
        return new Document(id, String.join(" ", tokens), null);
    }

    /** The distinct lower-case words of a text, as the standard analyzer cuts our invented words. */
    static Set<String> tokens(String text) {
        Set<String> out = new LinkedHashSet<>();
        for (String t : text.toLowerCase(Locale.ROOT).split("[^a-z]+")) {
            if (!t.isEmpty()) {
                out.add(t);
            }
        }
        return out;
    }

    abstract static class Planted implements TextClassifier {
        abstract double positive(Set<String> present);

        @Override
        public ScoreMatrix score(List<String> texts) {
            double[][] rows = new double[texts.size()][];
            for (int i = 0; i < rows.length; i++) {
                double p = positive(tokens(texts.get(i)));
                rows[i] = new double[] {p, 1 - p};
            }
            return new ScoreMatrix(List.of("positive", "negative"), rows);
        }
    }

    /** Logistic regression on word presence with non-zero weights on the signal words only. */
    static final class SparseLogistic extends Planted {
        private final Map<String, Double> weights = new TreeMap<>();

        SparseLogistic(List<String> signal, Random random) {
            for (String s : signal) {
                double magnitude = 0.5 + 1.5 * random.nextDouble();
                weights.put(s, random.nextBoolean() ? magnitude : -magnitude);
            }
        }

        @Override
        double positive(Set<String> present) {
            double z = 0;
            for (String t : present) {
                z += weights.getOrDefault(t, 0.0);
            }
            return 1 / (1 + Math.exp(-z));
        }

        Set<String> gold(String text) {
            Set<String> out = new HashSet<>(tokens(text));
            out.retainAll(weights.keySet());
            return out;
        }

        @Override
        public String describe() {
            return "planted sparse logistic regression";
        }
    }

    /** A complete binary tree of word-presence tests with a random positive score at each leaf. */
    static final class PresenceTree extends Planted {
        private final String[] tests;
        private final double[] leaves;
        private final int depth;

        PresenceTree(List<String> signal, int depth, Random random) {
            this.depth = depth;
            tests = new String[(1 << depth) - 1];
            for (int i = 0; i < tests.length; i++) {
                tests[i] = signal.get(random.nextInt(signal.size()));
            }
            leaves = new double[1 << depth];
            for (int i = 0; i < leaves.length; i++) {
                leaves[i] = 0.02 + 0.96 * random.nextDouble();
            }
        }

        private List<String> path(Set<String> present, List<Integer> outLeaf) {
            List<String> path = new ArrayList<>();
            int node = 0;
            for (int level = 0; level < depth; level++) {
                path.add(tests[node]);
                node = 2 * node + (present.contains(tests[node]) ? 2 : 1);
            }
            outLeaf.add(node - tests.length);
            return path;
        }

        @Override
        double positive(Set<String> present) {
            List<Integer> leaf = new ArrayList<>();
            path(present, leaf);
            return leaves[leaf.get(0)];
        }

        Set<String> gold(String text) {
            Set<String> present = tokens(text);
            Set<String> out = new HashSet<>(path(present, new ArrayList<>()));
            out.retainAll(present);
            return out;
        }

        @Override
        public String describe() {
            return "planted decision tree";
        }
    }
}
