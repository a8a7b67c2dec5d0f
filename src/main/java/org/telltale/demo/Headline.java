package org.telltale.demo;

import java.util.Locale;
import java.util.Optional;
import org.telltale.audit.AuditResult;
import org.telltale.audit.AuditResult.Scrub;
import org.telltale.audit.ScrubScope;
import org.telltale.audit.Severity;

/**
 * The one-line summary of an audit that the demo prints, led by what the model loses when every
 * artefact goes at once, e.g. "holdout accuracy 0.97 → 0.74 once all 6 artefacts are removed;
 * 6 artefacts, 4 high".
 *
 * <p>When the scrub test rewrote the whole audited corpus, the accuracy after scrubbing is the
 * corpus-wide figure: documents the scrub left alone keep their predictions, so
 * {@code after = (n·acc − d·before + d·after_d) / n} over the {@code d} rewritten documents. When it
 * rewrote only the explained documents, the figures are for those and the line says so.
 *
 * @param accuracy      accuracy on the audited corpus, or {@code null} without gold labels
 * @param all           the scrub that removed every open artefact at once, if any ran
 * @param accuracyAfter accuracy after it, on the same documents as {@code accuracy}
 *                      (corpus-wide) or on the scrubbed documents (explained scope)
 * @param artefacts     open artefacts (not suppressed by a policy)
 * @param high          open artefacts of severity high
 */
public record Headline(Double accuracy, Scrub all, Double accuracyAfter, int artefacts, int high) {

    public static Headline of(AuditResult audit) {
        int open = audit.open(Severity.LOW).size();
        int high = audit.open(Severity.HIGH).size();
        Double accuracy = audit.summary().accuracy();
        Optional<Scrub> all = audit.scrub().stream()
                .filter(s -> s.all() && s.accuracyBefore() != null && s.accuracyAfter() != null && s.documents() > 0)
                .findFirst();
        if (all.isEmpty()) {
            return new Headline(accuracy, null, null, open, high);
        }
        Scrub s = all.get();
        Double after;
        if (corpusWide(s) && accuracy != null) {
            double n = audit.summary().documents();
            after = (n * accuracy - s.documents() * s.accuracyBefore() + s.documents() * s.accuracyAfter()) / n;
        } else {
            after = s.accuracyAfter();
        }
        return new Headline(accuracy, s, after, open, high);
    }

    /** How much accuracy removing every artefact cost, on the headline's basis; 0 without a scrub. */
    public double accuracyDrop() {
        if (all == null) {
            return 0;
        }
        return corpusWide(all) && accuracy != null ? accuracy - accuracyAfter : all.accuracyBefore() - accuracyAfter;
    }

    /** The line itself. */
    public String text() {
        StringBuilder line = new StringBuilder();
        if (all != null) {
            double before = corpusWide(all) && accuracy != null ? accuracy : all.accuracyBefore();
            int removed = all.artefacts().size();
            line.append(String.format(Locale.ROOT, "%s %.2f → %.2f once %s removed",
                    corpusWide(all) ? "holdout accuracy" : "accuracy on the " + all.documents() + " scrubbed messages",
                    before, accuracyAfter, removed == 1 ? "its artefact is" : "all " + removed + " artefacts are"));
        } else if (accuracy != null) {
            line.append(String.format(Locale.ROOT, "holdout accuracy %.2f, no artefact to remove", accuracy));
        } else {
            line.append("no gold labels, no accuracy");
        }
        line.append(String.format(Locale.ROOT, "; %d artefact%s, %d high", artefacts, artefacts == 1 ? "" : "s", high));
        return line.toString();
    }

    private static boolean corpusWide(Scrub s) {
        return s.scope() == ScrubScope.CORPUS;
    }
}
