package org.telltale.demo;

import org.telltale.audit.AssociationBasis;
import org.telltale.audit.FailOn;
import org.telltale.audit.ScrubScope;
import org.telltale.audit.ScrubGroup;
import org.telltale.audit.ScrubMode;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.telltale.audit.ArtefactKind;
import org.telltale.audit.AuditResult;
import org.telltale.audit.AuditResult.Artefact;
import org.telltale.audit.AuditResult.Scrub;
import org.telltale.audit.AuditSettings;
import org.telltale.audit.Severity;

class HeadlineTest {

    @Test
    void theAllAtOnceScrubLeadsWithTheHoldoutAccuracyAfterIt() {
        // 500 held-out messages at 0.96 = 480 correct; removing all artefacts rewrote 150 of them,
        // 147 correct before and 60 after, so 480 - 147 + 60 = 393 correct: 0.786 (hand computation).
        List<Artefact> artefacts = List.of(artefact("route", Severity.HIGH, false), artefact("bil", Severity.HIGH, false),
                artefact("casefile", Severity.MEDIUM, false), artefact("hello", Severity.LOW, true));
        AuditResult audit = audit(500, 0.96,
                List.of(scrub("header", "lines", "corpus", 100, 0.98, 0.50, 2),
                        scrub("boilerplate", "lines", "corpus", 80, 0.95, 0.90, 1),
                        scrub("all", "mixed", "corpus", 150, 0.98, 0.40, 3)),
                artefacts);
        Headline h = Headline.of(audit);
        assertEquals(0.786, h.accuracyAfter(), 1e-12);
        assertEquals(0.174, h.accuracyDrop(), 1e-12);
        assertEquals("holdout accuracy 0.96 → 0.79 once all 3 artefacts are removed; 3 artefacts, 2 high", h.text());
    }

    @Test
    void withoutAnAllAtOnceRowThereIsNothingToLeadWith() {
        // A version 1 audit.json has per-kind rows only.
        AuditResult audit = audit(600, 0.9, List.of(scrub("boilerplate", "lines", "corpus", 200, 0.9, 0.8, 1)), List.of());
        Headline h = Headline.of(audit);
        assertNull(h.all());
        assertEquals("holdout accuracy 0.90, no artefact to remove; 0 artefacts, 0 high", h.text());
    }

    @Test
    void explainedScopeSpeaksOfTheScrubbedMessagesOnly() {
        AuditResult audit = audit(500, 0.96, List.of(scrub("all", "matches", "explained", 40, 1.0, 0.75, 1)),
                List.of(artefact("hr", Severity.HIGH, false)));
        assertEquals("accuracy on the 40 scrubbed messages 1.00 → 0.75 once its artefact is removed; 1 artefact, 1 high",
                Headline.of(audit).text());
    }

    @Test
    void aCleanAuditSaysThereIsNothingToRemove() {
        Headline h = Headline.of(audit(500, 0.81, List.of(), List.of()));
        assertEquals(0.0, h.accuracyDrop());
        assertEquals("holdout accuracy 0.81, no artefact to remove; 0 artefacts, 0 high", h.text());
    }

    static AuditResult audit(long documents, double accuracy, List<Scrub> scrubs, List<Artefact> artefacts) {
        AuditSettings settings = new AuditSettings(60, 500, 10, 5, true, FailOn.NEVER, 0.05, 64, "standard", null);
        AuditResult.Summary summary = new AuditResult.Summary(documents, 60, List.of("billing", "outage"), accuracy, 0, 0,
                "model", "holdout.jsonl", 1, settings, AssociationBasis.GOLD, Map.of("billing", 0.5, "outage", 0.5),
                Map.of("billing", 250L, "outage", 250L), 4.2, 100, 0.8, 1000);
        return new AuditResult(summary, artefacts, scrubs, List.of(), List.of());
    }

    static Scrub scrub(String kind, String mode, String scope, int docs, double before, double after, int artefacts) {
        return new Scrub(ScrubGroup.fromKey(kind), ScrubMode.fromKey(mode), java.util.Collections.nCopies(artefacts, "header-0"),
                ScrubScope.fromKey(scope), docs, docs / 2, 0.5, 0.3,
                before, after);
    }

    static Artefact artefact(String term, Severity severity, boolean suppressed) {
        return new Artefact("header-" + term, ArtefactKind.HEADER, severity, "billing", "X-Route: " + term, 50, 1.0, 9.0,
                1.0, true, suppressed, suppressed ? org.telltale.audit.Policy.Status.ACCEPTED : null, null,
                List.of(new AuditResult.ArtefactTerm(term, 1.0, 9.0, 0.4)), AuditResult.Effect.NONE, List.of());
    }
}
