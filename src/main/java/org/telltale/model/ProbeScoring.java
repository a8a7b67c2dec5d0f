package org.telltale.model;

import org.telltale.text.Masker;
import org.telltale.text.TermIndex;

/**
 * What a classifier may offer beyond {@link TextClassifier}: scoring the probes of one document
 * from the units they remove, without building, analysing and vectorising each masked text. Only
 * a model that computes its own features can offer it (the built-in models); no connector does,
 * so every model service is probed through its texts.
 *
 * <p>An offer must be exact: the scores of a mask equal, to the last bit, what {@link
 * TextClassifier#score} answers for the masked text. A model that cannot show that for a
 * document declines, and the document is probed through its texts.
 */
public interface ProbeScoring {

    /**
     * A scorer of the masks of {@code index} as {@code masker} would cut them, or {@code null}
     * when this model cannot score them exactly for this document.
     */
    MaskScorer prepare(TermIndex index, Masker masker);
}
