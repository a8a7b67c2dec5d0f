package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Label placement: the overlap test of two axis-aligned boxes is common practice (separating axes). */
class ChartLabelsTest {
    private final ChartLabels labels = new ChartLabels(0, 0, 720, 380);

    @Test
    void placedLabelsNeverOverlapOnACrowdedCluster() {
        SplittableRandom random = new SplittableRandom(7);
        List<ChartLabels.Request> requests = new ArrayList<>();
        for (int i = 0; i < 30; i++) {
            requests.add(new ChartLabels.Request(500 + random.nextDouble(40), 250 + random.nextDouble(40),
                    "pattern-" + i));
        }
        List<ChartLabels.Placement> placed = labels.place(requests, List.of());
        List<double[]> boxes = new ArrayList<>();
        for (int i = 0; i < requests.size(); i++) {
            if (placed.get(i).placed()) {
                boxes.add(ChartLabels.bounds(requests.get(i), placed.get(i)));
            }
        }
        for (int i = 0; i < boxes.size(); i++) {
            for (int j = i + 1; j < boxes.size(); j++) {
                double[] a = boxes.get(i);
                double[] b = boxes.get(j);
                boolean overlap = a[0] < b[2] && b[0] < a[2] && a[1] < b[3] && b[1] < a[3];
                assertFalse(overlap, "labels " + i + " and " + j + " overlap");
            }
        }
        assertTrue(boxes.size() >= 4, "a crowded cluster still gets its four corners labelled: " + boxes.size());
    }

    @Test
    void twoPointsOnTheSameSpotGetTwoSidesAndTheThirdWaitsUntilNoneIsFree() {
        ChartLabels.Request r = new ChartLabels.Request(300, 200, "X-Intake-Route: acc7");
        List<ChartLabels.Placement> placed = labels.place(List.of(r, r, r, r, r), List.of());
        assertEquals("start", placed.get(0).anchor());
        assertEquals(-7.0, placed.get(0).dy());
        assertEquals(15.0, placed.get(1).dy());
        assertEquals("end", placed.get(2).anchor());
        assertEquals("end", placed.get(3).anchor());
        assertFalse(placed.get(4).placed());
    }

    @Test
    void aPointAtTheRightEdgeIsLabelledToItsLeft() {
        List<ChartLabels.Placement> placed = labels.place(List.of(new ChartLabels.Request(700, 100, "hr")), List.of());
        assertEquals("end", placed.get(0).anchor());
    }

    @Test
    void aLabelDoesNotCoverAnotherMarker() {
        ChartLabels.Request r = new ChartLabels.Request(300, 200, "moves.quillmoor.example");
        // A marker just above and to the right of the point, where the first spot's text would run.
        List<ChartLabels.Placement> placed = labels.place(List.of(r), List.of(new double[] {340, 190}));
        assertEquals(15.0, placed.get(0).dy(), "the label moves below the point");
    }

    @Test
    void longPatternsAreCutWithAnEllipsis() {
        String cut = Scatters.shortened("[Exported by Casefile Archive 3.2 · retention class B]");
        assertEquals(Scatters.LABEL_LIMIT, cut.length());
        assertTrue(cut.endsWith("…"));
        assertEquals("HR-#####", Scatters.shortened("HR-#####"));
    }
}
