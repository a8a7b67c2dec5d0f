package org.telltale.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.telltale.audit.AuditResult;
import org.telltale.audit.Baseline;
import org.telltale.audit.AuditResult.Artefact;
import org.telltale.audit.AuditResult.Scrub;

/** The audit's outcome on the terminal: the top artefacts, the scrub test and where the files are. */
final class AuditPrinter {
    /** Artefacts shown on the terminal; the rest are in audit.json and the report. */
    static final int TOP = 15;

    private AuditPrinter() {
    }

    static void print(PrintWriter out, AuditResult result, List<String> files) {
        print(out, result, files, "");
    }

    /** {@code concurrency}: the connector's account of its requests in flight (e.g. where auto settled), or "". */
    static void print(PrintWriter out, AuditResult result, List<String> files, String concurrency) {
        print(out, result, files, concurrency, null);
    }

    /** {@code since}: the comparison with a baseline, or {@code null}. */
    static void print(PrintWriter out, AuditResult result, List<String> files, String concurrency, Baseline.Comparison since) {
        AuditResult.Summary s = result.summary();
        out.printf(Locale.ROOT, "audited %d documents, explained %d; labels %s%s%n", s.documents(), s.explained(),
                String.join(", ", s.labels()),
                s.accuracy() == null ? "" : String.format(Locale.ROOT, "; accuracy %.3f", s.accuracy()));
        if (s.skipped() > 0 || s.retries() > 0) {
            out.printf(Locale.ROOT, "skipped %d bad records; the model needed %d retries%n", s.skipped(), s.retries());
        }
        if (!concurrency.isEmpty()) {
            out.println("model " + concurrency);
        }
        List<Artefact> artefacts = result.artefacts();
        long open = artefacts.stream().filter(a -> !a.suppressed()).count();
        out.printf(Locale.ROOT, "%nartefacts: %d (%d suppressed by the policy); z threshold %.2f over %d tests%n",
                artefacts.size(), artefacts.size() - open, s.zThreshold(), s.termsTested());
        if (!artefacts.isEmpty()) {
            out.printf(Locale.ROOT, "  %-8s %-11s %-34s %-12s %6s %8s %6s  %s%n", "severity", "kind", "artefact", "label",
                    "terms", "import.", "z", "own scrub");
            for (Artefact a : artefacts.subList(0, Math.min(TOP, artefacts.size()))) {
                out.printf(Locale.ROOT, "  %-8s %-11s %-34s %-12s %6d %8.3f %6.1f  %s%s%n", a.severity().key(),
                        a.kind().key(), clip(a.pattern(), 34), clip(a.label(), 12), a.terms().size(), a.importance(),
                        a.association(), scrub(a), a.suppressed() ? " (suppressed: " + a.policyNote() + ")" : "");
            }
            if (artefacts.size() > TOP) {
                out.printf(Locale.ROOT, "  … and %d more in audit.json%n", artefacts.size() - TOP);
            }
        }
        if (since != null) {
            printBaseline(out, since);
        }
        if (!result.scrub().isEmpty()) {
            out.printf(Locale.ROOT, "%nscrub test (%s documents):%n", result.scrub().get(0).scope().key());
            out.printf(Locale.ROOT, "  %-11s %-7s %9s %9s %10s %9s %9s%n", "removed", "mode", "documents", "flip rate",
                    "score drop", "acc. was", "acc. now");
            for (Scrub x : result.scrub()) {
                out.printf(Locale.ROOT, "  %-11s %-7s %9d %9.3f %10.3f %9s %9s%n", x.all() ? "all at once" : x.group().key(),
                        x.mode().key(), x.documents(), x.flipRate(), x.scoreDrop(), share(x.accuracyBefore()),
                        share(x.accuracyAfter()));
            }
        }
        out.println();
        out.println("Explanations are local approximations of the model, not causes; a clean audit does not certify a model.");
        out.println("The outputs contain document text: handle them under your organisation's data-protection rules.");
        for (String file : files) {
            out.println("wrote " + file);
        }
        out.flush();
    }

    /** The "since the baseline" section: counts, then every new and resolved finding (unchanged ones are counted only). */
    static void printBaseline(PrintWriter out, Baseline.Comparison since) {
        out.printf(Locale.ROOT, "%nsince the baseline %s: %d new, %d unchanged, %d resolved%n", since.baseline(),
                since.added().size(), since.unchanged().size(), since.resolved().size());
        for (Baseline.Entry e : since.added()) {
            out.println("  " + line(Baseline.State.NEW, e));
        }
        for (Baseline.Entry e : since.resolved()) {
            out.println("  " + line(Baseline.State.RESOLVED, e));
        }
    }

    private static String line(Baseline.State state, Baseline.Entry e) {
        return String.format(Locale.ROOT, "%-9s %-8s %-11s %-34s %s%s", state.key(), e.severity().key(), e.identity().kind(),
                clip(e.identity().pattern(), 34), clip(e.identity().label(), 12), e.suppressed() ? " (suppressed)" : "");
    }

    /** "confirmed 12/20" (flips of the documents its removal changed) or "- 0/20". */
    private static String scrub(Artefact a) {
        String counts = a.scrub().flips() + "/" + a.scrub().documents() + " flipped";
        return a.suppressed() ? "-" : (a.confirmed() ? "confirmed, " : "not moved, ") + counts;
    }

    private static String share(Double value) {
        return value == null ? "-" : String.format(Locale.ROOT, "%.3f", value);
    }

    private static String clip(String text, int width) {
        String oneLine = text.replace('\n', ' ').replace('\r', ' ');
        return oneLine.length() <= width ? oneLine : oneLine.substring(0, width - 1) + "…";
    }
}
