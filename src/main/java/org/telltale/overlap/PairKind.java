package org.telltale.overlap;

/** Which corpora the two documents of a pair come from. */
public enum PairKind {
    /** first from train, second from test: the overlap that inflates accuracy. */
    TRAIN_TEST,
    /** both from train. */
    WITHIN_TRAIN,
    /** both from test. */
    WITHIN_TEST
}
