package org.telltale.report.html;

import java.util.ArrayList;
import java.util.List;
import org.telltale.audit.AuditResult;

/**
 * Geometry of the chart of importance (y) against association (x) for every tested term: the terms
 * of artefacts as points shaped by kind and linked to their artefact's evidence, the others as a
 * grey cloud that shows where the flagged terms stand out from.
 */
final class Scatters {
    static final int WIDTH = 720;
    static final int HEIGHT = 380;
    private static final double LEFT = 64;
    private static final double RIGHT = WIDTH - 24;
    private static final double TOP = 18;
    private static final double BOTTOM = HEIGHT - 46;

    private Scatters() {
    }

    static AuditView.Scatter of(List<AuditView.FindingRow> findings, AuditResult audit, double zThreshold) {
        java.util.Map<String, AuditView.FindingRow> rowOf = new java.util.HashMap<>();
        for (int i = 0; i < findings.size(); i++) {
            rowOf.put(audit.artefacts().get(i).id(), findings.get(i));
        }
        double xLow = 0;
        double xHigh = Double.isFinite(zThreshold) ? zThreshold : 1;
        double yHigh = 0;
        for (AuditResult.TermStat t : audit.terms()) {
            if (Double.isFinite(t.association())) {
                xLow = Math.min(xLow, t.association());
                xHigh = Math.max(xHigh, t.association());
            }
            if (Double.isFinite(t.importance())) {
                yHigh = Math.max(yHigh, t.importance());
            }
        }
        NiceScale x = NiceScale.of(xLow, xHigh * 1.05, 6);
        NiceScale y = NiceScale.of(0, yHigh == 0 ? 1 : yHigh * 1.05, 5);
        List<AuditView.Tick> xTicks = new ArrayList<>();
        for (double t : x.ticks()) {
            xTicks.add(new AuditView.Tick(Numbers.coord(x.map(t, LEFT, RIGHT)), label(t, x.step())));
        }
        List<AuditView.Tick> yTicks = new ArrayList<>();
        for (double t : y.ticks()) {
            yTicks.add(new AuditView.Tick(Numbers.coord(y.map(t, BOTTOM, TOP)), label(t, y.step())));
        }
        List<AuditResult.TermStat> flagged = new ArrayList<>();
        List<AuditView.CloudPoint> cloud = new ArrayList<>();
        for (AuditResult.TermStat t : audit.terms()) {
            if (t.artefact() != null && rowOf.containsKey(t.artefact())) {
                flagged.add(t);
            } else {
                cloud.add(new AuditView.CloudPoint(Numbers.coord(x.map(finite(t.association()), LEFT, RIGHT)),
                        Numbers.coord(y.map(finite(t.importance()), BOTTOM, TOP))));
            }
        }
        // One label per artefact, on its strongest term, naming the artefact's pattern: the reviewer
        // decides about artefacts, and one label per term crowds the corner where they cluster.
        java.util.Map<String, AuditResult.TermStat> strongest = new java.util.LinkedHashMap<>();
        for (AuditResult.Artefact a : audit.artefacts()) {
            for (AuditResult.TermStat t : flagged) {
                if (t.artefact().equals(a.id()) && (!strongest.containsKey(a.id())
                        || finite(t.importance()) > finite(strongest.get(a.id()).importance()))) {
                    strongest.put(a.id(), t);
                }
            }
        }
        List<ChartLabels.Request> requests = new ArrayList<>();
        List<AuditResult.TermStat> labelledTerms = new ArrayList<>(strongest.values());
        for (AuditResult.TermStat t : labelledTerms) {
            requests.add(new ChartLabels.Request(x.map(finite(t.association()), LEFT, RIGHT),
                    y.map(finite(t.importance()), BOTTOM, TOP), shortened(rowOf.get(t.artefact()).pattern())));
        }
        List<double[]> markers = new ArrayList<>();
        for (AuditResult.TermStat t : flagged) {
            markers.add(new double[] {x.map(finite(t.association()), LEFT, RIGHT), y.map(finite(t.importance()), BOTTOM, TOP)});
        }
        List<ChartLabels.Placement> placements = new ChartLabels(0, 0, WIDTH, HEIGHT).place(requests, markers);
        List<AuditView.Point> points = new ArrayList<>();
        for (AuditResult.TermStat t : flagged) {
            AuditView.FindingRow f = rowOf.get(t.artefact());
            String term = VisibleText.inline(t.term());
            String tip = term + " of " + f.pattern() + " (" + f.kind() + ", " + f.severity() + ", " + f.label()
                    + "): importance " + Numbers.plain(t.importance(), 3) + ", association "
                    + Numbers.plain(t.association(), 2);
            int at = labelledTerms.indexOf(t);
            ChartLabels.Placement place = at >= 0 ? placements.get(at) : ChartLabels.Placement.NONE;
            AuditView.PointLabel label = place.placed()
                    ? new AuditView.PointLabel(requests.get(at).text(), Numbers.coord(place.dx()),
                            Numbers.coord(place.dy()), place.anchor())
                    : null;
            points.add(new AuditView.Point(f.anchor(), Numbers.coord(x.map(finite(t.association()), LEFT, RIGHT)),
                    Numbers.coord(y.map(finite(t.importance()), BOTTOM, TOP)), AuditViews.shape(f.kind()), f.severity(),
                    f.suppressed(), term, tip, label));
        }
        String threshold = Double.isFinite(zThreshold) ? Numbers.coord(x.map(zThreshold, LEFT, RIGHT)) : null;
        return new AuditView.Scatter(WIDTH, HEIGHT, Numbers.coord(LEFT), Numbers.coord(RIGHT), Numbers.coord(TOP),
                Numbers.coord(BOTTOM), xTicks, yTicks, threshold,
                Double.isFinite(zThreshold) ? "z threshold " + Numbers.plain(zThreshold, 2) : "", points, cloud);
    }

    private static double finite(double v) {
        return Double.isFinite(v) ? v : 0;
    }

    /** Longest label drawn in the chart; longer patterns are cut with an ellipsis (the tooltip has them whole). */
    static final int LABEL_LIMIT = 24;

    static String shortened(String pattern) {
        String visible = VisibleText.inline(pattern);
        return visible.length() <= LABEL_LIMIT ? visible : visible.substring(0, LABEL_LIMIT - 1) + "…";
    }

    private static String label(double value, double step) {
        int decimals = step >= 1 ? 0 : (int) Math.ceil(-Math.log10(step));
        return Numbers.plain(value, decimals);
    }
}
