package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.telltale.TelltaleException;
import org.telltale.text.Document;

class ConcurrentExplanationsTest {
    private static final List<Document> DOCS = List.of(
            Document.unlabelled("a", "refund please my order arrived broken"),
            Document.unlabelled("b", "the app crashes when I log in"),
            Document.unlabelled("c", "please refund the second charge on my invoice"),
            Document.unlabelled("d", "login fails after the update and the app crashes"),
            Document.unlabelled("e", "invoice charged twice refund please"));

    @Test
    void explanationsComeInTheDocumentsOrderAndEqualOneAtATime() {
        Explainer explainer = new Explainer(new FunctionClassifier(w -> w.contains("refund") ? 0.8 : 0.3),
                ExplainSettings.defaults().withProbes(300));
        List<Explanation> one = new ArrayList<>();
        ConcurrentExplanations.atOnce(1).explain(explainer, DOCS, null, (d, i, n) -> { }, one::add);
        List<Explanation> three = new ArrayList<>();
        List<String> started = java.util.Collections.synchronizedList(new ArrayList<>());
        ConcurrentExplanations.atOnce(3).explain(explainer, DOCS, null, (d, i, n) -> started.add(d.id()), three::add);
        assertEquals(DOCS.stream().map(Document::id).toList(), three.stream().map(Explanation::id).toList());
        assertEquals(5, started.size());
        for (int i = 0; i < DOCS.size(); i++) {
            assertEquals(one.get(i).terms(), three.get(i).terms());
            assertEquals(one.get(i).fit(), three.get(i).fit());
        }
    }

    @Test
    void theFirstFailureInDocumentOrderIsThrownAsItWas() {
        Explainer explainer = new Explainer(new FunctionClassifier(w -> 0.5), ExplainSettings.defaults().withProbes(50));
        List<Explanation> got = new ArrayList<>();
        TelltaleException e = assertThrows(TelltaleException.class, () -> ConcurrentExplanations.atOnce(2).explain(explainer,
                DOCS, "maybe", (d, i, n) -> { }, got::add));
        assertEquals(0, got.size());
        assertEquals(true, e.getMessage().startsWith("document a:"), e.getMessage());
    }
}
