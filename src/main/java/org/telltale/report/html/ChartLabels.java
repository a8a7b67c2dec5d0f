package org.telltale.report.html;

import java.util.ArrayList;
import java.util.List;

/**
 * Places text labels beside chart points so that no label overlaps another label or a marker, and
 * none leaves the plot. Points are taken in the order given (most important first); each tries four
 * spots around its point — upper right, lower right, upper left, lower left — and keeps the first
 * that collides with no marker and no label placed before it. A point with no free spot stays unlabelled; its tooltip still names it.
 * Greedy placement in priority order is common practice for scatter labels; it cannot miss a free
 * spot among the four it tries, but it does not move earlier labels to make room.
 */
final class ChartLabels {
    /** The advance of one character of the 12 px monospace label font (DejaVu Sans Mono: 0.602 em). */
    static final double CHAR_WIDTH = 7.3;
    static final double LINE_HEIGHT = 13;
    /** Half the side of the square a marker covers (the largest marker, the square, is 11 px wide). */
    static final double MARKER_HALF = 7;
    private static final double GAP = 9;

    /** A label to place: its point and its text. */
    record Request(double x, double y, String text) {
    }

    /**
     * A placed label: text drawn from (x + dx, y + dy) with the given text-anchor, or
     * {@link #NONE} when no spot was free.
     */
    record Placement(double dx, double dy, String anchor) {
        static final Placement NONE = new Placement(0, 0, "");

        boolean placed() {
            return !anchor.isEmpty();
        }
    }

    private record Box(double left, double top, double right, double bottom) {
        boolean overlaps(Box o) {
            return left < o.right && o.left < right && top < o.bottom && o.top < bottom;
        }

        boolean inside(double minX, double minY, double maxX, double maxY) {
            return left >= minX && right <= maxX && top >= minY && bottom <= maxY;
        }
    }

    private final double minX;
    private final double minY;
    private final double maxX;
    private final double maxY;

    ChartLabels(double minX, double minY, double maxX, double maxY) {
        this.minX = minX;
        this.minY = minY;
        this.maxX = maxX;
        this.maxY = maxY;
    }

    /** One placement per request, in the same order; {@code markers} are the {x, y} of every marker drawn. */
    List<Placement> place(List<Request> requests, List<double[]> markers) {
        List<Box> taken = new ArrayList<>();
        for (double[] m : markers) {
            taken.add(new Box(m[0] - MARKER_HALF, m[1] - MARKER_HALF, m[0] + MARKER_HALF, m[1] + MARKER_HALF));
        }
        List<Placement> out = new ArrayList<>();
        for (Request r : requests) {
            Placement chosen = Placement.NONE;
            for (Placement candidate : candidates()) {
                Box box = box(r, candidate);
                if (box.inside(minX, minY, maxX, maxY) && taken.stream().noneMatch(box::overlaps)) {
                    chosen = candidate;
                    taken.add(box);
                    break;
                }
            }
            out.add(chosen);
        }
        return out;
    }

    private static List<Placement> candidates() {
        return List.of(new Placement(GAP, -7, "start"), new Placement(GAP, 15, "start"),
                new Placement(-GAP, -7, "end"), new Placement(-GAP, 15, "end"));
    }

    /** The box the text covers: the baseline sits at y + dy, the text rises about 10 px above it. */
    private static Box box(Request r, Placement p) {
        double width = r.text().length() * CHAR_WIDTH;
        double baseline = r.y() + p.dy();
        double left = p.anchor().equals("start") ? r.x() + p.dx() : r.x() + p.dx() - width;
        return new Box(left, baseline - 10, left + width, baseline - 10 + LINE_HEIGHT);
    }

    /** The text's box as {left, top, right, bottom}, for checks. */
    static double[] bounds(Request r, Placement p) {
        Box b = box(r, p);
        return new double[] {b.left(), b.top(), b.right(), b.bottom()};
    }
}
