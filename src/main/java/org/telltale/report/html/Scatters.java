package org.telltale.report.html;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/** Geometry of the chart of importance (y) against association (x) for the findings. */
final class Scatters {
    static final int WIDTH = 720;
    static final int HEIGHT = 380;
    private static final double LEFT = 64;
    private static final double RIGHT = WIDTH - 24;
    private static final double TOP = 18;
    private static final double BOTTOM = HEIGHT - 46;

    private Scatters() {
    }

    static AuditView.Scatter of(List<AuditView.FindingRow> findings, double zThreshold) {
        double xLow = 0;
        double xHigh = Double.isFinite(zThreshold) ? zThreshold : 1;
        double yHigh = 0;
        for (AuditView.FindingRow f : findings) {
            if (Double.isFinite(f.associationValue())) {
                xLow = Math.min(xLow, f.associationValue());
                xHigh = Math.max(xHigh, f.associationValue());
            }
            if (Double.isFinite(f.importanceValue())) {
                yHigh = Math.max(yHigh, f.importanceValue());
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
        List<AuditView.FindingRow> byImportance = new ArrayList<>(findings);
        byImportance.sort(Comparator.comparingDouble(AuditView.FindingRow::importanceValue).reversed());
        List<AuditView.FindingRow> labelled = byImportance.subList(0, Math.min(LABELLED_LIMIT, byImportance.size()));
        List<AuditView.Point> points = new ArrayList<>();
        for (AuditView.FindingRow f : findings) {
            double fx = Double.isFinite(f.associationValue()) ? f.associationValue() : 0;
            double fy = Double.isFinite(f.importanceValue()) ? f.importanceValue() : 0;
            String tip = f.term() + " (" + f.kind() + ", " + f.severity() + ", " + f.label() + "): importance "
                    + f.importance() + ", association " + f.association();
            points.add(new AuditView.Point(f.anchor(), Numbers.coord(x.map(fx, LEFT, RIGHT)),
                    Numbers.coord(y.map(fy, BOTTOM, TOP)), AuditViews.shape(f.kind()), f.severity(), f.suppressed(),
                    f.term(), tip, labelled.contains(f)));
        }
        String threshold = Double.isFinite(zThreshold) ? Numbers.coord(x.map(zThreshold, LEFT, RIGHT)) : null;
        return new AuditView.Scatter(WIDTH, HEIGHT, Numbers.coord(LEFT), Numbers.coord(RIGHT), Numbers.coord(TOP),
                Numbers.coord(BOTTOM), xTicks, yTicks, threshold,
                Double.isFinite(zThreshold) ? "z threshold " + Numbers.plain(zThreshold, 2) : "", points);
    }

    private static final int LABELLED_LIMIT = 12;

    private static String label(double value, double step) {
        int decimals = step >= 1 ? 0 : (int) Math.ceil(-Math.log10(step));
        return Numbers.plain(value, decimals);
    }
}
