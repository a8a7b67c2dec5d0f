package org.telltale.model;

import java.util.Locale;
import org.telltale.EnumKeys;
import org.telltale.UnknownKeyException;

/** The built-in learning algorithms and their names on the command line and in model files. */
public enum Algorithm {
    /** Multinomial naive Bayes with additive smoothing. */
    BAYES,
    /** Multinomial logistic regression with an L2 penalty, fitted by L-BFGS. */
    LOGISTIC;

    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** @throws UnknownKeyException for a name other than {@code bayes} or {@code logistic} */
    public static Algorithm fromKey(String key) {
        return EnumKeys.parse("algorithm", key, values(), Algorithm::key);
    }
}
