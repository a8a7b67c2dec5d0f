package org.telltale.audit;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * What each job of a {@link ScrubPlan} did to the documents it ran on: sums ({@link ScrubTest.Effect}),
 * so that the effects of parts — batches, chunks of a corpus, Spark partitions — merge into those
 * of the whole, in any order, to the last bit.
 *
 * <p>Immutable; serializable, so that a distributed front can reduce it.
 */
public final class ScrubEffects implements Serializable {
    private static final long serialVersionUID = 1L;

    private final List<ScrubTest.Effect> effects;

    ScrubEffects(List<ScrubTest.Effect> effects) {
        this.effects = List.copyOf(effects);
    }

    /** Nothing rescored yet: the neutral part for {@code plan}. */
    public static ScrubEffects none(ScrubPlan plan) {
        return new ScrubEffects(Collections.nCopies(plan.size(), ScrubTest.Effect.NONE));
    }

    /** The effects of both parts together; both must come from the same plan. */
    public ScrubEffects merge(ScrubEffects other) {
        if (other.effects.size() != effects.size()) {
            throw new IllegalArgumentException("scrub effects of plans of " + effects.size() + " and "
                    + other.effects.size() + " jobs");
        }
        List<ScrubTest.Effect> sum = new ArrayList<>(effects.size());
        for (int i = 0; i < effects.size(); i++) {
            sum.add(effects.get(i).plus(other.effects.get(i)));
        }
        return new ScrubEffects(sum);
    }

    /** The effect of job {@code number}. */
    ScrubTest.Effect of(int number) {
        return effects.get(number);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ScrubEffects e && effects.equals(e.effects);
    }

    @Override
    public int hashCode() {
        return effects.hashCode();
    }

    @Override
    public String toString() {
        return "ScrubEffects" + effects;
    }
}
