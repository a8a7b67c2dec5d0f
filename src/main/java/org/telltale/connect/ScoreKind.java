package org.telltale.connect;

import java.util.Locale;
import org.telltale.EnumKeys;

/** What the numbers a model answers are: probabilities already, or logits that need a softmax. */
public enum ScoreKind {
    PROBABILITIES,
    LOGITS;

    public String cliName() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Parses {@code probabilities} or {@code logits}, ignoring case; @throws org.telltale.UnknownKeyException otherwise */
    public static ScoreKind byName(String name) {
        return EnumKeys.parse("score kind", name == null ? null : name.strip().toLowerCase(Locale.ROOT), values(),
                ScoreKind::cliName);
    }
}
