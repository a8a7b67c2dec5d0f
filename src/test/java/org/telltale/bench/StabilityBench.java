package org.telltale.bench;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.telltale.explain.ExplainSettings;
import org.telltale.explain.Explainer;
import org.telltale.explain.Explanation;
import org.telltale.model.NaiveBayesModel;
import org.telltale.model.SpamAssassinMails;
import org.telltale.model.TextClassifier;
import org.telltale.text.Document;

/**
 * Two stability measures on the long documents of {@link HardBench} (200–400 tokens, about 240
 * distinct words, so at least 200 word units on most documents), for each variant of the settings:
 *
 * <ul>
 *   <li>{@code long}: top-10 agreement of two seeds (same term, same sign; common practice, e.g.
 *       Slack et al. 2021) at the default budget, on the documents with at least 200 units;
 *   <li>{@code auto}: model calls and top-10 agreement with a converged answer (20,000 probes)
 *       of the fixed default budget and of {@code --probes auto}, plain and on the places whose
 *       converged interval excludes zero;
 *   <li>{@code demo}: the same on the first N messages of corpora-demo/support-leaky.jsonl, for
 *       the built-in naive Bayes and logistic models trained on it;
 *   <li>{@code nb}: the saturated model of {@code SaturatedAgreementTest} (multinomial naive Bayes
 *       on 250 + 250 whole SpamAssassin mails, explained through its logits), top-10 agreement of
 *       the seed pairs 1/2, 3/4 and 5/6 on twelve held-out mails.
 * </ul>
 *
 * Not a test: run by {@code bench/faithfulness.sh N SEED long|auto|demo|nb [variants]} (N and
 * SEED are ignored by {@code nb}, SEED by {@code demo}).
 */
final class StabilityBench {
    static final int MIN_UNITS = 200;
    static final int CONVERGED = 20_000;
    static final int K = 10;

    private StabilityBench() {
    }

    static void seeds(int documents, long seed, String variants) {
        HardBench.Corpus corpus = HardBench.corpus(documents, seed);
        System.out.printf(Locale.ROOT, "long: documents %d, seed %d, seed agreement of seeds 1 and 2 on documents with"
                + " at least %d units, K = %d%n", documents, seed, MIN_UNITS, K);
        for (String variant : variants.split(";")) {
            ExplainSettings settings = HardBench.apply(ExplainSettings.defaults().withWords(K), variant.strip());
            StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "%-40s", variant.strip()));
            line.append(seedAgreement("logistic", corpus.logistic(), corpus.docs(), settings));
            line.append(seedAgreement("tree", corpus.tree(), corpus.docs(), settings));
            System.out.println(line);
        }
    }

    private static String seedAgreement(String name, TextClassifier model, List<Document> docs, ExplainSettings s) {
        Explainer a = new Explainer(model, s.withSeed(1));
        Explainer b = new Explainer(model, s.withSeed(2));
        double sum = 0;
        long units = 0;
        int n = 0;
        for (Document doc : docs) {
            Explanation ea = a.explain(doc, null);
            if (ea.method().units() < MIN_UNITS) {
                continue;
            }
            Explanation eb = b.explain(doc, null);
            sum += GoldRecall.agreement(ea.terms(), eb.terms(), K);
            units += ea.method().units();
            n++;
        }
        return String.format(Locale.ROOT, "  %s %.3f (%d documents, %.0f units)", name, sum / n, n, (double) units / n);
    }

    static void budget(int documents, long seed, String variants) {
        HardBench.Corpus corpus = HardBench.corpus(documents, seed);
        budget("harder benchmark, seed " + seed, List.of(corpus.logistic(), corpus.tree()), List.of("logistic", "tree"),
                corpus.docs(), variants);
    }

    /**
     * Calls and agreement with the converged answer, plain top-K and on the places that matter
     * ({@link GoldRecall#effectAgreement}), of the fixed default budget and of {@code auto} under
     * each variant; the converged and fixed answers are computed once for all variants.
     */
    static void budget(String title, List<TextClassifier> models, List<String> names, List<Document> docs,
            String variants) {
        System.out.printf(Locale.ROOT, "auto: %s, %d documents, top-%d agreement with %d probes (plain / on effects)%n",
                title, docs.size(), K, CONVERGED);
        ExplainSettings base = ExplainSettings.defaults().withWords(K);
        for (int m = 0; m < models.size(); m++) {
            TextClassifier model = models.get(m);
            Explainer converged = new Explainer(model, base.withProbes(CONVERGED));
            Explainer fixed = new Explainer(model, base.withProbes(ExplainSettings.DEFAULT_PROBES));
            List<Explanation> refs = new ArrayList<>();
            double[] f = new double[3];
            for (Document doc : docs) {
                Explanation ref = converged.explain(doc, null);
                refs.add(ref);
                Explanation e = fixed.explain(doc, null);
                f[0] += e.method().calls() / (double) docs.size();
                f[1] += GoldRecall.agreement(e.terms(), ref.terms(), K) / docs.size();
                f[2] += GoldRecall.effectAgreement(ref.terms(), e.terms(), K) / docs.size();
            }
            System.out.printf(Locale.ROOT, "  %s: fixed %.0f calls, agreement %.3f / %.3f%n", names.get(m), f[0], f[1], f[2]);
            for (String variant : variants.split(";")) {
                ExplainSettings settings = HardBench.apply(base, variant.strip()).withProbes(ExplainSettings.AUTO);
                Explainer auto = new Explainer(model, settings);
                double[] a = new double[3];
                for (int i = 0; i < docs.size(); i++) {
                    Explanation e = auto.explain(docs.get(i), null);
                    a[0] += e.method().calls() / (double) docs.size();
                    a[1] += GoldRecall.agreement(e.terms(), refs.get(i).terms(), K) / docs.size();
                    a[2] += GoldRecall.effectAgreement(refs.get(i).terms(), e.terms(), K) / docs.size();
                }
                System.out.printf(Locale.ROOT, "  %s: auto %-28s %.0f calls (%.0f %% of fixed), agreement %.3f / %.3f%n",
                        names.get(m), variant.strip(), a[0], 100 * a[0] / f[0], a[1], a[2]);
            }
        }
    }

    /**
     * {@code demo}: the same on the first {@code documents} messages of the demo corpus, for the
     * built-in naive Bayes (the default algorithm) and logistic models trained on the whole corpus
     * with default settings, as {@code telltale train} does.
     */
    static void demo(int documents, String variants) {
        java.nio.file.Path corpus = java.nio.file.Path.of("corpora-demo/support-leaky.jsonl");
        List<TextClassifier> models = new ArrayList<>();
        for (org.telltale.model.Algorithm algorithm : List.of(org.telltale.model.Algorithm.BAYES,
                org.telltale.model.Algorithm.LOGISTIC)) {
            try (org.telltale.text.CorpusReader reader = org.telltale.text.Corpora.open(corpus)) {
                models.add(org.telltale.model.ModelTraining.train(reader, corpus,
                        org.telltale.model.TrainingRequest.defaults(algorithm)).model());
            }
        }
        List<Document> docs = new ArrayList<>();
        try (org.telltale.text.CorpusReader reader = org.telltale.text.Corpora.open(corpus)) {
            while (reader.hasNext() && docs.size() < documents) {
                docs.add(reader.next());
            }
        }
        budget("demo corpus " + corpus, models, List.of("naive-bayes", "logistic"), docs, variants);
    }

    static void naiveBayes(String variants) throws IOException {
        // The split of SaturatedAgreementTest, so its six mails come first.
        SpamAssassinMails.NaiveBayesSplit split = SpamAssassinMails.naiveBayes();
        NaiveBayesModel model = split.model();
        List<Document> ham = split.ham();
        List<Document> spam = split.spam();
        List<Document> explained = new ArrayList<>();
        for (int i = 0; i < 6; i++) {
            explained.add(i < 3 ? ham.get(250 + i) : spam.get(250 + i - 3));
        }
        for (int i = 3; i < 9; i++) {
            explained.add(i < 6 ? ham.get(250 + i) : spam.get(250 + i - 3));
        }
        System.out.printf(Locale.ROOT, "nb: naive Bayes on 500 whole SpamAssassin mails, %d held-out mails (the first"
                + " six are SaturatedAgreementTest's), top-%d agreement of two seeds%n", explained.size(), K);
        for (String variant : variants.split(";")) {
            ExplainSettings settings = HardBench.apply(ExplainSettings.defaults().withWords(K), variant.strip());
            StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "%-40s", variant.strip()));
            for (long seedA : new long[] {1, 3, 5}) {
                Explainer a = new Explainer(model, settings.withSeed(seedA));
                Explainer b = new Explainer(model, settings.withSeed(seedA + 1));
                double first = 0;
                double all = 0;
                for (int i = 0; i < explained.size(); i++) {
                    double agreement = GoldRecall.agreement(a.explain(explained.get(i), null).terms(),
                            b.explain(explained.get(i), null).terms(), K);
                    all += agreement / explained.size();
                    if (i < 6) {
                        first += agreement / 6;
                    }
                }
                line.append(String.format(Locale.ROOT, "  seeds %d/%d: six %.3f, twelve %.3f", seedA, seedA + 1,
                        first, all));
            }
            System.out.println(line);
        }
    }
}
