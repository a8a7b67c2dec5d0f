package org.telltale.model;

import java.util.BitSet;
import java.util.List;

/**
 * Scores masks of one document, each given by the units it removes, as the model would score the
 * masked texts: probabilities with the logits behind them. Made by {@link ProbeScoring#prepare}.
 *
 * <p>Not thread-safe: one per document.
 */
public interface MaskScorer {

    /** One row per mask, in order. */
    ScoreMatrix score(List<BitSet> removed);
}
