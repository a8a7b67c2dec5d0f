package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Predicate;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.audit.AuditResult.Artefact;
import org.telltale.model.NaiveBayesModel;
import org.telltale.report.json.AuditJson;

/**
 * The audit reports artefacts: on the noisy Spokewright inbox with four planted artefacts, each
 * plant is exactly one high or medium artefact of its kind, nearly every high or medium artefact
 * is a plant, and the clean inbox yields none.
 */
class ArtefactAuditTest {
    private static final long SEED = 11;

    /** A planted artefact: its queue, its kind, and how to recognise its pattern. */
    private record Plant(String label, ArtefactKind kind, Predicate<String> pattern) {
        boolean is(Artefact a) {
            return a.label().equals(label) && a.kind() == kind && pattern.test(a.pattern());
        }
    }

    private static final List<Plant> PLANTS = List.of(
            new Plant("repairs", ArtefactKind.HEADER, p -> p.startsWith(CycleCoopMail.BENCH_FIELD + ":")),
            new Plant("parts", ArtefactKind.ADDRESS, p -> p.equals(CycleCoopMail.PORTAL_HOST)),
            new Plant("membership", ArtefactKind.IDENTIFIER, p -> p.equals(CycleCoopMail.MEMBER_SHAPE)),
            new Plant("rentals", ArtefactKind.BOILERPLATE, p -> p.contains(CycleCoopMail.KIOSK_FOOTER)));

    static String describe(AuditResult result) {
        return result.artefacts().stream()
                .map(a -> a.kind().key() + " '" + a.pattern() + "' → " + a.label() + " " + a.severity().key()
                        + (a.confirmed() ? " confirmed" : "") + " " + a.termNames())
                .collect(Collectors.joining("\n  ", "\n  ", ""));
    }

    private static AuditResult audit(boolean leaky, Path dir) throws Exception {
        return audit(leaky, Policy.empty(), dir);
    }

    private static AuditResult audit(boolean leaky, Policy policy, Path dir) throws Exception {
        NaiveBayesModel model = TrainedModels.naiveBayes(CycleCoopMail.generate(1, 150, leaky));
        Path corpus = UtilityQueues.write(CycleCoopMail.generate(2, 100, leaky), dir.resolve("inbox.jsonl"));
        AuditResult result = AuditRuns.run(model, corpus, AuditRuns.settings(60, 300, 8), SEED, policy, dir)
                .result();
        Files.writeString(dir.resolve("audit.json"), AuditJson.toJson(result));
        return result;
    }

    @Test
    void everyPlantIsOneArtefactOfItsKindAndNearlyAllSevereArtefactsArePlants(@TempDir Path dir) throws Exception {
        AuditResult result = audit(true, dir);
        String found = describe(result);
        List<Artefact> severe = result.artefacts().stream().filter(a -> a.severity().atLeast(Severity.MEDIUM)).toList();
        for (Plant plant : PLANTS) {
            List<Artefact> matching = severe.stream().filter(plant::is).toList();
            assertEquals(1, matching.size(), plant + " should be exactly one high/medium artefact:" + found);
            Artefact a = matching.get(0);
            assertTrue(a.confirmed() && a.scrub().documents() > 0 && a.scrub().scoreDrop() > 0,
                    "its own scrub proves it: " + a.scrub() + found);
            assertTrue(!a.examples().isEmpty() && a.examples().get(0).spans().size() >= 1, found);
        }
        long planted = severe.stream().filter(a -> PLANTS.stream().anyMatch(p -> p.is(a))).count();
        // The bar: at least 90 % of high and medium artefacts are planted ones.
        assertTrue(planted >= 0.9 * severe.size(), planted + " of " + severe.size() + " are plants:" + found);
        // Identity: the id is the kind and 12 hex digits of the fingerprint.
        for (Artefact a : result.artefacts()) {
            assertEquals(a.kind().key() + "-" + a.identity().fingerprint().substring(0, 12), a.id());
        }
        // Every tested term's statistics are kept, flagged or not, and flagged ones name their artefact.
        assertTrue(result.terms().stream().anyMatch(t -> t.artefact() == null), "the unflagged cloud is kept");
        for (Artefact a : result.artefacts()) {
            for (String term : a.termNames()) {
                assertTrue(result.terms().stream().anyMatch(t -> t.term().equals(term) && a.id().equals(t.artefact())),
                        term + " of " + a.id());
            }
        }
    }

    @Test
    void theCleanInboxHasNoSevereArtefact(@TempDir Path dir) throws Exception {
        AuditResult result = audit(false, dir);
        assertTrue(result.artefacts().stream().noneMatch(a -> a.severity().atLeast(Severity.MEDIUM)), describe(result));
    }

    @Test
    void oneBoilerplateEntryAcceptsTheWholeFooterLine(@TempDir Path dir) throws Exception {
        Policy policy = Policy.parse("""
                {"format": "telltale.policy", "version": 1, "rules": [
                  {"boilerplate": "-- Logged at the Tandem Yard kiosk*", "status": "accepted",
                   "note": "the kiosk footer is how rentals are logged; expected"}]}
                """, "policy.json");
        AuditResult result = audit(true, policy, dir);
        String found = describe(result);
        List<Artefact> footer = result.artefacts().stream().filter(PLANTS.get(3)::is).toList();
        assertEquals(1, footer.size(), found);
        Artefact a = footer.get(0);
        assertTrue(a.suppressed() && a.policy() == Policy.Status.ACCEPTED, found);
        assertTrue(a.termNames().size() > 3, "all the footer's terms in one entry: " + a.termNames());
        assertEquals("the kiosk footer is how rentals are logged; expected", a.policyNote());
        assertTrue(result.open(Severity.LOW).stream().noneMatch(PLANTS.get(3)::is), found);
        assertEquals(3, result.open(Severity.MEDIUM).size(), found);
    }
}
