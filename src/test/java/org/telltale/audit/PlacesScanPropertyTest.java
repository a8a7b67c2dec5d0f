package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.telltale.text.LongRuns;
import org.telltale.text.Span;

/**
 * Places, header detection and line repeats over long hostile runs (jqwik; a failure prints the
 * seed). Each scan runs on a small stack, and what follows the run must still be recognised, so
 * a scan that gives up, overflows or stops early fails; how the time grows is measured by
 * {@code ScanningBenchmark}, not here.
 */
class PlacesScanPropertyTest {
    /** After the run: an address, an identifier and plain words, each on its own line. */
    private static final String TAIL = "\nwrite to desk@fernhill.example\nticket OGX-4471\nthe meter hums\n";

    @Provide
    Arbitrary<String> runs() {
        return LongRuns.runs();
    }

    @Property(tries = 40)
    void whatFollowsALongRunIsStillPlaced(@ForAll("runs") String run) {
        String text = run + TAIL;
        Places places = LongRuns.onSmallStack(() -> Places.of(text, line -> false));
        assertEquals(List.of(ArtefactKind.ADDRESS, ArtefactKind.IDENTIFIER, ArtefactKind.CONTENT),
                List.of(kindOf(places, text, "fernhill"), kindOf(places, text, "4471"), kindOf(places, text, "hums")),
                "places after a run of " + run.length() + " starting " + preview(run));
    }

    @Property(tries = 20)
    void aLongRunAsAFieldValueOrAsFieldLinesLeavesTheBodyContent(@ForAll("runs") String run) {
        // A header block with the run as a field value, then as many one-character field lines.
        String text = "Subject: " + run + "\n" + run.replace(" ", "").replaceAll("(.{1,40})", "X-$1: v\n") + "\nthe meter hums\n";
        List<Span> regions = LongRuns.onSmallStack(() -> Places.headerRegions(text, TextLines.of(text)));
        int body = text.indexOf("the meter hums");
        assertEquals(true, regions.stream().allMatch(r -> r.end() <= body), "no header region reaches the body");
    }

    @Property(tries = 20)
    void aRunRepeatedAcrossDocumentsIsCountedOnce(@ForAll("runs") String run) {
        LineRepeats repeats = new LineRepeats(64);
        int count = LongRuns.onSmallStack(() -> {
            for (int i = 0; i < 3; i++) {
                repeats.add("note " + i + "\n" + run + "\n" + run);
            }
            return repeats.count(run);
        });
        assertEquals(run.strip().length() >= LineRepeats.MIN_LENGTH ? 3 : 0, count);
    }

    private static ArtefactKind kindOf(Places places, String text, String needle) {
        int start = text.lastIndexOf(needle);
        return places.kindOf(new Span(start, start + needle.length()));
    }

    private static String preview(String run) {
        return "'" + run.substring(0, Math.min(12, run.length())) + "'";
    }
}
