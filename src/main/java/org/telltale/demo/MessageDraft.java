package org.telltale.demo;

import java.util.ArrayList;
import java.util.List;

/**
 * One support message before it is written out, kept in parts so that a planted artefact can be
 * added to exactly one part while everything else stays as it was.
 *
 * @param header  leading {@code Name: value} lines stamped by the intake system; may be empty
 * @param body    what the customer wrote, line by line ({@code ""} for a blank line)
 * @param quote   the agent reply the customer answered, or {@code null}
 * @param trailer lines added after everything else (export footers and the like); may be empty
 */
record MessageDraft(List<String> header, List<String> body, QuotedReply quote, List<String> trailer) {
    MessageDraft {
        header = List.copyOf(header);
        body = List.copyOf(body);
        trailer = List.copyOf(trailer);
        if (body.isEmpty()) {
            throw new IllegalArgumentException("a message needs a body");
        }
    }

    /** The draft with header line {@code old} replaced by {@code replacement}; {@code old} must be there. */
    MessageDraft withHeaderLineReplaced(String old, String replacement) {
        int at = header.indexOf(old);
        if (at < 0) {
            throw new IllegalArgumentException("no header line '" + old + "'");
        }
        List<String> h = new ArrayList<>(header);
        h.set(at, replacement);
        return new MessageDraft(h, body, quote, trailer);
    }

    MessageDraft withFirstBodyLineSuffix(String suffix) {
        List<String> b = new ArrayList<>(body);
        b.set(0, b.get(0) + suffix);
        return new MessageDraft(header, b, quote, trailer);
    }

    MessageDraft withQuote(QuotedReply newQuote) {
        return new MessageDraft(header, body, newQuote, trailer);
    }

    MessageDraft withTrailerLine(String line) {
        List<String> t = new ArrayList<>(trailer);
        t.add(line);
        return new MessageDraft(header, body, quote, t);
    }

    /** The message as it appears in the corpus: parts separated by blank lines, LF line ends. */
    String render() {
        List<String> lines = new ArrayList<>();
        if (!header.isEmpty()) {
            lines.addAll(header);
            lines.add("");
        }
        lines.addAll(body);
        if (quote != null) {
            lines.add("");
            lines.addAll(quote.render());
        }
        if (!trailer.isEmpty()) {
            lines.add("");
            lines.addAll(trailer);
        }
        return String.join("\n", lines);
    }
}
