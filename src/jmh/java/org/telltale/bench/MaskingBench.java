package org.telltale.bench;

import java.util.BitSet;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.telltale.explain.ProbeRandom;
import org.telltale.explain.ProbeSampler;
import org.telltale.text.Analyzers;
import org.telltale.text.Masker;
import org.telltale.text.TermIndex;
import org.telltale.text.UnitKind;

/**
 * Masking one probe with word units: an invented support ticket of 300 or 5,000 words drawn
 * (seeded) from a 600-word vocabulary, a random set of units removed, filler one space. The
 * score is the time of one masked text. Run by bench/kernels.sh.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class MaskingBench {
    @Param({"300", "5000"})
    public int words;

    private TermIndex index;
    private List<BitSet> probes;
    private final Masker masker = new Masker(" ");
    private int next;

    @Setup
    public void setup() {
        Random random = new Random(20261201L);
        String[] vocabulary = new String[600];
        for (int i = 0; i < vocabulary.length; i++) {
            vocabulary[i] = "ticket" + Integer.toString(i, 36) + (i % 7 == 0 ? "," : "");
        }
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < words; i++) {
            text.append(vocabulary[(int) Math.min(vocabulary.length - 1, Math.abs(random.nextGaussian()) * 150)]);
            text.append(i % 12 == 11 ? ".\n" : " ");
        }
        index = TermIndex.of(text.toString(), Analyzers.standard(), UnitKind.WORD);
        probes = ProbeSampler.draw(index.size(), 256, new ProbeRandom(3L));
    }

    @Benchmark
    public String maskOneProbe() {
        BitSet removed = probes.get(next);
        next = (next + 1) & 255;
        return masker.mask(index, removed);
    }
}
