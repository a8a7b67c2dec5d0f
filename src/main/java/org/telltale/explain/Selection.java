package org.telltale.explain;

import java.util.Locale;
import org.telltale.EnumKeys;

/**
 * How the K reported units are chosen before the weighted refit. Reporting every unit, without a
 * selection, is asked for by {@code --words all} ({@link ExplainSettings#ALL_UNITS}), not here.
 */
public enum Selection {
    /** Forward stepwise selection: add the unit that most reduces the weighted residual sum of squares. */
    FORWARD("forward"),
    /** The first K units to enter the lasso path, computed by least angle regression. */
    LASSO("lasso");

    private final String key;

    Selection(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    public static Selection fromKey(String key) {
        return EnumKeys.parse("selection", key == null ? null : key.strip().toLowerCase(Locale.ROOT), values(), Selection::key);
    }
}
