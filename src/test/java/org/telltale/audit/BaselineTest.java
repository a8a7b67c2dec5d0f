package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;

class BaselineTest {
    private static Baseline.Entry entry(String kind, String label, String pattern, Severity severity, boolean suppressed) {
        return new Baseline.Entry(new ArtefactIdentity(kind, label, ArtefactIdentity.normalise(pattern)), severity, suppressed);
    }

    private static final Baseline.Entry FOOTER = entry("boilerplate", "meter", "Sent via the Fernhill app", Severity.HIGH, false);
    private static final Baseline.Entry HEADER = entry("header", "outage", "ivr7", Severity.HIGH, false);
    private static final Baseline.Entry CODE = entry("identifier", "billing", "BLQ-####", Severity.MEDIUM, false);

    @Test
    void sortsTheNewAuditsArtefactsIntoNewAndUnchangedAndTheRestIntoResolved() {
        Baseline earlier = new Baseline("old/audit.json", List.of(FOOTER, HEADER));
        Baseline.Entry added = entry("address", "billing", "ledgerline.example", Severity.HIGH, false);
        Baseline.Comparison c = earlier.compare(List.of(added, HEADER, CODE));
        assertEquals(List.of(added, CODE), c.added());
        assertEquals(List.of(HEADER), c.unchanged());
        assertEquals(List.of(FOOTER), c.resolved());
        assertEquals("old/audit.json", c.baseline());
        assertEquals(Baseline.State.NEW, c.stateOf(CODE.identity()));
        assertEquals(Baseline.State.UNCHANGED, c.stateOf(HEADER.identity()));
        assertEquals(Baseline.State.RESOLVED, c.stateOf(FOOTER.identity()));
    }

    @Test
    void theSameArtefactWithAnotherSeverityOrSpellingIsUnchanged() {
        Baseline earlier = new Baseline("old", List.of(FOOTER));
        Baseline.Entry again = entry("boilerplate", "meter", "  SENT via   the fernhill APP ", Severity.LOW, false);
        Baseline.Comparison c = earlier.compare(List.of(again));
        assertEquals(List.of(again), c.unchanged(), "the pattern is normalised; the severity is not part of the identity");
        assertEquals(List.of(), c.added());
        assertEquals(List.of(), c.resolved());
    }

    @Test
    void anotherLabelOrKindIsAnotherArtefact() {
        Baseline earlier = new Baseline("old", List.of(HEADER));
        Baseline.Entry otherLabel = entry("header", "billing", "ivr7", Severity.HIGH, false);
        Baseline.Entry otherKind = entry("content", "outage", "ivr7", Severity.HIGH, false);
        Baseline.Comparison c = earlier.compare(List.of(otherLabel, otherKind));
        assertEquals(List.of(otherLabel, otherKind), c.added());
        assertEquals(List.of(HEADER), c.resolved());
    }

    @Test
    void theGateCountsNewOpenArtefactsAtOrAboveTheLevel() {
        Baseline.Entry accepted = entry("address", "billing", "help.example", Severity.HIGH, true);
        Baseline.Entry low = entry("identifier", "meter", "MT-###", Severity.LOW, false);
        Baseline.Comparison c = new Baseline("old", List.of(HEADER)).compare(List.of(HEADER, CODE, accepted, low));
        assertEquals(List.of(), c.gate(Severity.HIGH), "the unchanged high one and the accepted new one do not count");
        assertEquals(List.of(CODE), c.gate(Severity.MEDIUM));
        assertEquals(List.of(CODE, low), c.gate(Severity.LOW));
    }

    @Test
    void aReportedArtefactIsMatchedByItsKindLabelAndNormalisedPattern() {
        AuditResult.Artefact footer = new AuditResult.Artefact("a1", ArtefactKind.BOILERPLATE, Severity.MEDIUM, "meter",
                "Sent via the Fernhill app", 90, 1.2, 9.0, 0.95, true, false, null, null, java.util.List.of(),
                AuditResult.Effect.NONE, java.util.List.of());
        Baseline.Entry entry = Baseline.Entry.of(footer);
        assertEquals(FOOTER.identity(), entry.identity());
        assertEquals(Severity.MEDIUM, entry.severity());
        assertEquals(List.of(entry), new Baseline("old", List.of(FOOTER)).compare(List.of(entry)).unchanged());
    }

    @Test
    void anArtefactInNeitherAuditHasNoState() {
        Baseline.Comparison c = new Baseline("old", List.of()).compare(List.of());
        assertThrows(IllegalArgumentException.class, () -> c.stateOf(HEADER.identity()));
    }
}
