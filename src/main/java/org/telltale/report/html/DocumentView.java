package org.telltale.report.html;

import java.util.List;

/**
 * Everything the document template shows for one explanation, already formatted: the template
 * only places values, it never computes them.
 *
 * @param anchor   the element id of the view, also the prefix of the ids inside it
 * @param segments the marked text, or {@code null} when the JSON carried no text
 * @param method   how the explanation was computed, one line, or {@code null} when not recorded
 * @param notes    the explainer's remarks on this explanation (caps, degenerate fits)
 */
public record DocumentView(
        String anchor,
        String id,
        String label,
        String predicted,
        String gold,
        String score,
        List<LabelBar> scores,
        int probes,
        String r2,
        String r2Width,
        String intercept,
        String prediction,
        List<LedgerRow> ledger,
        List<MarkedText.Segment> segments,
        int spanCount,
        int characters,
        String method,
        List<String> notes) {

    /** Whether the model predicts the explained label. */
    public boolean explainsPrediction() {
        return label.equals(predicted);
    }

    /** The element id of the hidden description of ledger row {@code row}. */
    public String descId(int row) {
        return anchor + "-t" + row;
    }

    /** One label's score as a bar; widths are SVG user units out of 100. */
    public record LabelBar(String label, String value, String width, boolean explained, boolean predicted) {
    }

    /**
     * One selected term: formatted weight and interval, the whisker geometry (x positions out of
     * 100, zero at {@code xZero}), and the sentence a screen reader speaks for each occurrence.
     */
    public record LedgerRow(
            int row,
            String term,
            String weight,
            String low,
            String high,
            int occurrences,
            boolean toward,
            int level,
            String xZero,
            String xLow,
            String xHigh,
            String xWeight,
            String description) {
    }
}
