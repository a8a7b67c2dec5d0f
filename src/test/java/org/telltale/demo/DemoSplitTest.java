package org.telltale.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.model.Algorithm;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ModelTraining;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TrainingOutcome;
import org.telltale.model.TrainingRequest;
import org.telltale.text.Document;

class DemoSplitTest {
    private static final DemoCorpus CORPUS = new SupportCorpusGenerator(11, 1000).generate();

    @Test
    void eachLabelKeepsItsShareInTheHoldout() {
        DemoSplit split = DemoSplit.of(CORPUS.leaky(), 0.3, 5);
        for (SupportQueue queue : SupportQueue.values()) {
            long all = CORPUS.leaky().stream().filter(d -> d.label().equals(queue.label())).count();
            long held = split.holdout().stream().filter(d -> d.label().equals(queue.label())).count();
            // Stratified sampling (common practice): round(0.3 · n) of each label.
            assertEquals(Math.round(0.3 * all), held, queue.label());
        }
    }

    @Test
    void partsAreDisjointCoverTheCorpusAndKeepItsOrder() {
        DemoSplit split = DemoSplit.of(CORPUS.leaky(), 0.25, 5);
        Set<String> train = ids(split.train());
        Set<String> holdout = ids(split.holdout());
        assertTrue(train.stream().noneMatch(holdout::contains));
        assertEquals(CORPUS.size(), train.size() + holdout.size());
        List<String> order = CORPUS.leaky().stream().map(Document::id).filter(holdout::contains).toList();
        assertEquals(order, split.holdout().stream().map(Document::id).toList());
    }

    @Test
    void bothVariantsSplitAlikeAndTheSeedDecides() {
        DemoSplit leaky = DemoSplit.of(CORPUS.leaky(), 0.25, 5);
        DemoSplit clean = DemoSplit.of(CORPUS.clean(), 0.25, 5);
        DemoSplit other = DemoSplit.of(CORPUS.leaky(), 0.25, 6);
        assertEquals(ids(leaky.holdout()), ids(clean.holdout()));
        assertNotEquals(ids(leaky.holdout()), ids(other.holdout()));
    }

    @Test
    void heldOutMessagesAreExactlyThoseTrainingHoldsOut(@TempDir Path dir) {
        Path file = CorpusFiles.write(CORPUS, dir).get(0);
        TrainingRequest request = TrainingRequest.defaults(Algorithm.BAYES).withHoldout(0.3, 5);
        DemoSplit split = DemoSplit.of(CORPUS.leaky(), 0.3, 5);
        TrainingOutcome outcome = ModelTraining.train(CORPUS.leaky().iterator(), file, request);
        try (BuiltinModel model = outcome.model()) {
            assertEquals(split.train().size(), model.training().trainingDocuments());
            ScoreMatrix scores = model.score(split.holdout().stream().map(Document::text).toList());
            long correct = 0;
            for (int i = 0; i < scores.size(); i++) {
                correct += scores.predicted(i).equals(split.holdout().get(i).label()) ? 1 : 0;
            }
            // Same documents, same model: training's own holdout evaluation must agree exactly.
            assertEquals(outcome.holdout().total(), split.holdout().size());
            assertEquals(outcome.holdout().correct(), correct);
        }
    }

    @Test
    void aShareOutsideTheOpenUnitIntervalIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> DemoSplit.of(CORPUS.leaky(), 1.0, 5));
        assertThrows(IllegalArgumentException.class, () -> DemoSplit.of(CORPUS.leaky(), 0.0, 5));
    }

    private static Set<String> ids(List<Document> docs) {
        Set<String> ids = new HashSet<>();
        docs.forEach(d -> ids.add(d.id()));
        return ids;
    }
}
