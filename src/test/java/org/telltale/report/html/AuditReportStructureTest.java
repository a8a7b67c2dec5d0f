package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.telltale.audit.ArtefactKind;
import org.telltale.audit.AuditResult;
import org.telltale.audit.Severity;
import org.telltale.explain.Explanation;

/** Structure of the audit report, parsed with jsoup. */
class AuditReportStructureTest {
    private static final SampleAudit.Audit AUDIT = SampleAudit.of(60, 7);
    private static final Document PAGE = Jsoup.parse(HtmlReports.audit(AUDIT.result(), AUDIT.explanations()));

    private static int spans(Explanation e) {
        return e.terms().stream().mapToInt(t -> t.spans().size()).sum();
    }

    @Test
    void passesTheCommonChecks() throws Exception {
        ReportChecks.strictPolicy(PAGE);
        ReportChecks.selfContained(PAGE);
        ReportChecks.noEventHandlers(PAGE);
        Element cautions = PAGE.selectFirst(".tt-cautions");
        assertTrue(cautions.text().contains("does not certify a model as correct or fair"));
        assertTrue(cautions.siblingIndex() < PAGE.selectFirst("main").siblingIndex(), "cautions before the content");
    }

    @Test
    void picksAreDocumentViewsWithEveryMark() {
        Map<String, Explanation> byId = AUDIT.explanations().stream()
                .collect(Collectors.toMap(Explanation::id, Function.identity()));
        List<Element> views = PAGE.select("#picks article.tt-doc");
        assertEquals(AUDIT.result().picks().size(), views.size());
        for (int i = 0; i < views.size(); i++) {
            Explanation e = byId.get(AUDIT.result().picks().get(i));
            assertEquals(e.id(), views.get(i).selectFirst(".tt-docid").text());
            assertEquals(spans(e), views.get(i).select("mark.tt-m").size(), e.id());
        }
    }

    @Test
    void everyExplainedDocumentWaitsInATemplateWithEveryMark() {
        List<Element> templates = PAGE.select("#documents template");
        assertEquals(AUDIT.explanations().size(), templates.size());
        for (int i = 0; i < templates.size(); i++) {
            Explanation e = AUDIT.explanations().get(i);
            Element t = templates.get(i);
            assertEquals("tpl-doc-" + i, t.id());
            assertEquals(spans(e), t.select("mark.tt-m").size(), e.id());
        }
        List<Element> rows = PAGE.select("#tt-index tbody tr");
        assertEquals(AUDIT.explanations().size(), rows.size());
        long hidden = rows.stream().filter(r -> r.hasAttr("hidden")).count();
        assertEquals(AUDIT.explanations().size() - AuditViews.PAGE_SIZE, hidden, "only the first page shows at first");
    }

    @Test
    void findingsTableHasTheContractColumnsAndLinksToEvidence() {
        List<String> heads = PAGE.select("#tt-findings thead th").eachText().stream()
                .map(h -> h.toLowerCase(Locale.ROOT)).toList();
        assertEquals(List.of("artefact", "kind", "severity", "label", "support", "importance", "association", "confirmed"), heads);
        List<Element> rows = PAGE.select("#tt-findings tbody tr");
        assertEquals(AUDIT.result().artefacts().size(), rows.size());
        for (int i = 0; i < rows.size(); i++) {
            AuditResult.Artefact f = AUDIT.result().artefacts().get(i);
            Element row = rows.get(i);
            assertEquals(f.pattern() + " " + String.join(", ", f.termNames()), row.child(0).attr("data-v"));
            assertEquals(f.kind().key(), row.attr("data-kind"));
            assertEquals(f.severity().key(), row.attr("data-sev"));
            assertEquals(Long.toString(f.support()), row.child(4).text());
            assertEquals(Double.toString(f.importance()), row.child(5).attr("data-v"));
            String target = row.selectFirst("a").attr("href").substring(1);
            Element evidence = PAGE.getElementById(target);
            assertNotNull(evidence, target);
            assertTrue(evidence.selectFirst("h3").text().startsWith(f.pattern()));
        }
    }

    @Test
    void contextsQuoteTheTermAndLinkToItsDocument() {
        for (int i = 0; i < AUDIT.result().artefacts().size(); i++) {
            AuditResult.Artefact f = AUDIT.result().artefacts().get(i);
            Element evidence = PAGE.getElementById("finding-" + i);
            List<Element> contexts = evidence.select("p.tt-ctx");
            assertFalse(contexts.isEmpty(), f.pattern());
            for (Element c : contexts) {
                String href = c.selectFirst("a.tt-ctx-doc").attr("href");
                assertNotNull(PAGE.getElementById("tpl-" + href.substring(1)), href);
                List<Element> marks = c.select("mark.tt-cx");
                assertFalse(marks.isEmpty(), "term marked in " + c.text());
                for (Element m : marks) {
                    assertTrue(f.termNames().stream().anyMatch(t -> m.text().toLowerCase(Locale.ROOT).startsWith(t)),
                            m.text() + " for " + f.termNames());
                }
            }
            int shownDocs = (int) contexts.stream().map(c -> c.selectFirst("a").text()).distinct().count();
            assertEquals(Math.min(f.examples().size(), AuditViews.CONTEXTS_PER_FINDING), shownDocs, f.pattern());
        }
    }

    @Test
    void scrubChartBarsAreProportionalToTheMeasure() {
        List<Element> before = PAGE.select("svg rect.tt-before");
        List<Element> after = PAGE.select("svg rect.tt-after");
        assertEquals(AUDIT.result().scrub().size(), before.size());
        double full = 640 - 130;
        for (int i = 0; i < before.size(); i++) {
            AuditResult.Scrub s = AUDIT.result().scrub().get(i);
            assertEquals(full * s.accuracyBefore(), Double.parseDouble(before.get(i).attr("width")), 0.01);
            assertEquals(full * s.accuracyAfter(), Double.parseDouble(after.get(i).attr("width")), 0.01);
        }
    }

    @Test
    void scatterMarksEveryArtefactTermByKindShapeAndLinksItAndDrawsTheRestAsACloud() {
        List<Element> points = PAGE.select("svg a.tt-pt");
        assertEquals(AUDIT.result().artefacts().size(), points.size(), "one term per sample artefact");
        long unflagged = AUDIT.result().terms().stream().filter(t -> t.artefact() == null).count();
        assertEquals(unflagged, PAGE.select("svg circle.tt-cloud").size());
        assertTrue(unflagged > 0);
        for (int i = 0; i < points.size(); i++) {
            AuditResult.Artefact f = AUDIT.result().artefacts().get(i);
            Element p = points.get(i);
            assertEquals("#finding-" + i, p.attr("href"));
            assertTrue(p.hasClass("tt-sev-" + f.severity().key()));
            String expected = switch (f.kind()) {
                case HEADER -> "circle";
                case ADDRESS, IDENTIFIER -> "rect";
                default -> "path";
            };
            assertNotNull(p.selectFirst(expected), f.kind() + " drawn as " + expected);
        }
        // Higher importance sits higher on the chart (smaller y).
        double yBil = Double.parseDouble(points.get(0).selectFirst("circle").attr("cy"));
        double yNoreply = Double.parseDouble(points.get(2).selectFirst("rect").attr("y"));
        assertTrue(yBil < yNoreply);
    }

    @Test
    void hostileTermsIdsAndLabelsStayText() throws Exception {
        Explanation hostile = HostileTexts.explanation();
        String hostileText = "<script>window.telltalePwned=9</script>";
        AuditResult.Artefact f = new AuditResult.Artefact("header-000000000000", ArtefactKind.HEADER, Severity.HIGH,
                HostileTexts.HOSTILE_LABEL, hostileText, 1, 0.5, 9.0, 0.9, true, false, null, null,
                List.of(new AuditResult.ArtefactTerm(hostileText, 0.5, 9.0, 0.3)), AuditResult.Effect.NONE,
                List.of(new AuditResult.Example(hostile.id(), hostile.terms().get(1).spans())));
        AuditResult base = AUDIT.result();
        AuditResult audit = new AuditResult(base.summary(), List.of(f), base.scrub(), List.of(hostile.id()),
                List.of(new AuditResult.TermStat(hostileText, HostileTexts.HOSTILE_LABEL, ArtefactKind.HEADER, 1, 0.5,
                        9.0, 1.0, 0.3, 1, f.id())));
        List<Explanation> explanations = new ArrayList<>(AUDIT.explanations());
        explanations.add(hostile);
        Document page = Jsoup.parse(HtmlReports.audit(audit, explanations));
        ReportChecks.strictPolicy(page);
        ReportChecks.selfContained(page);
        ReportChecks.noEventHandlers(page);
        assertEquals(f.pattern(), page.selectFirst("#tt-findings td.tt-term a").text());
        assertEquals(HostileTexts.HOSTILE_ID, page.selectFirst("#picks .tt-docid").text());
        assertTrue(page.select("svg onload, textarea").isEmpty());
    }

    @Test
    void anAuditWithoutFindingsOrExplanationsStillRenders() {
        AuditResult base = AUDIT.result();
        AuditResult clean = new AuditResult(base.summary(), List.of(), List.of(), List.of("HL-missing"), List.of());
        Document page = Jsoup.parse(HtmlReports.audit(clean, List.of()));
        assertTrue(page.selectFirst("#findings").text().contains("No artefact"));
        assertTrue(page.selectFirst("#summary").text().contains("That is not a certificate"));
        assertTrue(page.selectFirst("#picks").text().contains("HL-missing"), "a pick without its explanation is named");
        assertTrue(page.select("template").isEmpty());
    }
}
