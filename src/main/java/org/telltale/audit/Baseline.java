package org.telltale.audit;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;

/**
 * An earlier audit's artefacts, to compare a new audit with: each artefact of the new audit is
 * {@code new} (the earlier audit did not report it) or {@code unchanged} (it did), and each
 * artefact of the earlier audit that the new one no longer reports is {@code resolved}. Two
 * artefacts are the same when their {@link ArtefactIdentity} is equal; severity, support and
 * scores may differ (docs/ci.md, "A baseline").
 *
 * <p>Immutable.
 *
 * @param source  where the earlier audit was read from, as the user named it
 * @param entries the earlier audit's artefacts
 */
public record Baseline(String source, List<Entry> entries) {

    public Baseline {
        Objects.requireNonNull(source, "source");
        entries = List.copyOf(entries);
    }

    /** How an artefact stands against the baseline. */
    public enum State {
        NEW, UNCHANGED, RESOLVED;

        /** The lower-case name used in audit.json, reports and the terminal. */
        public String key() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /**
     * One artefact as the comparison needs it.
     *
     * @param identity   what makes it the same artefact in two audits
     * @param severity   its severity in the audit it comes from
     * @param suppressed whether that audit's policy accepted it
     */
    public record Entry(ArtefactIdentity identity, Severity severity, boolean suppressed) {
        public Entry {
            Objects.requireNonNull(identity, "identity");
            Objects.requireNonNull(severity, "severity");
        }

        /** An artefact of an audit, by its kind, label and pattern. */
        public static Entry of(AuditResult.Artefact artefact) {
            return new Entry(artefact.identity(), artefact.severity(), artefact.suppressed());
        }
    }

    /**
     * The artefacts of {@code audit}, in its order (a version 1 audit.json reads as one artefact per
     * finding, its pattern the term, so an old baseline compares by the same identity it had).
     */
    public static List<Entry> entriesOf(AuditResult audit) {
        return audit.artefacts().stream().map(Entry::of).toList();
    }

    /**
     * The comparison of a new audit with this baseline.
     *
     * @param baseline   where the baseline was read from
     * @param added      the new audit's artefacts the baseline does not hold, in the new audit's order
     * @param unchanged  the new audit's artefacts the baseline holds too, as the new audit reports them
     * @param resolved   the baseline's artefacts the new audit no longer reports, as the baseline reported them
     */
    public record Comparison(String baseline, List<Entry> added, List<Entry> unchanged, List<Entry> resolved) {
        public Comparison {
            Objects.requireNonNull(baseline, "baseline");
            added = List.copyOf(added);
            unchanged = List.copyOf(unchanged);
            resolved = List.copyOf(resolved);
        }

        /** The state of an artefact of the new audit, or {@code RESOLVED} for one only the baseline holds. */
        public State stateOf(ArtefactIdentity identity) {
            if (added.stream().anyMatch(e -> e.identity().equals(identity))) {
                return State.NEW;
            }
            if (unchanged.stream().anyMatch(e -> e.identity().equals(identity))) {
                return State.UNCHANGED;
            }
            if (resolved.stream().anyMatch(e -> e.identity().equals(identity))) {
                return State.RESOLVED;
            }
            throw new IllegalArgumentException("not in either audit: " + identity.canonical().replace('\n', '/'));
        }

        /** What a CI gate counts with a baseline: new artefacts, not suppressed, at least {@code severity}. */
        public List<Entry> gate(Severity severity) {
            return added.stream().filter(e -> !e.suppressed() && e.severity().atLeast(severity)).toList();
        }
    }

    /** Compares the artefacts of a new audit, {@code current}, with this baseline. */
    public Comparison compare(List<Entry> current) {
        Map<ArtefactIdentity, Entry> before = index(entries);
        Map<ArtefactIdentity, Entry> now = index(current);
        List<Entry> added = new ArrayList<>();
        List<Entry> unchanged = new ArrayList<>();
        for (Entry e : now.values()) {
            (before.containsKey(e.identity()) ? unchanged : added).add(e);
        }
        List<Entry> resolved = before.values().stream().filter(e -> !now.containsKey(e.identity())).toList();
        return new Comparison(source, added, unchanged, resolved);
    }

    /** By identity, the first of equal identities kept (an audit reports each artefact once). */
    private static Map<ArtefactIdentity, Entry> index(List<Entry> entries) {
        Map<ArtefactIdentity, Entry> map = new LinkedHashMap<>();
        entries.forEach(e -> map.putIfAbsent(e.identity(), e));
        return map;
    }
}
