package org.telltale.demo;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.telltale.audit.AuditResult;
import org.telltale.audit.AuditResult.Scrub;
import org.telltale.audit.Severity;

/**
 * The one-line summary of an audit that the demo prints, e.g. "holdout accuracy 0.97 → 0.74 once
 * header lines are scrubbed; 6 artefact terms, 3 high".
 *
 * <p>When the scrub test rewrote the whole audited corpus, the accuracy after scrubbing is the
 * corpus-wide figure: documents the scrub left alone keep their predictions, so
 * {@code after = (n·acc − d·before + d·after_d) / n} over the {@code d} rewritten documents. When it
 * rewrote only the explained documents, the figures are for those and the line says so.
 *
 * @param accuracy      accuracy on the audited corpus, or {@code null} without gold labels
 * @param worst         the scrub that cost the most correct predictions, if any scrub ran
 * @param accuracyAfter accuracy after that scrub, on the same documents as {@code accuracy}
 *                      (corpus-wide) or on the scrubbed documents (explained scope)
 * @param findings      open findings (not suppressed by a policy)
 * @param high          open findings of severity high
 */
public record Headline(Double accuracy, Scrub worst, Double accuracyAfter, int findings, int high) {

    public static Headline of(AuditResult audit) {
        List<AuditResult.Finding> open = audit.open(Severity.LOW);
        int high = audit.open(Severity.HIGH).size();
        Double accuracy = audit.summary().accuracy();
        Optional<Scrub> worst = audit.scrub().stream()
                .filter(s -> s.accuracyBefore() != null && s.accuracyAfter() != null && s.documents() > 0)
                .max((a, b) -> Double.compare(a.documents() * drop(a), b.documents() * drop(b)));
        if (worst.isEmpty()) {
            return new Headline(accuracy, null, null, open.size(), high);
        }
        Scrub s = worst.get();
        Double after;
        if (corpusWide(s) && accuracy != null) {
            double n = audit.summary().documents();
            after = (n * accuracy - s.documents() * s.accuracyBefore() + s.documents() * s.accuracyAfter()) / n;
        } else {
            after = s.accuracyAfter();
        }
        return new Headline(accuracy, s, after, open.size(), high);
    }

    /** How much accuracy the worst scrub cost, on the headline's basis; 0 without a scrub. */
    public double accuracyDrop() {
        if (worst == null) {
            return 0;
        }
        return corpusWide(worst) && accuracy != null ? accuracy - accuracyAfter : worst.accuracyBefore() - accuracyAfter;
    }

    /** The line itself. */
    public String text() {
        StringBuilder line = new StringBuilder();
        if (worst != null) {
            double before = corpusWide(worst) && accuracy != null ? accuracy : worst.accuracyBefore();
            line.append(String.format(Locale.ROOT, "%s %.2f → %.2f once %s are scrubbed",
                    corpusWide(worst) ? "holdout accuracy" : "accuracy on the " + worst.documents() + " scrubbed messages",
                    before, accuracyAfter, what(worst)));
        } else if (accuracy != null) {
            line.append(String.format(Locale.ROOT, "holdout accuracy %.2f, nothing to scrub", accuracy));
        } else {
            line.append("no gold labels, no accuracy");
        }
        line.append(String.format(Locale.ROOT, "; %d artefact term%s, %d high", findings, findings == 1 ? "" : "s", high));
        return line.toString();
    }

    private static boolean corpusWide(Scrub s) {
        return "corpus".equals(s.scope());
    }

    /** Accuracy lost on the rewritten documents; times their number, the correct predictions lost. */
    private static double drop(Scrub s) {
        return s.accuracyBefore() - s.accuracyAfter();
    }

    /** "header lines", "boilerplate lines", "address terms", ... */
    private static String what(Scrub s) {
        return s.kind().key() + ("lines".equals(s.mode()) ? " lines" : " terms");
    }
}
