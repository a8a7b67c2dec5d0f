package org.telltale.report.html;

import java.util.Map;
import org.telltale.overlap.OverlapResult;

/**
 * The overlap report: pairs of duplicate documents side by side with their shared passages
 * marked. Same frame, escaping and Content-Security-Policy as the other reports; the overlap
 * stylesheet is appended to the shared one and the policy allows the combined sheet by its hash.
 *
 * <p>Thread-safe.
 */
public final class OverlapReport {
    private static final String STYLE = InlineAssets.style() + stylesheet();
    private static final String CSP = InlineAssets.csp().replace(InlineAssets.hash(InlineAssets.style()), InlineAssets.hash(STYLE));

    private OverlapReport() {
    }

    private static String stylesheet() {
        try (java.io.InputStream in = OverlapReport.class.getResourceAsStream("overlap.css")) {
            if (in == null) {
                throw new IllegalStateException("report asset missing from the jar: overlap.css");
            }
            return new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException("cannot read report asset overlap.css", e);
        }
    }

    /** The HTML of {@code result}; texts are shown where the result carries them. */
    public static String render(OverlapResult result) {
        String title = "Telltale overlap of " + VisibleText.inline(result.trainName()) + " and " + VisibleText.inline(result.testName());
        String subtitle = "train " + VisibleText.inline(result.trainName()) + " · test " + VisibleText.inline(result.testName());
        Page base = HtmlReports.page("Overlap", title, subtitle);
        Page page = new Page(base.kind(), base.title(), base.subtitle(), base.version(), CSP, STYLE, base.script());
        return HtmlReports.render("overlap.jte", Map.of("page", page, "view", OverlapView.of(result)));
    }
}
