package org.telltale.report.html;

import java.util.List;

/**
 * Everything the audit template shows, formatted: summary tiles, the scrub chart, the artefacts
 * with their evidence, the chart of importance against association (every tested term; those of
 * artefacts linked to them), the picks and the browsable documents.
 */
public record AuditView(
        List<Tile> tiles,
        String model,
        String corpus,
        String verdict,
        ScrubChart scrub,
        List<FindingRow> findings,
        List<String> kinds,
        Scatter scatter,
        List<DocumentView> picks,
        List<String> missingPicks,
        List<IndexRow> index,
        List<DocumentView> documents,
        int pageSize) {

    /** One number of the summary, with a short caption. */
    public record Tile(String caption, String value, String note) {
    }

    /**
     * One artefact: table cells (display text and sort key) and the evidence section it links to.
     */
    public record FindingRow(
            int index,
            String anchor,
            String pattern,
            String terms,
            String kind,
            String severity,
            int severityRank,
            String label,
            long support,
            String importance,
            double importanceValue,
            String association,
            double associationValue,
            boolean confirmed,
            boolean suppressed,
            String policyNote,
            List<Fact> facts,
            List<Context> contexts,
            int moreContexts) {
    }

    /** A labelled fact about an artefact. */
    public record Fact(String name, String value) {
    }

    /**
     * A window of an explained document around an artefact, every term of it marked; links to the
     * document view when that document is in the report.
     */
    public record Context(String docId, String docAnchor, boolean lead, boolean trail,
            List<MarkedText.Segment> segments) {
    }

    /** The scrub test as paired before/after bars; geometry in SVG user units. */
    public record ScrubChart(String measure, int width, int height, List<ScrubRow> rows, List<Tick> ticks,
            String plotLeft, String plotRight) {
    }

    public record ScrubRow(String kind, String mode, String y, String yAfter, String barHeight,
            String beforeWidth, String afterWidth, String before, String after, String flipRate, String scoreDrop,
            int documents, int flips, String artefacts) {
    }

    public record Tick(String at, String label) {
    }

    /**
     * Tested terms placed by association (x) and importance (y); the z threshold as a rule. The
     * terms of artefacts are points linked to their evidence; the rest a grey cloud.
     */
    public record Scatter(int width, int height, String left, String right, String top, String bottom,
            List<Tick> xTicks, List<Tick> yTicks, String threshold, String thresholdLabel, List<Point> points,
            List<CloudPoint> cloud) {
    }

    /** An unflagged term of the cloud. */
    public record CloudPoint(String x, String y) {
    }

    public record Point(String anchor, String x, String y, String shape, String severity, boolean suppressed,
            String term, String tooltip, PointLabel label) {
    }

    /** The text beside a point, drawn at (x + dx, y + dy) with the given SVG text-anchor. */
    public record PointLabel(String text, String dx, String dy, String anchor) {
    }

    /** One line of the document index. */
    public record IndexRow(int index, String anchor, String id, String predicted, String gold, String topTerm,
            boolean hiddenAtFirst, boolean pick) {
    }
}
