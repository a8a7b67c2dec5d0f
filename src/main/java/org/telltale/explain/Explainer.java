package org.telltale.explain;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.apache.lucene.analysis.Analyzer;
import org.telltale.TelltaleException;
import org.telltale.model.ProbeScoring;
import org.telltale.model.TextClassifier;
import org.telltale.text.Analyzers;
import org.telltale.text.Document;
import org.telltale.text.Masker;
import org.telltale.text.TermIndex;
import org.telltale.text.Unit;

/**
 * Explains single predictions of a black-box classifier with a local weighted linear surrogate:
 * cut the document into units, send probes with random units removed, weight them by a kernel,
 * select K units and refit (see docs/method.md).
 *
 * <p>Thread-safe: one explainer may explain many documents at once. Each document draws from its
 * own random stream, derived from the run seed and its id, so the result does not depend on the
 * order or the thread that explains it.
 */
public final class Explainer {
    /** The first round of an adaptive budget, probe 0 included; later rounds add at least as many. */
    static final int FIRST_ROUND = 250;
    /** Enumeration is limited to 2^MAX_EXACT_UNITS subsets whatever the budget. */
    static final int MAX_EXACT_UNITS = 20;

    private final TextClassifier classifier;
    private final ProbeScoring probeScoring;
    private final ExplainSettings settings;
    private final Analyzer analyzer;
    private final Masker masker;
    private final SurrogateFit fitter;

    public Explainer(TextClassifier classifier, ExplainSettings settings) {
        this(classifier, settings, classifier instanceof ProbeScoring scoring ? scoring : null);
    }

    /**
     * @param probeScoring scores masks without their texts where the model shows that exact for a
     *                     document (a built-in model in this process; see {@link ProbeScoring}), or
     *                     {@code null}: every probe goes to {@code classifier} as a text
     */
    public Explainer(TextClassifier classifier, ExplainSettings settings, ProbeScoring probeScoring) {
        this.classifier = Objects.requireNonNull(classifier, "classifier");
        this.probeScoring = probeScoring;
        this.settings = Objects.requireNonNull(settings, "settings");
        this.analyzer = Analyzers.byName(settings.analyzer());
        this.masker = new Masker(settings.filler());
        this.fitter = new SurrogateFit(settings);
    }

    public ExplainSettings settings() {
        return settings;
    }

    /**
     * Explains {@code doc} for {@code labelOrNull}, or for the label the model predicts when null.
     *
     * @throws TelltaleException when the model has no such label
     */
    public Explanation explain(Document doc, String labelOrNull) {
        long start = System.nanoTime();
        TermIndex index = TermIndex.of(doc.text(), analyzer, settings.unit(), settings.maxUnits());
        int d = index.size();
        List<String> notes = new ArrayList<>();
        if (!index.note().isEmpty()) {
            notes.add(index.note());
        }
        ProbeRandom random = ProbeRandom.forDocument(settings.seed(), doc.id());
        ProbeRandom sampling = random.split();
        ProbeSet probes = new ProbeSet(doc.id(), index, masker, classifier, worthPreparing(index) ? probeScoring : null);
        boolean shapley = settings.weighting() == Weighting.SHAPLEY;
        boolean exact = d <= MAX_EXACT_UNITS && (1L << d) <= settings.budget();
        double[] counts = settings.sampling() == Sampling.KERNEL && d > 0
                ? ProbeSampler.matchedCounts(fitter.kernel(), d) : null;

        List<BitSet> fixed = new ArrayList<>();
        fixed.add(new BitSet());
        if (exact) {
            probes.add(ProbeSampler.enumerate(d));
        } else {
            if (shapley) {
                BitSet all = new BitSet(d);
                all.set(0, d);
                fixed.add(all);
            }
            int first = settings.adaptive() ? Math.min(FIRST_ROUND, settings.probeCap()) : settings.probes();
            List<BitSet> round = new ArrayList<>(fixed);
            round.addAll(ProbeSampler.drawPaired(d, Math.max(0, first - fixed.size()), counts, settings.pairing(), sampling));
            probes.add(round);
        }
        int labelColumn = labelColumn(doc, probes, labelOrNull);
        String label = probes.labels().get(labelColumn);
        int draws = Math.max(1, settings.budget() - 1);
        Target target = TargetValues.resolve(settings.target(), probes.hasLogits(),
                TargetValues.saturatedShare(probes, labelColumn), probes.labels());
        int k = settings.words();
        double resolution = target == Target.LOG_ODDS ? LOG_ODDS_RESOLUTION : PROBABILITY_RESOLUTION;

        double stability = Double.NaN;
        double bandwidth = settings.bandwidth();
        int toGo = -1;
        Surrogate surrogate;
        if (d == 0) {
            notes.add("the analyzer found no units in this document; nothing to explain");
            surrogate = null;
        } else if (exact) {
            notes.add("exact: all " + (1L << d) + " subsets of " + d + " units were enumerated once;"
                    + " the weights carry no sampling uncertainty");
            stability = settings.splitHalf() ? 1.0 : Double.NaN;
            surrogate = fitter.fit(d, probes.rows(), TargetValues.column(probes, labelColumn, target), true, draws);
        } else {
            int[] firstPositions = firstPositions(index);
            Round round = round(d, probes, labelColumn, target, draws, k, resolution, firstPositions);
            while (settings.adaptive() && !round.verdict().settled() && probes.size() < settings.probeCap()) {
                int n = probes.size();
                Separation.Verdict verdict = round.verdict();
                double wanted = Double.isFinite(verdict.probesNeeded()) ? 1.1 * verdict.probesNeeded() : 2.0 * n;
                int grown = (int) Math.min(settings.probeCap(), Math.max(n + FIRST_ROUND, Math.min(4.0 * n, wanted)));
                probes.add(ProbeSampler.drawPaired(d, grown - n, counts, settings.pairing(), sampling));
                round = round(d, probes, labelColumn, target, draws, k, resolution, firstPositions);
            }
            Separation.Verdict verdict = round.verdict();
            BandwidthChoice.Choice choice = round.choice();
            toGo = verdict.settled() ? 0 : Double.isFinite(verdict.probesNeeded())
                    ? (int) Math.min(Integer.MAX_VALUE, Math.ceil(verdict.probesNeeded() - probes.size())) : -1;
            if (settings.adaptive() && !verdict.settled()) {
                notes.add(String.format(java.util.Locale.ROOT,
                        "the probe cap of %d was reached before the reported units were separated from the next one%s",
                        settings.probeCap(), toGo > 0 ? String.format(java.util.Locale.ROOT,
                                " (about %d more probes would be needed)", toGo) : ""));
            }
            if (round.additive() != null) {
                surrogate = AdditiveRanking.first(round.additive(), k);
                notes.add(AdditiveRanking.note(d, surrogate.r2()));
            } else {
                // Forward selection is greedy, so its first K of K + 1 are its choice of K; the lasso
                // path may drop a unit on the way to K + 1, so it is run again for K.
                int[] next = round.next();
                int[] reported = settings.select() == Selection.FORWARD
                        ? java.util.Arrays.copyOf(next, Math.min(k, next.length)) : fitter.select(round.design(), k);
                surrogate = fitter.fitUnits(round.design(), reported);
            }
            bandwidth = choice.bandwidth();
            if (settings.splitHalf()) {
                stability = stability(d, probes, TargetValues.column(probes, labelColumn, target), fixed.size());
            }
        }

        double[] original = probes.scores(0);
        double targetValue = TargetValues.value(probes, 0, labelColumn, target, probes.hasLogits());
        double saturated = TargetValues.saturatedShare(probes, labelColumn);
        String source = target != Target.LOG_ODDS ? "probabilities"
                : probes.hasLogits() ? "logits" : "clipped probabilities";
        saturationNotes(notes, target, source, saturated, settings.target());
        Map<String, Double> scores = new LinkedHashMap<>();
        for (int j = 0; j < original.length; j++) {
            scores.put(probes.labels().get(j), original[j]);
        }
        List<Explanation.TermWeight> terms = new ArrayList<>();
        Explanation.Fit fit;
        if (surrogate == null) {
            fit = new Explanation.Fit(targetValue, 1.0, targetValue);
        } else {
            fit = new Explanation.Fit(surrogate.intercept(), surrogate.r2(), surrogate.prediction());
            List<Unit> units = index.units();
            int[] selected = surrogate.units();
            double[] weights = surrogate.weights();
            double[] low = surrogate.low();
            double[] high = surrogate.high();
            for (int i = 0; i < selected.length; i++) {
                Unit unit = units.get(selected[i]);
                terms.add(new Explanation.TermWeight(unit.term(), weights[i], low[i], high[i], unit.spans()));
            }
            terms.sort(Comparator.comparingDouble((Explanation.TermWeight t) -> -Math.abs(t.weight()))
                    .thenComparing(t -> t.spans().isEmpty() ? 0 : t.spans().get(0).start()));
        }
        String selection = settings.allUnits() ? "all" : settings.select().key();
        Explanation.Method method = new Explanation.Method(settings.unit().key(), settings.weighting().key(),
                selection, bandwidth, settings.ridge(), settings.allUnits() ? d : settings.words(),
                settings.seed(), settings.analyzer(), settings.filler(), settings.level(), d, probes.calls(), exact,
                stability, exact || d == 0 ? "exact" : "sandwich", target.key(), source, targetValue, saturated, toGo,
                settings.sampling().key(), notes);
        long total = (System.nanoTime() - start) / 1_000_000;
        return new Explanation(doc.id(), label, original[labelColumn], predicted(original, probes.labels()),
                scores, probes.size(), fit, terms, new Explanation.Timing(probes.modelMillis(), total), doc.text(),
                doc.label(), method);
    }

    /** Where each unit first occurs in the text: the order in which tied units are reported. */
    private static int[] firstPositions(TermIndex index) {
        List<Unit> units = index.units();
        int[] out = new int[units.size()];
        for (int j = 0; j < out.length; j++) {
            out[j] = units.get(j).spans().isEmpty() ? Integer.MAX_VALUE : units.get(j).spans().get(0).start();
        }
        return out;
    }

    /**
     * Whether to ask the model to score this document's masks itself: when it offers to and
     * preparing (an analysis per unit and a few checks) costs fewer analyses than the probes.
     */
    private boolean worthPreparing(TermIndex index) {
        int d = index.size();
        return probeScoring != null && d > 0 && d + PREPARATION_CHECKS < settings.budget();
    }

    /** An upper bound of the analyses beyond one per unit that a model spends preparing its mask scorer. */
    static final int PREPARATION_CHECKS = 16;

    /** Effects below these are negligible for the stopping rule: half a percentage point, 0.05 in log-odds. */
    static final double PROBABILITY_RESOLUTION = 0.005;
    static final double LOG_ODDS_RESOLUTION = 0.05;

    /** The sampled probes as the fit sees them, reweighted to a bandwidth chosen from them when asked. */
    private BandwidthChoice.Choice design(int d, ProbeSet probes, int labelColumn, Target target, int draws, int k) {
        double[] y = TargetValues.column(probes, labelColumn, target);
        SurrogateFit.Design design = fitter.design(d, probes.rows(), y, false, draws);
        if (!settings.chooseBandwidth() || settings.weighting() != Weighting.COSINE) {
            return new BandwidthChoice.Choice(settings.bandwidth(), design, new double[0]);
        }
        return BandwidthChoice.choose(fitter, design, probes.rows(), y, draws, settings.bandwidth(), k);
    }

    /**
     * What one round of probes gives: the design (reweighted to the chosen bandwidth), and either
     * the fit on every unit with its K + 1 largest weights when the model is additive here
     * ({@link AdditiveRanking}), or the selection's K units and the one it would add next; and
     * whether the K reported units stand apart from that next one.
     */
    private record Round(BandwidthChoice.Choice choice, Surrogate additive, int[] next, Separation.Verdict verdict) {
        SurrogateFit.Design design() {
            return choice.design();
        }
    }

    private Round round(int d, ProbeSet probes, int labelColumn, Target target, int draws, int k, double resolution,
            int[] firstPositions) {
        BandwidthChoice.Choice choice = design(d, probes, labelColumn, target, draws, k);
        SurrogateFit.Design design = choice.design();
        Surrogate additive = AdditiveRanking.surrogate(design, k, k >= d ? k : k + 1, fitter.z(), firstPositions);
        if (additive != null) {
            return new Round(choice, additive, null,
                    Separation.of(additive, Math.min(k, additive.units().length), fitter.z(), resolution, design.rows()));
        }
        int[] next = selectBeyond(design, k);
        return new Round(choice, null, next, verdict(design, next, k, resolution));
    }

    /** The K units the selection reports and the one it would add next (every unit when K ≥ d). */
    private int[] selectBeyond(SurrogateFit.Design design, int k) {
        return fitter.select(design, k >= design.d ? k : k + 1);
    }

    /** Whether the K reported units stand apart from the next one: one fit on K + 1 units. */
    private Separation.Verdict verdict(SurrogateFit.Design design, int[] chosen, int k, double resolution) {
        int reported = Math.min(k, chosen.length);
        Surrogate fit = fitter.fitUnits(design, chosen);
        return Separation.of(fit, reported, fitter.z(), resolution, design.rows());
    }

    private static void saturationNotes(List<String> notes, Target target, String source, double saturated,
            Target asked) {
        if (saturated <= TargetValues.SATURATED_SHARE) {
            return;
        }
        String share = String.format(java.util.Locale.ROOT, "%.0f %%", 100 * saturated);
        if (target == Target.PROBABILITY) {
            notes.add("saturated scores: " + share + " of the probes scored within 1e-6 of 0 or 1, so the"
                    + " probability hardly moves and its explanation shows little; explain the log-odds"
                    + " (target log-odds), best with the model's logits exposed to Telltale");
        } else if ("clipped probabilities".equals(source)) {
            notes.add("saturated scores: " + share + " of the probes scored within 1e-6 of 0 or 1; the log-odds"
                    + " were computed from probabilities clipped to [1e-12, 1 - 1e-12], which hides what lies"
                    + " beyond; expose the model's logits to Telltale for a faithful explanation");
        } else {
            notes.add("saturated scores: " + share + " of the probes scored within 1e-6 of 0 or 1; explained"
                    + " through the model's logits, which keep what the probabilities round away");
        }
    }
    private static int labelColumn(Document doc, ProbeSet probes, String labelOrNull) {
        List<String> labels = probes.labels();
        if (labelOrNull == null) {
            return labels.indexOf(predicted(probes.scores(0), labels));
        }
        int column = labels.indexOf(labelOrNull);
        if (column < 0) {
            throw new TelltaleException("document " + doc.id() + ": the model has no label '" + labelOrNull
                    + "' (its labels: " + String.join(", ", labels) + ")");
        }
        return column;
    }

    private static String predicted(double[] row, List<String> labels) {
        int best = 0;
        for (int j = 1; j < row.length; j++) {
            if (row[j] > row[best]) {
                best = j;
            }
        }
        return labels.get(best);
    }

    /**
     * Split-half agreement: the drawn probes are dealt alternately into two halves (the fixed
     * probes go to both), a surrogate is fitted on each, and the result is the share of the top
     * K terms (by absolute weight) that both halves select with the same sign.
     */
    private double stability(int d, ProbeSet probes, double[] y, int fixedCount) {
        List<BitSet> rows = probes.rows();
        List<BitSet> a = new ArrayList<>();
        List<BitSet> b = new ArrayList<>();
        List<Double> ya = new ArrayList<>();
        List<Double> yb = new ArrayList<>();
        for (int i = 0; i < rows.size(); i++) {
            boolean toA = i < fixedCount || (i - fixedCount) % 2 == 0;
            boolean toB = i < fixedCount || (i - fixedCount) % 2 == 1;
            if (toA) {
                a.add(rows.get(i));
                ya.add(y[i]);
            }
            if (toB) {
                b.add(rows.get(i));
                yb.add(y[i]);
            }
        }
        Surrogate sa = fitter.fit(d, a, ya.stream().mapToDouble(Double::doubleValue).toArray(), false, 1);
        Surrogate sb = fitter.fit(d, b, yb.stream().mapToDouble(Double::doubleValue).toArray(), false, 1);
        return agreement(sa, sb, settings.words());
    }

    /** The share of the top-k units of two surrogates that appear in both with the same sign. */
    static double agreement(Surrogate a, Surrogate b, int k) {
        Map<Integer, Double> topA = top(a, k);
        Map<Integer, Double> topB = top(b, k);
        int size = Math.max(topA.size(), topB.size());
        if (size == 0) {
            return 1.0;
        }
        int agree = 0;
        for (Map.Entry<Integer, Double> e : topA.entrySet()) {
            Double other = topB.get(e.getKey());
            if (other != null && Math.signum(other) == Math.signum(e.getValue())) {
                agree++;
            }
        }
        return (double) agree / size;
    }

    private static Map<Integer, Double> top(Surrogate s, int k) {
        int[] units = s.units();
        double[] weights = s.weights();
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < units.length; i++) {
            order.add(i);
        }
        order.sort(Comparator.<Integer>comparingDouble(i -> -Math.abs(weights[i])).thenComparingInt(i -> units[i]));
        Map<Integer, Double> out = new LinkedHashMap<>();
        for (int i : order.subList(0, Math.min(k, order.size()))) {
            out.put(units[i], weights[i]);
        }
        return out;
    }
}
