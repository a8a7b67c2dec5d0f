package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.audit.AuditResult.Artefact;
import org.telltale.model.NaiveBayesModel;
import org.telltale.report.json.AuditJson;

/** Audits of the invented Kestrel Valley Utilities mailbox, with and without planted artefacts. */
class PlantedArtefactAuditTest {
    private static final long SEED = 42;

    private static String describe(AuditResult result) {
        return result.artefacts().stream()
                .map(f -> f.pattern() + f.termNames() + "/" + f.kind().key() + "/" + f.label() + "/" + f.severity().key()
                        + (f.confirmed() ? "/confirmed" : "") + " z=" + Math.round(f.association() * 10) / 10.0)
                .collect(Collectors.joining(", "));
    }

    /** The artefact a term belongs to. */
    private static Optional<Artefact> finding(AuditResult result, String term) {
        return result.artefacts().stream().filter(f -> f.termNames().contains(term)).findFirst();
    }

    @Test
    void everyPlantedArtefactIsFoundWithItsKindAndTheScrubMovesPredictions(@TempDir Path dir) throws Exception {
        NaiveBayesModel model = TrainedModels.naiveBayes(UtilityQueues.generate(1, 150, true));
        Path corpus = UtilityQueues.write(UtilityQueues.generate(2, 120, true), dir.resolve("mailbox.jsonl"));
        Auditor.Outcome outcome = AuditRuns.run(model, corpus, AuditRuns.settings(45, 300, 8), SEED, Policy.empty(), dir);
        AuditResult result = outcome.result();
        Files.writeString(dir.resolve("audit.json"), AuditJson.toJson(result));
        String found = describe(result);

        assertEquals(360, result.summary().documents());
        assertEquals(45, result.summary().explained());
        assertEquals(AssociationBasis.GOLD, result.summary().associationBasis());
        // The planted artefacts of UtilityQueues, each with the place it was planted in.
        assertEquals(ArtefactKind.HEADER, finding(result, "ivr7").orElseThrow(() -> new AssertionError(found)).kind(), found);
        assertEquals("outage", finding(result, "ivr7").get().label());
        assertEquals(ArtefactKind.IDENTIFIER, finding(result, "blq").orElseThrow(() -> new AssertionError(found)).kind(), found);
        assertEquals(ArtefactKind.ADDRESS,
                finding(result, "ledgerline.example").orElseThrow(() -> new AssertionError(found)).kind(), found);
        assertEquals(ArtefactKind.BOILERPLATE,
                finding(result, "fernhill").orElseThrow(() -> new AssertionError(found)).kind(), found);
        assertEquals("meter", finding(result, "fernhill").get().label());
        // Nothing the text itself says is reported as an artefact.
        assertTrue(result.artefacts().stream().allMatch(f -> f.kind() != ArtefactKind.CONTENT), found);
        assertTrue(result.artefacts().stream().anyMatch(f -> f.severity() == Severity.HIGH), found);
        // The scrub test proves the dependence: without the artefacts, predictions move and the
        // predicted queue's score drops, for every kind planted.
        for (ArtefactKind kind : List.of(ArtefactKind.HEADER, ArtefactKind.ADDRESS, ArtefactKind.IDENTIFIER,
                ArtefactKind.BOILERPLATE)) {
            AuditResult.Scrub scrub = result.scrub().stream().filter(s -> s.group().equals(ScrubGroup.of(kind))).findFirst()
                    .orElseThrow();
            assertTrue(scrub.documents() > 0 && scrub.scoreDrop() > 0, scrub.toString());
        }
        AuditResult.Scrub boilerplate = result.scrub().stream().filter(s -> s.group().equals(ScrubGroup.of(ArtefactKind.BOILERPLATE)))
                .findFirst().orElseThrow();
        assertEquals(ScrubMode.LINES, boilerplate.mode());
        assertTrue(boilerplate.flipRate() > 0.1, boilerplate.toString());
        assertTrue(boilerplate.accuracyAfter() < boilerplate.accuracyBefore(), boilerplate.toString());
        assertTrue(finding(result, "blq").get().confirmed());
        assertEquals(5, result.picks().size());
        assertEquals(45, outcome.explanations().size());
    }

    @Test
    void withoutGoldLabelsAssociationIsMeasuredOnThePredictions(@TempDir Path dir) throws Exception {
        NaiveBayesModel model = TrainedModels.naiveBayes(UtilityQueues.generate(1, 150, true));
        List<org.telltale.text.Document> unlabelled = UtilityQueues.generate(2, 120, true).stream()
                .map(d -> org.telltale.text.Document.unlabelled(d.id(), d.text())).toList();
        Path corpus = UtilityQueues.write(unlabelled, dir.resolve("mailbox.jsonl"));
        AuditResult result = AuditRuns.run(model, corpus, AuditRuns.settings(45, 300, 8), SEED, Policy.empty(), dir)
                .result();
        assertEquals(AssociationBasis.PREDICTED, result.summary().associationBasis());
        assertEquals(null, result.summary().accuracy());
        // The prior is the model's own share of predictions per label.
        result.summary().predictedCounts().forEach((label, n) ->
                assertEquals((double) n / 360, result.summary().prior().get(label), 1e-12));
        Artefact ivr7 = finding(result, "ivr7").orElseThrow(() -> new AssertionError(describe(result)));
        assertEquals(ArtefactKind.HEADER, ivr7.kind());
        assertTrue(result.scrub().stream().allMatch(s -> s.accuracyBefore() == null && s.accuracyAfter() == null));
    }

    @Test
    void aCleanControlYieldsNoHighFinding(@TempDir Path dir) throws Exception {
        NaiveBayesModel model = TrainedModels.naiveBayes(UtilityQueues.generate(1, 150, false));
        Path corpus = UtilityQueues.write(UtilityQueues.generate(2, 120, false), dir.resolve("mailbox.jsonl"));
        AuditResult result = AuditRuns.run(model, corpus, AuditRuns.settings(45, 300, 8), SEED, Policy.empty(), dir)
                .result();
        assertTrue(result.open(Severity.HIGH).isEmpty(), describe(result));
        assertTrue(result.artefacts().stream().noneMatch(f -> f.termNames().stream().anyMatch(List.of("ivr7", "web",
                "fernhill", "kestrel")::contains)), describe(result));
    }
}
