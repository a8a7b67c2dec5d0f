package org.telltale.demo;

import java.util.ArrayList;
import java.util.List;

/**
 * An agent's earlier reply, quoted back under a customer's message the way mail clients do it:
 * an attribution line, then every line prefixed with {@code "> "}.
 *
 * @param attribution the "On ... wrote:" line
 * @param lines       the agent's text, already wrapped
 * @param closing     the agent's sign-off, e.g. "Kind regards,"
 * @param signature   the agent's signature line
 * @param nested      an earlier customer message quoted inside the reply ({@code ">> "}), may be empty
 */
record QuotedReply(String attribution, List<String> lines, String closing, String signature, List<String> nested) {
    QuotedReply {
        lines = List.copyOf(lines);
        nested = List.copyOf(nested);
    }

    QuotedReply withSignature(String newSignature) {
        return new QuotedReply(attribution, lines, closing, newSignature, nested);
    }

    List<String> render() {
        List<String> out = new ArrayList<>();
        out.add(attribution);
        for (String line : lines) {
            out.add(line.isEmpty() ? ">" : "> " + line);
        }
        out.add(">");
        out.add("> " + closing);
        out.add("> " + signature);
        if (!nested.isEmpty()) {
            out.add(">");
            for (String line : nested) {
                out.add(line.isEmpty() ? ">>" : ">> " + line);
            }
        }
        return out;
    }
}
