package org.telltale.demo;

import java.nio.file.Path;

/**
 * The knobs of one demo run.
 *
 * @param out     the output folder
 * @param seed    seed of the corpus, the holdout split and the audit
 * @param size    messages in the generated corpus
 * @param holdout share of each queue held out from training and audited
 * @param sample  messages the audit explains
 * @param probes  probe budget of each explanation
 * @param words   terms each explanation selects
 * @param force   replace an earlier demo in {@code out}
 */
public record DemoSettings(Path out, long seed, int size, double holdout, int sample, int probes, int words,
        boolean force) {

    public static final double DEFAULT_HOLDOUT = 0.3;
    public static final int DEFAULT_SAMPLE = 60;
    public static final int DEFAULT_PROBES = 500;
    public static final int DEFAULT_WORDS = 10;

    public static DemoSettings defaults(Path out) {
        return new DemoSettings(out, SupportCorpusGenerator.DEFAULT_SEED, SupportCorpusGenerator.DEFAULT_SIZE,
                DEFAULT_HOLDOUT, DEFAULT_SAMPLE, DEFAULT_PROBES, DEFAULT_WORDS, false);
    }

    public DemoSettings withCorpus(long newSeed, int newSize) {
        return new DemoSettings(out, newSeed, newSize, holdout, sample, probes, words, force);
    }

    public DemoSettings withForce(boolean newForce) {
        return new DemoSettings(out, seed, size, holdout, sample, probes, words, newForce);
    }

    public DemoSettings withAudit(double newHoldout, int newSample, int newProbes) {
        return new DemoSettings(out, seed, size, newHoldout, newSample, newProbes, words, force);
    }
}
