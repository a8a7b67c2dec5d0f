package org.telltale.audit;

import java.util.ArrayList;
import java.util.List;
import org.telltale.UnknownKeyException;

/**
 * The artefacts one row of the scrub test removed together: those of one {@link ArtefactKind}, or
 * all of them at once ({@link #ALL}). audit.json spells it as the kind's key or {@code "all"}.
 *
 * @param kind the kind scrubbed, or {@code null} for all artefacts at once
 */
public record ScrubGroup(ArtefactKind kind) {
    /** Every artefact at once. */
    public static final ScrubGroup ALL = new ScrubGroup(null);
    private static final String ALL_KEY = "all";

    /** The artefacts of one kind. */
    public static ScrubGroup of(ArtefactKind kind) {
        if (kind == null) {
            throw new NullPointerException("kind");
        }
        return new ScrubGroup(kind);
    }

    /** Whether this row removed every artefact at once. */
    public boolean all() {
        return kind == null;
    }

    /** The spelling in audit.json and the reports: the kind's key, or {@code "all"}. */
    public String key() {
        return kind == null ? ALL_KEY : kind.key();
    }

    /** @throws UnknownKeyException for anything but a kind's key or {@code "all"}, listing them */
    public static ScrubGroup fromKey(String key) {
        if (ALL_KEY.equals(key)) {
            return ALL;
        }
        List<String> accepted = new ArrayList<>();
        for (ArtefactKind k : ArtefactKind.values()) {
            if (k.key().equals(key)) {
                return of(k);
            }
            accepted.add(k.key());
        }
        accepted.add(ALL_KEY);
        throw new UnknownKeyException("scrub group", key, accepted);
    }

    @Override
    public String toString() {
        return key();
    }
}
