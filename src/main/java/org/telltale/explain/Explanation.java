package org.telltale.explain;

import java.util.List;
import java.util.Map;
import org.telltale.text.Span;

/**
 * The explanation of one document for one label: the surrogate's intercept and fit, the selected
 * terms with their weights and intervals, and enough of the document (its text and the model's
 * scores) for a report to be rendered from this value alone.
 *
 * @param id        the document id
 * @param label     the label explained
 * @param score     the model's score for {@code label} on the original document
 * @param predicted the label the model predicts for the original document
 * @param scores    the model's score for every label on the original document, in the model's order
 * @param probes    the number of probes the fit used (probe 0, the original, included)
 * @param fit       intercept, weighted R² and the surrogate's prediction at the original document
 * @param terms     the selected terms, by decreasing absolute weight
 * @param timing    where the time went
 * @param text      the original text the spans point into
 * @param gold      the gold label, or {@code null}
 */
public record Explanation(
        String id,
        String label,
        double score,
        String predicted,
        Map<String, Double> scores,
        int probes,
        Fit fit,
        List<TermWeight> terms,
        Timing timing,
        String text,
        String gold) {

    public Explanation {
        terms = List.copyOf(terms);
    }

    /** The surrogate's intercept, weighted R² on the probes, and prediction at the original. */
    public record Fit(double intercept, double r2, double prediction) {
    }

    /**
     * One selected unit: its weight in the surrogate with an uncertainty interval, and every span
     * where it occurs in the original text.
     */
    public record TermWeight(String term, double weight, double low, double high, List<Span> spans) {
        public TermWeight {
            spans = List.copyOf(spans);
        }
    }

    /** Milliseconds spent waiting for the model, and in all. */
    public record Timing(long modelMs, long totalMs) {
    }
}
