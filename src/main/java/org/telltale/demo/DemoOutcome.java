package org.telltale.demo;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Both audits of a demo run, and the lines the demo prints about them.
 *
 * @param leaky the model trained on the corpus with planted leakage
 * @param clean the model trained on the same messages without it
 */
public record DemoOutcome(VariantOutcome leaky, VariantOutcome clean) {

    /** The lines for stdout: each headline with its report, then the contrast. */
    public List<String> summary() {
        List<String> lines = new ArrayList<>();
        Headline l = leaky.headline();
        Headline c = clean.headline();
        lines.add("leaky model: " + l.text());
        lines.add("  report: " + leaky.report());
        lines.add("clean model: " + c.text());
        lines.add("  report: " + clean.report());
        lines.add(contrast(l, c));
        return lines;
    }

    private String contrast(Headline l, Headline c) {
        if (l.accuracy() == null || c.accuracy() == null) {
            return "contrast: no gold labels, no accuracy to compare";
        }
        return String.format(Locale.ROOT,
                "contrast: the leaky model scores %.2f on held-out messages against the clean model's %.2f; "
                        + "removing all artefacts costs it %.2f, the clean one %.2f; high artefacts %d against %d",
                l.accuracy(), c.accuracy(), l.accuracyDrop(), c.accuracyDrop(), l.high(), c.high());
    }
}
