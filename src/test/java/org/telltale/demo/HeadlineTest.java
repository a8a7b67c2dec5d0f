package org.telltale.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.telltale.audit.ArtefactKind;
import org.telltale.audit.AuditResult;
import org.telltale.audit.AuditResult.Finding;
import org.telltale.audit.AuditResult.Scrub;
import org.telltale.audit.AuditSettings;
import org.telltale.audit.Severity;

class HeadlineTest {

    @Test
    void corpusWideScrubGivesTheHoldoutAccuracyAfterScrubbing() {
        // 500 held-out messages at 0.96 = 480 correct; the header scrub rewrote 100 of them,
        // 98 correct before and 50 after, so 480 - 98 + 50 = 432 correct: 0.864 (hand computation).
        AuditResult audit = audit(500, 0.96,
                List.of(scrub(ArtefactKind.HEADER, "lines", "corpus", 100, 0.98, 0.50),
                        scrub(ArtefactKind.BOILERPLATE, "lines", "corpus", 80, 0.95, 0.90)),
                List.of(finding("route", Severity.HIGH, false), finding("bil", Severity.HIGH, false),
                        finding("casefile", Severity.MEDIUM, false), finding("hello", Severity.LOW, true)));
        Headline h = Headline.of(audit);
        assertEquals(0.864, h.accuracyAfter(), 1e-12);
        assertEquals(0.096, h.accuracyDrop(), 1e-12);
        assertEquals("holdout accuracy 0.96 → 0.86 once header lines are scrubbed; 3 artefact terms, 2 high", h.text());
    }

    @Test
    void theScrubThatCostsMostCorrectPredictionsLeadsNotTheSteepestOnAFewMessages() {
        // 10 messages losing half their accuracy cost 5 correct predictions; 200 losing 0.1 cost 20.
        AuditResult audit = audit(600, 0.9,
                List.of(scrub(ArtefactKind.IDENTIFIER, "terms", "corpus", 10, 1.0, 0.5),
                        scrub(ArtefactKind.BOILERPLATE, "lines", "corpus", 200, 0.9, 0.8)),
                List.of());
        Headline h = Headline.of(audit);
        assertEquals(ArtefactKind.BOILERPLATE, h.worst().kind());
        assertEquals((540 - 180 + 160) / 600.0, h.accuracyAfter(), 1e-12);
    }

    @Test
    void explainedScopeSpeaksOfTheScrubbedMessagesOnly() {
        AuditResult audit = audit(500, 0.96, List.of(scrub(ArtefactKind.IDENTIFIER, "terms", "explained", 40, 1.0, 0.75)),
                List.of(finding("hr", Severity.HIGH, false)));
        assertEquals("accuracy on the 40 scrubbed messages 1.00 → 0.75 once identifier terms are scrubbed; 1 artefact term, 1 high",
                Headline.of(audit).text());
    }

    @Test
    void aCleanAuditSaysThereIsNothingToScrub() {
        Headline h = Headline.of(audit(500, 0.81, List.of(), List.of()));
        assertEquals(0.0, h.accuracyDrop());
        assertEquals("holdout accuracy 0.81, nothing to scrub; 0 artefact terms, 0 high", h.text());
    }

    static AuditResult audit(long documents, double accuracy, List<Scrub> scrubs, List<Finding> findings) {
        AuditSettings settings = new AuditSettings(60, 500, 10, 5, true, "never", 0.05, 64, "standard", null);
        AuditResult.Summary summary = new AuditResult.Summary(documents, 60, List.of("billing", "outage"), accuracy, 0, 0,
                "model", "holdout.jsonl", 1, settings, "gold", Map.of("billing", 0.5, "outage", 0.5),
                Map.of("billing", 250L, "outage", 250L), 4.2, 100, 0.8, 1000);
        return new AuditResult(summary, findings, scrubs, List.of());
    }

    static Scrub scrub(ArtefactKind kind, String mode, String scope, int docs, double before, double after) {
        return new Scrub(kind, mode, List.of("t"), scope, docs, docs / 2, 0.5, 0.3, before, after);
    }

    static Finding finding(String term, Severity severity, boolean suppressed) {
        return new Finding(term, ArtefactKind.HEADER, severity, "billing", 50, 1.0, 9.0, true, 9.0, 1.0, 1.0,
                Map.of("billing", 50L), 0.4, 1.0, 10, suppressed, suppressed ? "accepted" : null, null, Map.of("header", 1.0),
                3, 0.2, List.of());
    }
}
