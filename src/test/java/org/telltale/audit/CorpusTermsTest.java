package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.telltale.text.Analyzers;
import org.telltale.text.Document;

class CorpusTermsTest {
    private static final List<String> LABELS = List.of("membership", "parts", "rentals", "repairs");
    private static final Set<String> TERMS = Set.of("mbr", "b14", "portal.ferrowheel.example", "tandem", "bike");

    private static CorpusTerms count(List<Document> docs, LineRepeats repeats) {
        CorpusTerms terms = CorpusTerms.of(TERMS, LABELS, Analyzers.standard(), repeats);
        docs.forEach(d -> terms.add(d.text(), d.label()));
        return terms;
    }

    @Test
    void countsOfPartsMergeIntoTheCountsOfTheWhole() {
        // The reducer property the Spark front relies on: count(A ∪ B) = merge(count(A), count(B)).
        List<Document> docs = CycleCoopMail.generate(3, 40, true);
        LineRepeats repeats = new LineRepeats(1000);
        docs.forEach(d -> repeats.add(d.text()));
        CorpusTerms whole = count(docs, repeats);
        CorpusTerms merged = count(docs.subList(0, 70), repeats);
        merged.merge(count(docs.subList(70, docs.size()), repeats));
        for (String term : TERMS) {
            for (ArtefactKind kind : ArtefactKind.values()) {
                assertEquals(whole.dominantPlace(term, kind), merged.dominantPlace(term, kind), term + " " + kind);
            }
            assertEquals(whole.df(term), merged.df(term));
            assertEquals(whole.kindShares(term), merged.kindShares(term));
            assertEquals(whole.wholeCodeShare(term), merged.wholeCodeShare(term), 1e-12);
        }
        assertEquals(whole.distinctValues("mbr-#####"), merged.distinctValues("mbr-#####"));
        assertEquals(CorpusTerms.VALUES_KEPT, whole.distinctValues("mbr-#####"), "member numbers vary");
        assertEquals("x-workshop-bench", whole.dominantPlace("b14", ArtefactKind.HEADER).key());
        assertEquals("X-Workshop-Bench", whole.dominantPlace("b14", ArtefactKind.HEADER).shown(),
                "the smallest spelling is shown, whatever the order");
        assertEquals("portal.ferrowheel.example",
                whole.dominantPlace("portal.ferrowheel.example", ArtefactKind.ADDRESS).key());
        assertNull(whole.dominantPlace("bike", ArtefactKind.ADDRESS));
        assertEquals(ArtefactKind.IDENTIFIER, ArtefactGrouping.kindOf("mbr", whole));
    }

    @Test
    void aFixedCodeInTheTextIsVocabularyAndAVaryingShapeIsAnIdentifier() {
        List<String> labels = List.of("a", "b");
        CorpusTerms terms = CorpusTerms.of(Set.of("xr980", "zb", "hr"), labels, Analyzers.standard(), new LineRepeats(16));
        for (int i = 0; i < 10; i++) {
            terms.add("my XR980 keeps dropping, part ZB-412, case HR-" + (40000 + 37 * i), "a");
        }
        assertEquals(ArtefactKind.IDENTIFIER, terms.kind("xr980"), "where it sits");
        assertEquals(ArtefactKind.CONTENT, ArtefactGrouping.kindOf("xr980", terms), "a whole fixed code");
        assertEquals(ArtefactKind.CONTENT, ArtefactGrouping.kindOf("zb", terms), "a shape whose digits never vary");
        assertEquals(ArtefactKind.IDENTIFIER, ArtefactGrouping.kindOf("hr", terms), "a shape whose digits vary");
    }
}
