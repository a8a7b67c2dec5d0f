package org.telltale.report.terminal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.telltale.explain.Explanation;
import org.telltale.text.Span;

class TerminalViewsTest {
    private static final String TEXT = "Refund\u001b]0;owned\u0007 the late parcel, \u202etxet\u202c late again";

    private static Explanation sample() {
        int late1 = TEXT.indexOf("late");
        int late2 = TEXT.lastIndexOf("late");
        return new Explanation("T\u001b[31m-9", "billing", 0.7, "billing", Map.of("billing", 0.7, "shipping", 0.3), 500,
                new Explanation.Fit(0.2, 0.91, 0.69), List.of(
                        new Explanation.TermWeight("refund", 0.31, 0.25, 0.37, List.of(new Span(0, 6))),
                        new Explanation.TermWeight("late", -0.12, -0.2, -0.05,
                                List.of(new Span(late1, late1 + 4), new Span(late2, late2 + 4)))),
                new Explanation.Timing(5, 9), TEXT, null);
    }

    @Test
    void plainViewsCarryNoEscapeSequencesAndMarkEverySpanWithItsSign() {
        String table = ExplanationTable.render(sample(), false);
        String marked = MarkedLine.render(sample(), false);
        assertFalse(table.contains("\u001b"), "document text must not reach the terminal raw in the table");
        assertFalse(marked.contains("\u001b"), "document text must not reach the terminal raw in the marked text");
        assertTrue(marked.startsWith("[Refund]+\\u001b]0;owned\\u0007 the [late]- parcel"), marked);
        assertEquals(2, marked.split("\\[late\\]-", -1).length - 1);
        assertTrue(marked.contains("\\u202etxet\\u202c"), "bidi overrides are shown, not obeyed");
        assertTrue(table.contains("refund") && table.contains("+0.3100") && table.contains("[-0.2000, -0.0500]"), table);
        assertTrue(table.contains("not a cause"), table);
    }

    @Test
    void colourViewsUseAnsiOnlyWhenAsked() {
        String marked = MarkedLine.render(sample(), true);
        assertTrue(marked.contains("\u001b[1;38;5;29mRefund+\u001b[0m"), marked);
        assertTrue(marked.contains("\u001b[1;38;5;97mlate-\u001b[0m"), marked);
        assertFalse(marked.contains("\u001b]0;"), "the document's own escape stays escaped");
    }

    @Test
    void longTextsAreCutWithANote() {
        String text = "word ".repeat(2000);
        Explanation e = new Explanation("x", "a", 1, "a", Map.of("a", 1.0), 1, new Explanation.Fit(1, 1, 1),
                List.of(new Explanation.TermWeight("word", 0.1, 0.1, 0.1, List.of(new Span(0, 4), new Span(9995, 9999)))),
                new Explanation.Timing(0, 0), text, null);
        String marked = MarkedLine.render(e, false);
        assertTrue(marked.contains("more characters not shown"));
        assertTrue(marked.length() < MarkedLine.MAX_CHARS + 100);
    }

    private static Explanation withWeights(double... weights) {
        List<Explanation.TermWeight> terms = new java.util.ArrayList<>();
        for (int i = 0; i < weights.length; i++) {
            // A bootstrap interval from an older file may exclude its estimate: [w + 1e-5, w + 2e-5].
            terms.add(new Explanation.TermWeight("t" + i, weights[i], weights[i] + 1e-5, weights[i] + 2e-5,
                    List.of(new Span(0, 1))));
        }
        return new Explanation("x", "spam", 1.0, "spam", Map.of("spam", 1.0), 2000, new Explanation.Fit(1, 0, 1), terms,
                new Explanation.Timing(0, 0), "x", null);
    }

    @Test
    void weightsThatAreAllNearZeroShowNoMeasurableEffectInsteadOfFullBars() {
        // Common practice for charts: bars on a fixed scale, so nothing is drawn for nothing.
        String table = ExplanationTable.render(withWeights(0.0, 3e-9, -1e-9), false);
        assertTrue(table.contains("no measurable effect"), table);
        assertFalse(table.contains("++"), table);
        assertFalse(table.contains("--"), table);
        assertTrue(table.contains("+3.00e-09"), "enough digits to tell a weight from zero: " + table);
        assertFalse(table.contains("-0.0000"), table);
    }

    @Test
    void barsAreAFixedShareOfTheScoreRangeAndIntervalsHoldTheirEstimate() {
        String table = ExplanationTable.render(withWeights(0.25, 0.02), false);
        // A full bar of 12 is 0.5 in probability: 0.25 gets 6, 0.02 rounds to none and shows a dot.
        assertTrue(table.lines().anyMatch(l -> l.contains(" t0 ") && l.endsWith(" ++++++")), table);
        assertTrue(table.lines().anyMatch(l -> l.contains(" t1 ") && l.endsWith(" .")), table);
        assertTrue(table.contains("[+0.2500, +0.2500]"), "the interval is widened to hold its estimate: " + table);
    }
}
