package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;

/**
 * Structural checks every report must pass, whatever its kind: the explanations report
 * ({@code DocumentReportStructureTest}), the audit report ({@code AuditReportStructureTest}) and
 * the overlap report ({@code OverlapReportTest}) each run all three on a page holding hostile text.
 */
final class ReportChecks {
    /** All three checks. */
    static void safe(Document page) throws Exception {
        strictPolicy(page);
        selfContained(page);
        noEventHandlers(page);
    }

    private ReportChecks() {
    }

    /** The CSP allows exactly the one inline style and script, by hash (CSP Level 3, hash-source). */
    static void strictPolicy(Document page) throws Exception {
        Element meta = page.selectFirst("head > meta[http-equiv=Content-Security-Policy]");
        assertNotNull(meta, "CSP meta element");
        String csp = meta.attr("content");
        assertTrue(csp.startsWith("default-src 'none';"), csp);
        assertFalse(csp.contains("unsafe-inline"), csp);
        assertFalse(csp.contains("unsafe-eval"), csp);
        assertFalse(csp.contains("*"), csp);
        assertEquals(1, page.select("script").size(), "only the report's own script");
        assertEquals(1, page.select("style").size());
        assertTrue(csp.contains("script-src 'sha256-" + sha256(page.selectFirst("script").data()) + "'"), csp);
        assertTrue(csp.contains("style-src 'sha256-" + sha256(page.selectFirst("style").data()) + "'"), csp);
        assertTrue(page.select("[style]").isEmpty(), "style attributes would be refused by the policy");
    }

    /** Nothing is fetched: every src/href-like attribute is empty or a fragment of this page. */
    static void selfContained(Document page) {
        for (Element el : page.select("[src], [href], [xlink:href], [srcset], [action], [poster], [data], [formaction]")) {
            for (String attr : List.of("src", "href", "xlink:href", "srcset", "action", "poster", "data", "formaction")) {
                String value = el.attr(attr);
                // One outcome, two spellings: no attribute value, or a fragment of this page.
                assertTrue(value.isEmpty() || value.startsWith("#"), "<" + el.tagName() + " " + attr + "=" + value + ">");
            }
        }
        assertTrue(page.select("link, img, iframe, object, embed, base, form").isEmpty());
        String css = page.selectFirst("style").data();
        assertFalse(css.contains("@import"), "stylesheet imports nothing");
        assertFalse(css.contains("url("), "stylesheet fetches nothing");
    }

    /** No element carries an event-handler attribute: document text never became markup. */
    static void noEventHandlers(Document page) {
        for (Element el : page.getAllElements()) {
            el.attributes().forEach(a -> assertFalse(a.getKey().toLowerCase(Locale.ROOT).startsWith("on"),
                    "event handler attribute " + a + " on <" + el.tagName() + ">"));
        }
    }

    static String sha256(String text) throws Exception {
        return Base64.getEncoder().encodeToString(
                MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8)));
    }
}
