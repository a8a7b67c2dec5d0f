package org.telltale.report.html;

import java.util.List;
import org.telltale.explain.Explanation;

/**
 * Document texts written to break out of a report: every payload would, if it ran, set
 * {@code window.telltalePwned} or change the document title. Ids, labels and terms carry payloads
 * too, since they come from the same untrusted corpus.
 */
final class HostileTexts {
    static final String TITLE_PAYLOAD = "<script>document.title='owned';window.telltalePwned=1</script>";
    static final String IMG_PAYLOAD = "\"><img src=x onerror=\"window.telltalePwned=2;document.title='owned'\">";
    static final String LINK_PAYLOAD = "<a href=\"javascript:window.telltalePwned=3\">open invoice</a>";
    static final String TEXTAREA_PAYLOAD = "</textarea></style></template><svg onload=\"window.telltalePwned=4\">";
    static final String BIDI_PAYLOAD = "refund \u202Efdp.exe\u202C now \u2066isolated\u2069 \u200Bhidden";
    static final String HOSTILE_ID = "id\"><script>window.telltalePwned=5</script>";
    static final String HOSTILE_LABEL = "bill'\"<b onmouseover=\"window.telltalePwned=6\">";
    static final int LONG_LINE = 200_000;

    private HostileTexts() {
    }

    static String text() {
        StringBuilder text = new StringBuilder();
        text.append("Subject: invoice ").append(TITLE_PAYLOAD).append('\n');
        text.append("Reply to ").append(IMG_PAYLOAD).append('\n');
        text.append("Link: ").append(LINK_PAYLOAD).append('\n');
        text.append("Notes ").append(TEXTAREA_PAYLOAD).append('\n');
        text.append(BIDI_PAYLOAD).append('\n');
        text.append("invoice");
        for (int i = 0; text.length() < 1_000 + LONG_LINE; i++) {
            text.append(i % 7 == 0 ? " " : "x");
        }
        text.append("\nend of invoice\n");
        return text.toString();
    }

    static Explanation explanation() {
        String text = text();
        return SampleExplanations.explanation(HOSTILE_ID, text, HOSTILE_LABEL, HOSTILE_LABEL,
                java.util.Map.of(HOSTILE_LABEL, 0.91, "outage", 0.09), 1000, 0.64,
                List.of(SampleExplanations.term(text, "invoice", 0.31, 0.2, 0.4),
                        SampleExplanations.term(text, "script", 0.12, 0.05, 0.19),
                        SampleExplanations.term(text, "onerror", 0.08, 0.01, 0.15),
                        SampleExplanations.term(text, "javascript", -0.07, -0.12, -0.02),
                        SampleExplanations.term(text, "fdp", 0.05, 0.0, 0.1),
                        new Explanation.TermWeight("<img src=x onerror=alert(1)>", -0.02, -0.05, 0.01,
                                SampleExplanations.spansOf(text, "textarea"))),
                HOSTILE_LABEL);
    }
}
