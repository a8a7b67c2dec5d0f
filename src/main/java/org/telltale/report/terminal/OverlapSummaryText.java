package org.telltale.report.terminal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.telltale.overlap.Banding;
import org.telltale.overlap.Inflation;
import org.telltale.overlap.OverlapPair;
import org.telltale.overlap.OverlapResult;
import org.telltale.overlap.OverlapSettings;
import org.telltale.overlap.OverlapSummary;
import org.telltale.overlap.PairKind;

/**
 * The readable summary of an overlap run for stdout: what share of the test set the model has
 * already seen, how many of those carry another label, what that is worth in accuracy, the
 * settings behind the figures and the most similar pairs. Plain text, numbers in the root locale.
 */
public final class OverlapSummaryText {
    /** Pairs listed at the end; the JSON has them all. */
    public static final int LISTED_PAIRS = 10;

    private OverlapSummaryText() {
    }

    public static String render(OverlapResult result) {
        OverlapSummary s = result.summary();
        List<String> lines = new ArrayList<>();
        lines.add(String.format(Locale.ROOT,
                "%s of %s test documents (%s) already appear in train (%s exact, %s near duplicates); %s with a different label.",
                count(s.testSeen()), count(s.testDocuments()), percent(s.testSeenShare()), count(s.testSeenExact()),
                count(s.testSeen() - s.testSeenExact()), count(s.testSeenConflicting())));
        lines.add(String.format(Locale.ROOT, "Pairs: %s train-test (%s exact), %s within train, %s within test.",
                count(s.trainTestPairs()), count(s.exactTrainTestPairs()), count(s.withinTrainPairs()),
                count(s.withinTestPairs())));
        if (s.trainEmpty() + s.testEmpty() > 0) {
            lines.add(String.format(Locale.ROOT, "Left out: %s train and %s test documents without a single word.",
                    count(s.trainEmpty()), count(s.testEmpty())));
        }
        Inflation a = result.inflation();
        if (a != null) {
            lines.add(String.format(Locale.ROOT,
                    "Model %s: accuracy %s on %s labelled test documents, %s on the %s not seen in train; "
                            + "the overlap adds %s points.",
                    a.model(), ratio(a.accuracy()), count(a.labelled()), ratio(a.accuracyUnseen()),
                    count(a.labelledUnseen()), points(a.inflation())));
        }
        OverlapSettings settings = result.settings();
        Banding b = settings.banding();
        lines.add(String.format(Locale.ROOT,
                "Near duplicates: Jaccard similarity >= %s of %d-word shingles; MinHash banding r = %d rows x b = %d bands "
                        + "(%d of %d hashes, candidate probability %.3f at the threshold); %s candidates verified.",
                trim(settings.threshold()), settings.shingle(), b.rows(), b.bands(), b.hashes(), settings.signature(),
                b.candidateProbability(settings.threshold()), count(s.candidates())));
        List<OverlapPair> cross = result.pairs(PairKind.TRAIN_TEST);
        if (!cross.isEmpty()) {
            lines.add("Most similar train-test pairs (train id, test id, similarity):");
            for (OverlapPair p : cross.subList(0, Math.min(LISTED_PAIRS, cross.size()))) {
                String label = Boolean.FALSE.equals(p.sameLabel())
                        ? "  labels differ: " + p.firstLabel() + " / " + p.secondLabel() : "";
                lines.add(String.format(Locale.ROOT, "  %s  %s  %.3f%s%s", p.first(), p.second(), p.similarity(),
                        p.exact() ? "  exact" : "", label));
            }
            if (cross.size() > LISTED_PAIRS) {
                lines.add(String.format(Locale.ROOT, "  ... and %s more (all of them in {json})", count(cross.size() - LISTED_PAIRS)));
            }
        }
        return String.join(System.lineSeparator(), lines) + System.lineSeparator();
    }

    private static String count(long n) {
        return String.format(Locale.ROOT, "%,d", n);
    }

    private static String percent(double share) {
        double p = 100 * share;
        return p > 0 && p < 1 ? String.format(Locale.ROOT, "%.1f%%", p) : String.format(Locale.ROOT, "%.0f%%", p);
    }

    private static String ratio(double value) {
        return Double.isNaN(value) ? "n/a" : String.format(Locale.ROOT, "%.3f", value);
    }

    private static String points(double value) {
        return Double.isNaN(value) ? "n/a" : String.format(Locale.ROOT, "%+.1f", 100 * value);
    }

    private static String trim(double value) {
        String s = String.format(Locale.ROOT, "%.4f", value);
        return s.replaceAll("0+$", "").replaceAll("\\.$", "");
    }
}
