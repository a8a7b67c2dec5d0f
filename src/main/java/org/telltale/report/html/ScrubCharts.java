package org.telltale.report.html;

import java.util.ArrayList;
import java.util.List;
import org.telltale.audit.AuditResult;

/**
 * Geometry of the scrub chart: per kind and for all artefacts at once, a bar before and a bar after the rewrite. The measure is
 * accuracy where gold labels exist; otherwise the share of documents that keep their predicted
 * label (all of them before the rewrite, 1 − flip rate after).
 */
final class ScrubCharts {
    static final int WIDTH = 720;
    private static final int LEFT = 130;
    private static final int RIGHT = 640;
    private static final int ROW = 46;
    private static final int TOP = 26;
    private static final int BAR = 14;

    private ScrubCharts() {
    }

    static AuditView.ScrubChart of(List<AuditResult.Scrub> scrub) {
        boolean accuracy = !scrub.isEmpty()
                && scrub.stream().allMatch(s -> s.accuracyBefore() != null && s.accuracyAfter() != null);
        List<AuditView.ScrubRow> rows = new ArrayList<>();
        for (int i = 0; i < scrub.size(); i++) {
            AuditResult.Scrub s = scrub.get(i);
            double before = accuracy ? s.accuracyBefore() : 1.0;
            double after = accuracy ? s.accuracyAfter() : 1.0 - s.flipRate();
            int y = TOP + i * ROW;
            rows.add(new AuditView.ScrubRow(s.all() ? "all at once" : s.group().key(), s.mode().key(), Integer.toString(y),
                    Integer.toString(y + BAR + 2), Integer.toString(BAR), width(before), width(after),
                    Numbers.percent(before), Numbers.percent(after), Numbers.percent(s.flipRate()),
                    Numbers.plain(s.scoreDrop(), 3), s.documents(), s.flips(),
                    s.artefacts().size() + (s.artefacts().size() == 1 ? " artefact" : " artefacts")));
        }
        List<AuditView.Tick> ticks = new ArrayList<>();
        for (int p = 0; p <= 100; p += 25) {
            ticks.add(new AuditView.Tick(Numbers.coord(LEFT + (RIGHT - LEFT) * p / 100.0), p + "%"));
        }
        int height = TOP + Math.max(1, scrub.size()) * ROW + 8;
        return new AuditView.ScrubChart(accuracy ? "accuracy" : "documents keeping their predicted label",
                WIDTH, height, rows, ticks, Integer.toString(LEFT), Integer.toString(RIGHT));
    }

    private static String width(double share) {
        double clamped = Double.isNaN(share) ? 0 : Math.max(0, Math.min(1, share));
        return Numbers.coord((RIGHT - LEFT) * clamped);
    }
}
