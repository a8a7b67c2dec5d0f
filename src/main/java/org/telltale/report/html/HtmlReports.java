package org.telltale.report.html;

import gg.jte.ContentType;
import gg.jte.TemplateEngine;
import gg.jte.TemplateOutput;
import gg.jte.output.StringOutput;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import org.telltale.TelltaleException;
import org.telltale.audit.AuditResult;
import org.telltale.audit.Baseline;
import org.telltale.explain.Explanation;

/**
 * Renders Telltale's self-contained HTML reports from result values: one file, inline CSS and
 * SVG, one small script allowed by its hash, no network. Templates are precompiled jte templates
 * with HTML content type, so every value is escaped for the context it lands in.
 *
 * <p>Thread-safe: the engine and assets are immutable.
 */
public final class HtmlReports {
    private static final TemplateEngine ENGINE = TemplateEngine.createPrecompiled(
            null, ContentType.Html, null, "org.telltale.report.html.templates");

    /** Up to this many explanations are shown one after another; more go into the document browser. */
    public static final int INLINE_DOCUMENTS = 25;

    private HtmlReports() {
    }

    /** The document report of one or more explanations, each shown as a highlighted document view. */
    public static String explanations(List<Explanation> explanations) {
        List<DocumentView> views = AuditViews.documentViews(explanations);
        List<AuditView.IndexRow> index = explanations.size() <= INLINE_DOCUMENTS
                ? List.of() : AuditViews.index(explanations, views, java.util.Set.of());
        String title = explanations.size() == 1
                ? "Telltale explanation of " + VisibleText.inline(explanations.get(0).id())
                : "Telltale explanations of " + explanations.size() + " documents";
        String subtitle = explanations.size() == 1 ? "1 document" : explanations.size() + " documents";
        return render("explanations.jte", Map.of("page", page("Explanations", title, subtitle), "documents", views, "index", index));
    }

    /**
     * The audit report: summary and scrub chart, the findings table and chart, each finding's
     * evidence in context, the reviewer picks as document views, and every explained document
     * (built on demand in the page so that thousands of them still open quickly).
     *
     * @param explanations the explanations of the audit ({@code explanations.jsonl}); the picks and
     *                     the evidence are looked up here by document id
     */
    public static String audit(AuditResult audit, List<Explanation> explanations) {
        return audit(audit, explanations, null);
    }

    /** The audit report with a "Since the baseline" section for {@code since} ({@code null}: none). */
    public static String audit(AuditResult audit, List<Explanation> explanations, Baseline.Comparison since) {
        AuditView view = AuditViews.of(audit, explanations);
        String subtitle = audit.summary().documents() + " documents · " + audit.summary().explained() + " explained";
        Map<String, Object> params = new java.util.HashMap<>();
        params.put("page", page("Audit", "Telltale audit", subtitle));
        params.put("a", view);
        params.put("since", BaselineView.of(since));
        return render("audit.jte", params);
    }

    /**
     * Writes a rendered report as UTF-8. An existing file is replaced only with {@code force}; the
     * file appears whole or not at all (written beside it, then moved).
     */
    public static void write(String html, Path out, boolean force) {
        refuseToReplace(out, force);
        try {
            Path parent = out.toAbsolutePath().getParent();
            Files.createDirectories(parent);
            Path temp = Files.createTempFile(parent, ".telltale-report", ".tmp");
            try {
                Files.writeString(temp, html, StandardCharsets.UTF_8);
                Files.move(temp, out, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } finally {
                Files.deleteIfExists(temp);
            }
        } catch (IOException e) {
            throw new TelltaleException(out + ": cannot write report: " + e.getMessage(), e);
        }
    }

    /**
     * Fails early, before any work, when {@code out} exists and may not be replaced; {@link #write}
     * checks again.
     */
    public static void refuseToReplace(Path out, boolean force) {
        if (Files.exists(out) && !force) {
            throw new TelltaleException(out + ": file exists; pass {force} to replace it");
        }
    }

    static Page page(String kind, String title, String subtitle) {
        return new Page(kind, title, subtitle, version(), InlineAssets.csp(), InlineAssets.style(), InlineAssets.script());
    }

    static String render(String template, Map<String, Object> params) {
        TemplateOutput out = new StringOutput(1 << 16);
        ENGINE.render(template, params, out);
        return out.toString();
    }

    private static String version() {
        try (InputStream in = HtmlReports.class.getResourceAsStream("/org/telltale/version.properties")) {
            if (in == null) {
                return "unknown";
            }
            Properties p = new Properties();
            p.load(in);
            return p.getProperty("version", "unknown");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
