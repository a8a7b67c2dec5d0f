package org.telltale.audit;

import java.util.Locale;
import org.telltale.EnumKeys;
import org.telltale.UnknownKeyException;

/** The labels a term's association is measured against (docs/audit.md, "Association statistics"). */
public enum AssociationBasis {
    /** The gold labels: every document carries one. */
    GOLD,
    /** The model's predictions: some document has no gold label. */
    PREDICTED;

    /** The basis of a corpus in which every document carries a gold label ({@code gold}) or not. */
    public static AssociationBasis of(boolean gold) {
        return gold ? GOLD : PREDICTED;
    }

    /** The lower-case name used in JSON and in reports. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** @throws UnknownKeyException for a name other than {@code gold} or {@code predicted} */
    public static AssociationBasis fromKey(String key) {
        return EnumKeys.parse("association basis", key, values(), AssociationBasis::key);
    }
}
