package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.telltale.model.NaiveBayesModel;
import org.telltale.model.NaiveBayesTrainer;
import org.telltale.model.TermCounter;
import org.telltale.model.TrainingSet;
import org.telltale.text.Analyzers;
import org.telltale.text.Document;
import org.telltale.text.TermIndex;
import org.telltale.text.Unit;
import org.telltale.text.UnitKind;

class TargetTest {
    private static final List<Document> TRAINING = List.of(
            new Document("b1", "invoice charged twice refund my card please", "billing"),
            new Document("b2", "the invoice shows a wrong amount refund it", "billing"),
            new Document("b3", "card charged again invoice number attached", "billing"),
            new Document("s1", "parcel lost courier never arrived tracking", "shipping"),
            new Document("s2", "courier left the parcel at the wrong door", "shipping"),
            new Document("s3", "tracking says delivered but no parcel here", "shipping"));

    private static NaiveBayesModel naiveBayes() {
        TermCounter counter = new TermCounter("standard", 1);
        TrainingSet data = TrainingSet.of(TRAINING.stream().map(d -> counter.count(d.text())).toList(),
                TRAINING.stream().map(Document::label).toList());
        return new NaiveBayesTrainer(1.0).fit(data, counter, null);
    }

    @Test
    void logOddsOfNaiveBayesRecoverItsOwnPerWordLogLikelihoodRatios() {
        // Manning, Raghavan & Schütze, Introduction to Information Retrieval, §13.2, eq. 13.3: the
        // log-odds of two classes is log P(c)/P(c') + Σ_t n_t (log P(t|c) − log P(t|c')), additive in
        // word counts; removing every occurrence of a word changes it by n_t times the word's ratio.
        NaiveBayesModel model = naiveBayes();
        String text = "courier lost the parcel and the invoice never came unknownword";
        ExplainSettings settings = ExplainSettings.defaults().withWords(ExplainSettings.ALL_UNITS).withProbes(1 << 10);
        Explanation e = new Explainer(model, settings).explain(Document.unlabelled("nb", text), "shipping");
        assertEquals("log-odds", e.method().target());
        assertEquals("logits", e.method().source());
        assertTrue(e.method().exact());
        int c = model.labels().indexOf("shipping");
        int other = 1 - c;
        Map<String, Integer> counts = model.counts(text).columns().length == 0 ? Map.of() : countsOf(text);
        assertEquals(9, e.terms().size()); // "the" twice: 10 tokens, 9 words
        for (Explanation.TermWeight t : e.terms()) {
            int column = model.vocabulary().indexOf(t.term());
            double expected = column < 0 ? 0.0
                    : counts.get(t.term()) * (model.logLikelihood(c, column) - model.logLikelihood(other, column));
            assertEquals(expected, t.weight(), 1e-9, t.term());
        }
        // The intercept is the log-odds of the empty text: the prior ratio.
        assertEquals(model.logPrior(c) - model.logPrior(other), e.fit().intercept(), 1e-9);
    }

    private static Map<String, Integer> countsOf(String text) {
        Map<String, Integer> out = new java.util.HashMap<>();
        for (Unit u : TermIndex.of(text, Analyzers.standard(), UnitKind.WORD).units()) {
            out.put(u.term(), u.spans().size());
        }
        return out;
    }

    @Test
    void builtInModelsAnswerLogitsWhoseSoftmaxIsTheirProbabilities() {
        // Softmax definition (common practice): p_c = exp(ℓ_c) / Σ exp(ℓ_j).
        NaiveBayesModel model = naiveBayes();
        var m = model.score(List.of("parcel lost", "invoice refund"));
        assertTrue(m.hasLogits());
        for (int i = 0; i < m.size(); i++) {
            double[] l = m.logitRow(i);
            double sum = Math.exp(l[0]) + Math.exp(l[1]);
            assertEquals(Math.exp(l[0]) / sum, m.score(i, 0), 1e-12);
            assertEquals(model.logScores(i == 0 ? "parcel lost" : "invoice refund")[1], l[1], 0.0);
        }
    }

    /** p = logistic(z) with z around 15: every probe lies within 1e-6 of 1. */
    private static double saturated(Set<String> words) {
        double z = 15 + 0.8 * (words.contains("lost") ? 1 : 0) - 0.5 * (words.contains("refund") ? 1 : 0)
                + 0.3 * (words.contains("parcel") ? 1 : 0);
        return 1 / (1 + Math.exp(-z));
    }

    @Test
    void saturatedProbabilitiesAreExplainedAsLogOddsAndTheNoteAsksForLogits() {
        // Logistic function and its inverse (common practice): log(p / (1 − p)) = z.
        FunctionClassifier model = new FunctionClassifier(TargetTest::saturated);
        String text = "the courier lost my parcel again and support never answered my refund request";
        Explanation auto = new Explainer(model, ExplainSettings.defaults().withWords(3))
                .explain(Document.unlabelled("sat", text), "yes");
        assertEquals("log-odds", auto.method().target());
        assertEquals("clipped probabilities", auto.method().source());
        assertTrue(auto.method().isSaturated(), "share " + auto.method().saturated());
        assertTrue(auto.method().notes().stream().anyMatch(n -> n.contains("saturated") && n.contains("logits")),
                auto.method().notes().toString());
        Map<String, Double> truth = Map.of("lost", 0.8, "refund", -0.5, "parcel", 0.3);
        assertEquals(truth.keySet(), auto.terms().stream().map(Explanation.TermWeight::term).collect(
                java.util.stream.Collectors.toSet()));
        for (Explanation.TermWeight t : auto.terms()) {
            double z = truth.get(t.term());
            // The ridge penalty shrinks a little; the interval covers the unpenalised fit.
            assertEquals(z, t.weight(), 0.02 * Math.abs(z), t.term());
            assertTrue(t.low() <= z + 1e-6 && z - 1e-6 <= t.high(), t.toString());
        }

        Explanation probability = new Explainer(model, ExplainSettings.defaults().withWords(3)
                .withTarget(Target.PROBABILITY)).explain(Document.unlabelled("sat", text), "yes");
        assertEquals("probability", probability.method().target());
        assertTrue(probability.method().notes().stream().anyMatch(n -> n.contains("saturated") && n.contains("log-odds")),
                probability.method().notes().toString());
        for (Explanation.TermWeight t : probability.terms()) {
            assertTrue(Math.abs(t.weight()) < 1e-5, "a saturated probability barely moves: " + t);
        }
    }

    @Test
    void unsaturatedProbabilitiesWithoutLogitsStayProbabilities() {
        FunctionClassifier model = new FunctionClassifier(words -> words.contains("lost") ? 0.3 : 0.7);
        Explanation e = new Explainer(model, ExplainSettings.defaults().withProbes(300))
                .explain(Document.unlabelled("p", "lost parcel courier never came back again today sadly"), "yes");
        assertEquals("probability", e.method().target());
        assertEquals(0.0, e.method().saturated(), 0.0);
    }
}
