package org.telltale.connect;

import java.util.Locale;

/** What the numbers a model answers are: probabilities already, or logits that need a softmax. */
public enum ScoreKind {
    PROBABILITIES,
    LOGITS;

    public String cliName() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static ScoreKind byName(String name) {
        for (ScoreKind k : values()) {
            if (k.cliName().equalsIgnoreCase(name.strip())) {
                return k;
            }
        }
        throw new IllegalArgumentException("unknown score kind '" + name + "' (expected probabilities or logits)");
    }
}
