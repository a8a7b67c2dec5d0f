package org.telltale.explain;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.telltale.model.TextClassifier;
import org.telltale.text.Document;

/**
 * Measures, on the AFINN-111 model and the invented reviews of the fidelity check, what the
 * kernel bandwidth and the adaptive budget cost and give: split-half stability and agreement of
 * the top-10 terms (with signs) with a converged answer of 16,000 probes. Not a test: run it by
 * hand (see docs/performance.md) and copy the figures.
 */
public final class BudgetExperiment {
    private BudgetExperiment() {
    }

    public static void main(String[] args) throws Exception {
        String what = args.length > 0 ? args[0] : "all";
        List<Document> docs;
        TextClassifier model;
        String label;
        if (args.length >= 3) {
            // budget MODEL.json CORPUS.jsonl [N]: a model file and the first N documents of a corpus
            model = org.telltale.model.ModelFile.load(java.nio.file.Path.of(args[1]));
            docs = new ArrayList<>();
            int n = args.length > 3 ? Integer.parseInt(args[3]) : 20;
            try (org.telltale.text.CorpusReader r = org.telltale.text.Corpora.open(java.nio.file.Path.of(args[2]),
                    new org.telltale.text.CorpusSettings(null, "id", "text", "label", false))) {
                while (r.hasNext() && docs.size() < n) {
                    docs.add(r.next());
                }
            }
            label = null;
        } else {
            docs = LexiconCheck.reviews();
            model = LexiconCheck.model(LexiconCheck.lexicon());
            label = "yes";
        }
        if (what.equals("all") || what.equals("bandwidth")) {
            for (double sigma : new double[] {0.1, 0.25, 0.5, 1.0}) {
                ExplainSettings s = ExplainSettings.defaults().withBandwidth(sigma).withSplitHalf(true);
                Explainer ref = new Explainer(model, s.withProbes(16000));
                Explainer fixed = new Explainer(model, s);
                double agree = 0;
                double stab = 0;
                for (Document d : docs) {
                    Explanation converged = ref.explain(d, label);
                    Explanation e = fixed.explain(d, label);
                    agree += agreement(converged, e);
                    stab += e.method().stability();
                }
                System.out.printf(Locale.ROOT, "sigma %.2f: top-10 agreement with 16k probes %.3f, split-half %.3f%n",
                        sigma, agree / docs.size(), stab / docs.size());
            }
        }
        if (what.equals("all") || what.equals("budget")) {
            ExplainSettings s = ExplainSettings.defaults();
            Explainer ref = new Explainer(model, s.withProbes(16000));
            for (String budget : new String[] {"250", "500", "1000", "2000", "auto"}) {
                ExplainSettings b = budget.startsWith("auto")
                        ? s.withProbes(ExplainSettings.AUTO)
                        : s.withProbes(Integer.parseInt(budget));
                Explainer ex = new Explainer(model, b);
                double agree = 0;
                double calls = 0;
                double worst = 1;
                for (Document d : docs) {
                    Explanation converged = ref.explain(d, label);
                    Explanation e = ex.explain(d, label);
                    double a = agreement(converged, e);
                    agree += a;
                    worst = Math.min(worst, a);
                    calls += e.method().calls();
                }
                System.out.printf(Locale.ROOT, "probes %s: mean calls %.0f, top-10 agreement mean %.3f, worst %.2f%n",
                        budget, calls / docs.size(), agree / docs.size(), worst);
            }
        }
    }

    /** The share of the converged top-10 that the other explanation's top-10 holds with the same sign. */
    static double agreement(Explanation converged, Explanation other) {
        List<Explanation.TermWeight> a = converged.terms().subList(0, Math.min(10, converged.terms().size()));
        List<Explanation.TermWeight> b = other.terms().subList(0, Math.min(10, other.terms().size()));
        int same = 0;
        for (Explanation.TermWeight t : a) {
            for (Explanation.TermWeight u : b) {
                if (t.term().equals(u.term()) && Math.signum(t.weight()) == Math.signum(u.weight())) {
                    same++;
                }
            }
        }
        return a.isEmpty() ? 1 : (double) same / Math.max(a.size(), b.size());
    }

}
