package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class NaiveBayesTest {
    /*
     * From memory of IIR Example 13.1: Manning, Raghavan & Schütze, Introduction to Information
     * Retrieval (2008), §13.2, Table 13.1 and Example 13.1. Class c = "China".
     */
    private static NaiveBayesModel chinaExample() {
        return ModelTesting.bayes("whitespace",
                "Chinese Beijing Chinese", "china",
                "Chinese Chinese Shanghai", "china",
                "Chinese Macao", "china",
                "Tokyo Japan Chinese", "other");
    }

    private static final String D5 = "Chinese Chinese Chinese Tokyo Japan";

    @Test
    void estimatesMatchTheTextbookExample() {
        try (NaiveBayesModel m = chinaExample()) {
            int c = m.labels().indexOf("china");
            int cbar = m.labels().indexOf("other");
            Vocabulary v = m.vocabulary();
            assertEquals(6, v.size());
            // Printed estimates of IIR Example 13.1 (from memory of the book).
            assertEquals(3.0 / 4, Math.exp(m.logPrior(c)), 1e-12);
            assertEquals(1.0 / 4, Math.exp(m.logPrior(cbar)), 1e-12);
            assertEquals(3.0 / 7, Math.exp(m.logLikelihood(c, v.indexOf("Chinese"))), 1e-12);
            assertEquals(1.0 / 14, Math.exp(m.logLikelihood(c, v.indexOf("Tokyo"))), 1e-12);
            assertEquals(1.0 / 14, Math.exp(m.logLikelihood(c, v.indexOf("Japan"))), 1e-12);
            assertEquals(2.0 / 9, Math.exp(m.logLikelihood(cbar, v.indexOf("Chinese"))), 1e-12);
            assertEquals(2.0 / 9, Math.exp(m.logLikelihood(cbar, v.indexOf("Tokyo"))), 1e-12);
            assertEquals(2.0 / 9, Math.exp(m.logLikelihood(cbar, v.indexOf("Japan"))), 1e-12);
        }
    }

    @Test
    void decisionForTheTestDocumentMatchesTheTextbook() {
        try (NaiveBayesModel m = chinaExample()) {
            int c = m.labels().indexOf("china");
            int cbar = m.labels().indexOf("other");
            double[] joint = m.logScores(D5);
            // IIR Example 13.1 prints P(c|d5) ∝ 3/4·(3/7)^3·1/14·1/14 ≈ 0.0003 and
            // P(c̄|d5) ∝ 1/4·(2/9)^3·2/9·2/9 ≈ 0.0001 (from memory of the book).
            assertEquals(0.75 * Math.pow(3.0 / 7, 3) / 14 / 14, Math.exp(joint[c]), 1e-15);
            assertEquals(0.25 * Math.pow(2.0 / 9, 5), Math.exp(joint[cbar]), 1e-15);
            assertEquals(0.0003, Math.exp(joint[c]), 0.00005);
            assertEquals(0.0001, Math.exp(joint[cbar]), 0.00005);
            assertEquals("china", m.score(List.of(D5)).predicted(0));
        }
    }

    @Test
    void posteriorIsTheNormalisedJoint() {
        try (NaiveBayesModel m = chinaExample()) {
            double pc = 0.75 * Math.pow(3.0 / 7, 3) / 14 / 14;
            double pcbar = 0.25 * Math.pow(2.0 / 9, 5);
            double[] p = m.probabilities(D5);
            // Bayes' rule over the two classes (common practice).
            assertEquals(pc / (pc + pcbar), p[m.labels().indexOf("china")], 1e-12);
            assertEquals(1.0, p[0] + p[1], 1e-12);
        }
    }

    @Test
    void unknownTermsAreIgnoredAsTheTextbookPrescribes() {
        try (NaiveBayesModel m = chinaExample()) {
            // IIR §13.2: terms not in the vocabulary are skipped at classification time.
            assertEquals(m.logScores(D5)[0], m.logScores(D5 + " Kyoto Osaka")[0], 0.0);
            double[] prior = m.logScores("nothing known here");
            assertEquals(Math.log(0.75), prior[m.labels().indexOf("china")], 1e-12);
        }
    }

    @Test
    void smoothingChangesTheEstimates() {
        TermCounter counter = new TermCounter("whitespace", 1);
        TrainingSet data = ModelTesting.trainingSet(counter, "a a b", "x", "b", "y");
        try (NaiveBayesModel m = new NaiveBayesTrainer(0.5).fit(data, counter, null)) {
            // (T_ct + a) / (sum T_ct' + a|V|): (2 + 0.5) / (3 + 0.5·2) for 'a' under x (common practice).
            assertEquals(2.5 / 4, Math.exp(m.logLikelihood(0, m.vocabulary().indexOf("a"))), 1e-12);
            assertTrue(m.describe().contains("bayes"), m.describe());
        }
    }
}
