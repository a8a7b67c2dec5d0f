package org.telltale.report.html;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.telltale.TelltaleException;
import org.telltale.audit.AuditResult;
import org.telltale.audit.Baseline;
import org.telltale.explain.Explanation;
import org.telltale.report.json.AuditJson;
import org.telltale.report.json.BaselineJson;
import org.telltale.report.json.ExplanationsJson;

/**
 * Re-renders a report from the JSON a run left behind: {@code audit.json} (with the
 * {@code explanations.jsonl} beside it for the document views), a {@code telltale.explanations}
 * document ({@code explain --json}), or one explanation per line. The kind is read from the
 * {@code format} field of the first JSON object; a line file carries none and is explanations.
 */
public final class ReportSources {
    /** The file an audit writes beside {@code audit.json}, one explanation per line. */
    public static final String AUDIT_EXPLANATIONS = "explanations.jsonl";
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private ReportSources() {
    }

    /** What was rendered: the page, its kind, and a note for the user (or {@code null}). */
    public record Rendered(String html, String kind, String note) {
    }

    public static Rendered render(Path from) {
        return render(from, null);
    }

    /**
     * As {@link #render(Path)}; an audit is shown against {@code since} when given, else against
     * the comparison its audit.json carries (an audit run with {@code --baseline}), if any.
     */
    public static Rendered render(Path from, Baseline.Comparison since) {
        if (!Files.isRegularFile(from)) {
            throw new TelltaleException(from + ": no such file");
        }
        String format = formatOf(from);
        if (AuditJson.FORMAT.equals(format)) {
            AuditResult audit = readAudit(from);
            Baseline.Comparison shown = since != null ? since : BaselineJson.section(from).orElse(null);
            Path sibling = from.resolveSibling(AUDIT_EXPLANATIONS);
            if (!Files.isRegularFile(sibling)) {
                return new Rendered(HtmlReports.audit(audit, List.of(), shown), "audit",
                        "no " + AUDIT_EXPLANATIONS + " beside " + from + ": the report has no document views or contexts");
            }
            return new Rendered(HtmlReports.audit(audit, ExplanationsJson.read(sibling), shown), "audit", null);
        }
        if (format == null || ExplanationsJson.FORMAT.equals(format)) {
            List<Explanation> explanations = ExplanationsJson.read(from);
            if (explanations.isEmpty()) {
                throw new TelltaleException(from + ": holds no explanation to render");
            }
            return new Rendered(HtmlReports.explanations(explanations), "explanations", null);
        }
        throw new TelltaleException(from + ": format '" + format + "' is neither " + AuditJson.FORMAT + " nor "
                + ExplanationsJson.FORMAT);
    }

    /** Reads {@code audit.json}; a clear error when {@code from} is another kind of file. */
    public static AuditResult readAudit(Path from) {
        if (!Files.isRegularFile(from)) {
            throw new TelltaleException(from + ": no such file");
        }
        String format = formatOf(from);
        if (!AuditJson.FORMAT.equals(format)) {
            throw new TelltaleException(from + ": format '" + format + "' is not " + AuditJson.FORMAT
                    + "; SARIF and comparisons are written from an audit's audit.json");
        }
        return AuditJson.read(from);
    }

    /** The top-level {@code format} of the first JSON value in the file, or {@code null} if it has none. */
    static String formatOf(Path file) {
        try (InputStream in = Files.newInputStream(file); JsonParser p = MAPPER.getFactory().createParser(in)) {
            if (p.nextToken() != JsonToken.START_OBJECT) {
                throw new TelltaleException(file + ": expected a JSON object at line 1");
            }
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String name = p.currentName();
                JsonToken value = p.nextToken();
                if ("format".equals(name)) {
                    return value == JsonToken.VALUE_STRING ? p.getText() : null;
                }
                p.skipChildren();
            }
            return null;
        } catch (IOException e) {
            throw new TelltaleException(file + ": not valid JSON: " + e.getMessage(), e);
        }
    }
}
