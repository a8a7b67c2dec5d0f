package org.telltale.explain;

import java.util.Objects;
import org.telltale.text.UnitKind;

/**
 * How explanations are computed. Build from {@link #defaults()} and the {@code with…} methods;
 * every value is checked when the record is made, and errors say which setting and which value.
 *
 * @param words      K, the number of units reported, or {@link #ALL_UNITS} for every unit (no selection)
 * @param probes     the probe budget including probe 0, or {@link #AUTO} to grow it in rounds
 *                   until the reported units are separated (docs/method.md, "The adaptive budget")
 * @param probeCap   the most probes {@link #AUTO} may spend
 * @param unit       what one feature stands for
 * @param select     how the K units are chosen
 * @param bandwidth  σ of the cosine kernel
 * @param weighting  cosine kernel or Shapley kernel
 * @param analyzer   the analyzer name for {@code Analyzers.byName}
 * @param seed       the run seed; each document's stream derives from it and the document id
 * @param filler     written in place of each removed span ("" cuts cleanly)
 * @param ridge      λ of the ridge penalty on the slopes of a sampled fit (exact fits use none)
 * @param level      the coverage of the weight intervals, e.g. 0.95
 * @param target     what the surrogate is fitted to: probability, log-odds, or chosen per document
 * @param sampling   how the number of removed units of a drawn probe is chosen
 * @param splitHalf  also fit each half of the probes and report their agreement (two extra fits)
 * @param maxUnits   the most units one explanation covers; a longer document keeps its most
 *                   frequent words (or first occurrences or lines) and says so in a note
 * @param chooseBandwidth choose σ per document from the probes ({@link BandwidthChoice}), drawing
 *                   them for {@code bandwidth} as the proposal
 * @param pairing    whether drawn probes come in antithetic pairs
 */
public record ExplainSettings(
        int words,
        int probes,
        int probeCap,
        UnitKind unit,
        Selection select,
        double bandwidth,
        Weighting weighting,
        String analyzer,
        long seed,
        String filler,
        double ridge,
        double level,
        Target target,
        Sampling sampling,
        boolean splitHalf,
        int maxUnits,
        boolean chooseBandwidth,
        Pairing pairing) {

    /** The {@link #probes} value that asks for the adaptive budget. */
    public static final int AUTO = 0;
    /** The {@link #words} value that reports every unit, without selection. */
    public static final int ALL_UNITS = Integer.MAX_VALUE;
    /** The fixed budget used unless asked otherwise. */
    public static final int DEFAULT_PROBES = 2000;
    /** σ = 0.25, the proposal the probes are drawn for: see docs/method.md, "Kernels", for why. */
    public static final double DEFAULT_BANDWIDTH = 0.25;
    /** Beyond this many units a document is capped: see docs/method.md, "Long documents". */
    public static final int DEFAULT_MAX_UNITS = 2000;

    public ExplainSettings {
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(select, "select");
        Objects.requireNonNull(weighting, "weighting");
        Objects.requireNonNull(analyzer, "analyzer");
        Objects.requireNonNull(target, "target");
        Objects.requireNonNull(sampling, "sampling");
        Objects.requireNonNull(pairing, "pairing");
        filler = filler == null ? "" : filler;
        if (words < 1) {
            throw new IllegalArgumentException("words must be at least 1: " + words);
        }
        if (probes != AUTO && probes < 2) {
            throw new IllegalArgumentException("probes must be auto or at least 2: " + probes);
        }
        if (probeCap < 2) {
            throw new IllegalArgumentException("probe cap must be at least 2: " + probeCap);
        }
        if (!(bandwidth > 0) || Double.isInfinite(bandwidth)) {
            throw new IllegalArgumentException("bandwidth must be a positive number: " + bandwidth);
        }
        if (!(ridge >= 0) || Double.isInfinite(ridge)) {
            throw new IllegalArgumentException("ridge penalty must be zero or positive: " + ridge);
        }
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("interval level must lie strictly between 0 and 1: " + level);
        }
        if (maxUnits < 1) {
            throw new IllegalArgumentException("unit cap must be at least 1: " + maxUnits);
        }
    }

    /**
     * Ten words, 2,000 probes, word units, forward selection, cosine kernel with the removed count
     * sampled to match σ = 0.25 and σ then chosen per document from the probes
     * ({@link BandwidthChoice}), seed 1.
     */
    public static ExplainSettings defaults() {
        return new ExplainSettings(10, DEFAULT_PROBES, 4000, UnitKind.WORD, Selection.FORWARD, DEFAULT_BANDWIDTH,
                Weighting.COSINE, "standard", 1L, "", 1.0, 0.95, Target.AUTO, Sampling.KERNEL, false,
                DEFAULT_MAX_UNITS, true, Pairing.NONE);
    }

    public boolean adaptive() {
        return probes == AUTO;
    }

    /** True when every unit is reported and no selection runs. */
    public boolean allUnits() {
        return words == ALL_UNITS;
    }

    /** The most probes this explanation may spend. */
    public int budget() {
        return adaptive() ? probeCap : probes;
    }

    public ExplainSettings withWords(int v) {
        return new ExplainSettings(v, probes, probeCap, unit, select, bandwidth, weighting, analyzer, seed, filler, ridge, level, target, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withProbes(int v) {
        return new ExplainSettings(words, v, probeCap, unit, select, bandwidth, weighting, analyzer, seed, filler, ridge, level, target, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withProbeCap(int v) {
        return new ExplainSettings(words, probes, v, unit, select, bandwidth, weighting, analyzer, seed, filler, ridge, level, target, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withUnit(UnitKind v) {
        return new ExplainSettings(words, probes, probeCap, v, select, bandwidth, weighting, analyzer, seed, filler, ridge, level, target, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withSelect(Selection v) {
        return new ExplainSettings(words, probes, probeCap, unit, v, bandwidth, weighting, analyzer, seed, filler, ridge, level, target, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withBandwidth(double v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, v, weighting, analyzer, seed, filler, ridge, level, target, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withWeighting(Weighting v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, bandwidth, v, analyzer, seed, filler, ridge, level, target, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withAnalyzer(String v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, bandwidth, weighting, v, seed, filler, ridge, level, target, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withSeed(long v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, bandwidth, weighting, analyzer, v, filler, ridge, level, target, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withFiller(String v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, bandwidth, weighting, analyzer, seed, v, ridge, level, target, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withRidge(double v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, bandwidth, weighting, analyzer, seed, filler, v, level, target, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withLevel(double v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, bandwidth, weighting, analyzer, seed, filler, ridge, v, target, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withTarget(Target v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, bandwidth, weighting, analyzer, seed, filler, ridge, level, v, sampling, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withSampling(Sampling v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, bandwidth, weighting, analyzer, seed, filler, ridge, level, target, v, splitHalf, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withSplitHalf(boolean v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, bandwidth, weighting, analyzer, seed, filler, ridge, level, target, sampling, v, maxUnits, chooseBandwidth, pairing);
    }

    public ExplainSettings withChooseBandwidth(boolean v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, bandwidth, weighting, analyzer, seed, filler, ridge, level, target, sampling, splitHalf, maxUnits, v, pairing);
    }

    public ExplainSettings withPairing(Pairing v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, bandwidth, weighting, analyzer, seed, filler, ridge, level, target, sampling, splitHalf, maxUnits, chooseBandwidth, v);
    }

    public ExplainSettings withMaxUnits(int v) {
        return new ExplainSettings(words, probes, probeCap, unit, select, bandwidth, weighting, analyzer, seed, filler, ridge, level, target, sampling, splitHalf, v, chooseBandwidth, pairing);
    }
}
