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
 * @param method    how it was computed and what the run observed (settings, units, calls,
 *                  stability, notes); {@code null} when unknown, e.g. read from a minimal file
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
        String gold,
        Method method) {

    public Explanation {
        terms = List.copyOf(terms);
    }

    /** An explanation without method details. */
    public Explanation(String id, String label, double score, String predicted, Map<String, Double> scores,
            int probes, Fit fit, List<TermWeight> terms, Timing timing, String text, String gold) {
        this(id, label, score, predicted, scores, probes, fit, terms, timing, text, gold, null);
    }

    /**
     * How an explanation was computed and what the run observed.
     *
     * @param unit        {@code word}, {@code occurrence} or {@code line}
     * @param weighting   {@code cosine} or {@code shapley}
     * @param selection   the selection used: {@code forward}, {@code lasso}, or {@code all} (none)
     * @param bandwidth   σ of the cosine kernel
     * @param ridge       λ of the ridge penalty in sampled cosine fits
     * @param words       K asked for (the number of units when {@code selection} is {@code all})
     * @param seed        the run seed
     * @param analyzer    the analyzer name
     * @param filler      the text written in place of removed spans
     * @param level       the interval coverage, e.g. 0.95
     * @param units       d, the number of units of the document (after any cap)
     * @param calls       distinct texts sent to the model (probes minus repeats)
     * @param exact       true when every subset of units was enumerated
     * @param stability   split-half agreement of the top terms and signs, NaN when not asked for
     * @param interval    how the intervals were formed: {@code sandwich}, or {@code exact} (zero width)
     * @param target      what the surrogate explains: {@code probability} or {@code log-odds}
     * @param source      where the target came from: {@code probabilities}, {@code logits} or
     *                    {@code clipped probabilities}
     * @param targetValue the target at the original document
     * @param saturated   the share of probes whose probability lay within 1e-6 of 0 or 1
     * @param probesToGo  0 when the reported units are separated from the next one at the interval
     *                    level; otherwise an estimate of the further probes that would separate
     *                    them, -1 when no estimate is possible (exact, or no separation in sight)
     * @param sampling    how removed counts were drawn: {@code uniform} or {@code kernel}
     * @param notes       plain-language remarks on this explanation (caps, saturation, …)
     */
    public record Method(String unit, String weighting, String selection, double bandwidth, double ridge,
            int words, long seed, String analyzer, String filler, double level, int units, int calls,
            boolean exact, double stability, String interval, String target, String source, double targetValue,
            double saturated, int probesToGo, String sampling, List<String> notes) {
        public Method {
            notes = List.copyOf(notes);
        }

        /** True when the explained target is the log-odds of the label. */
        public boolean logOdds() {
            return "log-odds".equals(target);
        }

        /** True when most probes scored within 1e-6 of 0 or 1. */
        public boolean isSaturated() {
            return saturated > 0.5;
        }
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
