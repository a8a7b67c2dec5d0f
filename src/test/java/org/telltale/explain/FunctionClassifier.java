package org.telltale.explain;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.ToDoubleFunction;
import org.apache.lucene.analysis.Analyzer;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.text.Analyzers;
import org.telltale.text.TermIndex;
import org.telltale.text.Unit;
import org.telltale.text.UnitKind;

/**
 * A two-label classifier for tests: the score of "yes" is a function of the set of words present
 * (as the standard analyzer sees them), "no" gets the rest. Counts its calls and the texts it saw.
 */
final class FunctionClassifier implements TextClassifier {
    private final Analyzer analyzer = Analyzers.standard();
    private final ToDoubleFunction<Set<String>> yes;
    final AtomicInteger calls = new AtomicInteger();
    final List<String> seen = java.util.Collections.synchronizedList(new ArrayList<>());

    FunctionClassifier(ToDoubleFunction<Set<String>> yes) {
        this.yes = yes;
    }

    Set<String> words(String text) {
        Set<String> out = new HashSet<>();
        for (Unit u : TermIndex.of(text, analyzer, UnitKind.WORD).units()) {
            out.add(u.term());
        }
        return out;
    }

    double yes(String text) {
        return yes.applyAsDouble(words(text));
    }

    @Override
    public ScoreMatrix score(List<String> texts) {
        calls.incrementAndGet();
        seen.addAll(texts);
        double[][] rows = new double[texts.size()][];
        for (int i = 0; i < rows.length; i++) {
            double p = yes(texts.get(i));
            rows[i] = new double[] {p, 1 - p};
        }
        return new ScoreMatrix(List.of("yes", "no"), rows);
    }

    @Override
    public String describe() {
        return "test function classifier";
    }
}
