package org.telltale.text;

import java.util.List;

/**
 * One explanation feature of one document: the term (or line) it stands for and every span of
 * the original text that masking it removes.
 *
 * @param term  the analyzed term for {@code word} and {@code occurrence} units; the line's text,
 *              trimmed, for {@code line} units
 * @param spans sorted, non-overlapping spans in the original text
 */
public record Unit(String term, List<Span> spans) {
    public Unit {
        spans = List.copyOf(spans);
    }
}
