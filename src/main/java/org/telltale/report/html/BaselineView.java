package org.telltale.report.html;

import java.util.List;
import org.telltale.audit.Baseline;

/**
 * What the audit report's "Since the baseline" section shows: the baseline's file, and the
 * findings that are new, unchanged or resolved against it, each as one table row.
 *
 * @param file  the baseline as the user named it
 * @param rows  new rows first, then resolved, then unchanged
 * @param added how many are new
 * @param unchanged how many are unchanged
 * @param resolved how many are resolved
 */
public record BaselineView(String file, List<Row> rows, int added, int unchanged, int resolved) {

    /** One artefact: its state against the baseline, kind, label, pattern, severity, and whether the policy accepts it. */
    public record Row(String state, String kind, String label, String pattern, String severity, boolean suppressed) {
    }

    /** The view of {@code comparison}, or {@code null} when there is none. */
    static BaselineView of(Baseline.Comparison comparison) {
        if (comparison == null) {
            return null;
        }
        List<Row> rows = new java.util.ArrayList<>();
        add(rows, Baseline.State.NEW, comparison.added());
        add(rows, Baseline.State.RESOLVED, comparison.resolved());
        add(rows, Baseline.State.UNCHANGED, comparison.unchanged());
        return new BaselineView(comparison.baseline(), rows, comparison.added().size(), comparison.unchanged().size(),
                comparison.resolved().size());
    }

    private static void add(List<Row> rows, Baseline.State state, List<Baseline.Entry> entries) {
        for (Baseline.Entry e : entries) {
            rows.add(new Row(state.key(), e.identity().kind(), e.identity().label(), e.identity().pattern(),
                    e.severity().key(), e.suppressed()));
        }
    }
}
