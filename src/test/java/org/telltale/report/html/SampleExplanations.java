package org.telltale.report.html;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.telltale.explain.Explanation;
import org.telltale.text.Span;

/**
 * Explanations built by hand for report tests, in an invented scenario: the support queue of
 * Harbourline Utilities, a fictional water and power company, routed to billing, outage or account.
 * Spans are found in the text itself, so they always point at the words they name.
 */
final class SampleExplanations {
    static final String BILLING_TEXT = """
            From: m.okafor@example.net
            Subject: Double charge on my March invoice
            Queue: BIL-7

            Hello, I was charged twice for invoice 48213 this month. The payment left my account on the 3rd \
            and again on the 5th, so my bank shows two charges of 61.40. Please refund the duplicate charge \
            and confirm by email. There was no outage at my address, the meter reading is fine.

            Thanks,
            Mina Okafor
            --
            Sent from the Harbourline customer portal
            """;

    private SampleExplanations() {
    }

    static Explanation billing() {
        return explanation("HL-20931", BILLING_TEXT, "billing", "billing",
                scores(0.871, 0.064, 0.065), 2000, 0.83,
                List.of(term(BILLING_TEXT, "invoice", 0.214, 0.171, 0.259),
                        term(BILLING_TEXT, "charge", 0.162, 0.118, 0.205),
                        term(BILLING_TEXT, "bil", 0.141, 0.090, 0.190),
                        term(BILLING_TEXT, "refund", 0.097, 0.051, 0.142),
                        term(BILLING_TEXT, "outage", -0.083, -0.125, -0.040),
                        term(BILLING_TEXT, "meter", -0.041, -0.079, -0.004),
                        term(BILLING_TEXT, "payment", 0.030, -0.006, 0.068),
                        term(BILLING_TEXT, "account", -0.012, -0.049, 0.024)),
                "billing");
    }

    static Explanation outage() {
        String text = "Power has been out on Quay Street since 6am. Outage ticket please, the whole block is dark "
                + "and the substation hums. Account 7781 if needed.";
        return explanation("HL-20944", text, "outage", "outage", scores(0.102, 0.803, 0.095), 1500, 0.77,
                List.of(term(text, "power", 0.188, 0.140, 0.231),
                        term(text, "outage", 0.176, 0.120, 0.228),
                        term(text, "dark", 0.069, 0.021, 0.118),
                        term(text, "account", -0.054, -0.097, -0.012)),
                "account");
    }

    static Map<String, Double> scores(double billing, double outage, double account) {
        Map<String, Double> scores = new LinkedHashMap<>();
        scores.put("billing", billing);
        scores.put("outage", outage);
        scores.put("account", account);
        return scores;
    }

    static Explanation explanation(String id, String text, String label, String predicted, Map<String, Double> scores,
            int probes, double r2, List<Explanation.TermWeight> terms, String gold) {
        return new Explanation(id, label, scores.getOrDefault(label, 0.5), predicted, scores, probes,
                new Explanation.Fit(0.12, r2, scores.getOrDefault(label, 0.5) - 0.02), terms,
                new Explanation.Timing(310, 420), text, gold);
    }

    static Explanation.TermWeight term(String text, String word, double weight, double low, double high) {
        return new Explanation.TermWeight(word, weight, low, high, spansOf(text, word));
    }

    /** Every case-insensitive occurrence of {@code word} that starts a word in {@code text}. */
    static List<Span> spansOf(String text, String word) {
        List<Span> spans = new ArrayList<>();
        String lower = text.toLowerCase(Locale.ROOT);
        String w = word.toLowerCase(Locale.ROOT);
        for (int at = lower.indexOf(w); at >= 0; at = lower.indexOf(w, at + 1)) {
            boolean starts = at == 0 || !Character.isLetterOrDigit(lower.charAt(at - 1));
            int end = at + w.length();
            while (end < lower.length() && Character.isLetter(lower.charAt(end))) {
                end++;
            }
            if (starts) {
                spans.add(new Span(at, end));
            }
        }
        if (spans.isEmpty()) {
            throw new IllegalArgumentException("'" + word + "' does not occur in the sample text");
        }
        return spans;
    }
}
