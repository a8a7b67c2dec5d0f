package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.telltale.model.NaiveBayesModel;
import org.telltale.model.NaiveBayesTrainer;
import org.telltale.model.TermCounter;
import org.telltale.model.TrainingSet;
import org.telltale.text.CorpusReader;
import org.telltale.text.CorpusSettings;
import org.telltale.text.Corpora;
import org.telltale.text.Document;
import org.telltale.text.Analyzers;
import org.telltale.text.Masker;
import org.telltale.text.TermIndex;

/**
 * Explanations of a built-in model whose probes are scored from term counts equal those whose
 * probes go through the masked texts (the reference path), on demo messages.
 */
class ExplainerProbeScoringTest {
    @Test
    void explanationsFromCountsEqualExplanationsFromTexts() {
        List<Document> docs = new ArrayList<>();
        try (CorpusReader reader = Corpora.open(Path.of("corpora-demo/support-leaky.jsonl"), CorpusSettings.DEFAULTS)) {
            while (reader.hasNext() && docs.size() < 40) {
                docs.add(reader.next());
            }
        }
        TermCounter counter = new TermCounter("standard", 1);
        NaiveBayesModel model = new NaiveBayesTrainer(1.0).fit(TrainingSet.of(
                docs.stream().map(d -> counter.count(d.text())).toList(), docs.stream().map(Document::label).toList()),
                counter, null);
        ExplainSettings settings = ExplainSettings.defaults().withProbes(600);
        Explainer throughTexts = new Explainer(model, settings, null);
        Explainer throughCounts = new Explainer(model, settings);
        for (Document doc : docs.subList(0, 8)) {
            Explanation a = throughTexts.explain(doc, null);
            Explanation b = throughCounts.explain(doc, null);
            assertEquals(a.terms(), b.terms(), doc.id());
            assertEquals(a.fit(), b.fit(), doc.id());
            assertEquals(a.method(), b.method(), doc.id());
            assertEquals(a.scores(), b.scores(), doc.id());
            // Not vacuous: the model does score this document's masks from counts.
            TermIndex index = TermIndex.of(doc.text(), Analyzers.byName(settings.analyzer()), settings.unit());
            assertNotNull(model.prepare(index, new Masker(settings.filler())), doc.id());
        }
    }
}
