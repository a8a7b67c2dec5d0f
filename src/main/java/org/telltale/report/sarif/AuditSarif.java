package org.telltale.report.sarif;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.telltale.audit.ArtefactIdentity;
import org.telltale.audit.Baseline;
import org.telltale.audit.ArtefactKind;
import org.telltale.audit.AuditResult;
import org.telltale.audit.AuditResult.Artefact;
import org.telltale.audit.AuditSettings;
import org.telltale.audit.Severity;
import org.telltale.report.sarif.SarifLog.Level;
import org.telltale.report.sarif.SarifLog.Location;
import org.telltale.report.sarif.SarifLog.Result;
import org.telltale.report.sarif.SarifLog.Rule;

/**
 * An audit as a SARIF log: a rule per artefact kind that occurs, a result per artefact with its
 * level from the severity, a message naming pattern, label, support and its own scrub result, the
 * corpus lines of a few example documents, and the artefact's {@link ArtefactIdentity} as its
 * partial fingerprint; the run's settings in the run's property bag.
 */
public final class AuditSarif {
    /** Example documents given as locations per result; viewers show the first as the place. */
    public static final int EXAMPLES = 3;

    private AuditSarif() {
    }

    /**
     * @param audit     the audit
     * @param version   Telltale's version
     * @param corpusUri the corpus file as a URI reference ({@link SarifWriter#uri})
     * @param places    the locations of example documents by id; a document missing here points at
     *                  the corpus file as a whole
     */
    public static SarifLog of(AuditResult audit, String version, String corpusUri, Map<String, Location> places) {
        return of(audit, version, corpusUri, places, null);
    }

    /**
     * As above, each result carrying its {@code baselineState} against {@code since} (§3.27.24:
     * {@code new} or {@code unchanged}; {@code null}: no baseline). Resolved artefacts are not
     * results, since viewers would show them as open; the run's property bag lists them.
     */
    public static SarifLog of(AuditResult audit, String version, String corpusUri, Map<String, Location> places,
            Baseline.Comparison since) {
        Set<ArtefactKind> kinds = EnumSet.noneOf(ArtefactKind.class);
        audit.artefacts().forEach(f -> kinds.add(f.kind()));
        List<Rule> rules = kinds.stream().map(SarifRules::of).toList();
        List<Result> results = new ArrayList<>();
        for (Artefact f : audit.artefacts()) {
            results.add(result(f, corpusUri, places, since));
        }
        String corpus = audit.summary().corpus();
        Map<String, Object> settings = settings(audit.summary());
        if (since != null) {
            settings = new LinkedHashMap<>(settings);
            Map<String, Object> baseline = new LinkedHashMap<>();
            baseline.put("file", since.baseline());
            baseline.put("new", since.added().size());
            baseline.put("unchanged", since.unchanged().size());
            baseline.put("resolved", since.resolved().stream().map(e -> {
                Map<String, Object> r = new LinkedHashMap<>();
                r.put("identity", e.identity().fingerprint());
                r.put("kind", e.identity().kind());
                r.put("label", e.identity().label());
                r.put("pattern", e.identity().pattern());
                return r;
            }).toList());
            settings.put("baseline", baseline);
        }
        return new SarifLog(new SarifLog.Tool("Telltale", version, null), rules, results, settings,
                "telltale-audit/" + corpus + "/");
    }

    /** The document ids whose places {@link #of} wants: the first examples of every artefact. */
    public static Set<String> exampleIds(AuditResult audit) {
        Set<String> ids = new java.util.LinkedHashSet<>();
        for (Artefact f : audit.artefacts()) {
            f.examples().stream().limit(EXAMPLES).forEach(x -> ids.add(x.id()));
        }
        return ids;
    }

    /** SARIF level of a severity: high is an error, medium a warning, low a note. */
    public static Level level(Severity severity) {
        return switch (severity) {
            case HIGH -> Level.ERROR;
            case MEDIUM -> Level.WARNING;
            case LOW -> Level.NOTE;
        };
    }

    private static Result result(Artefact f, String corpusUri, Map<String, Location> places, Baseline.Comparison since) {
        ArtefactIdentity identity = ArtefactIdentity.of(f);
        List<Location> locations = new ArrayList<>();
        f.examples().stream().limit(EXAMPLES).forEach(x ->
                locations.add(places.getOrDefault(x.id(), new Location(corpusUri, 0, x.id()))));
        if (locations.isEmpty()) {
            locations.add(new Location(corpusUri, 0, null));
        }
        Map<String, Object> props = new LinkedHashMap<>();
        props.put("identity", identity.fingerprint());
        props.put("id", f.id());
        props.put("kind", f.kind().key());
        props.put("label", f.label());
        props.put("pattern", identity.pattern());
        props.put("terms", f.termNames());
        props.put("severity", f.severity().key());
        props.put("support", f.support());
        props.put("importance", f.importance());
        props.put("association", f.association());
        props.put("confirmed", f.confirmed());
        props.put("scrubDocuments", f.scrub().documents());
        props.put("scrubFlips", f.scrub().flips());
        props.put("scrubDrop", f.scrub().scoreDrop());
        if (f.policy() != null) {
            props.put("policy", f.policy().key());
        }
        SarifLog.Suppression suppression = f.suppressed() ? new SarifLog.Suppression(f.policyNote()) : null;
        return new Result(SarifRules.id(f.kind()), level(f.severity()), message(f),
                Map.of(SarifWriter.IDENTITY_KEY, identity.fingerprint()), locations, suppression, baselineState(since, identity),
                props);
    }

    private static SarifLog.BaselineState baselineState(Baseline.Comparison since, ArtefactIdentity identity) {
        if (since == null) {
            return null;
        }
        return since.stateOf(identity) == Baseline.State.NEW ? SarifLog.BaselineState.NEW : SarifLog.BaselineState.UNCHANGED;
    }

    static String message(Artefact f) {
        String scrub = f.confirmed()
                ? String.format(Locale.ROOT, "removing it alone confirms it (%d of %d explained documents flipped, score "
                        + "drop %.3f)", f.scrub().flips(), f.scrub().documents(), f.scrub().scoreDrop())
                : String.format(Locale.ROOT, "removing it alone did not confirm it (%d of %d flipped, score drop %.3f)",
                        f.scrub().flips(), f.scrub().documents(), f.scrub().scoreDrop());
        return String.format(Locale.ROOT, "%s %s artefact '%s' (terms: %s) pushes the model towards '%s'; its terms occur "
                        + "in up to %d corpus documents; %s.", capital(f.severity().key()), f.kind().key(),
                oneLine(f.pattern()), oneLine(String.join(", ", f.termNames())), f.label(), f.support(), scrub);
    }

    private static Map<String, Object> settings(AuditResult.Summary s) {
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("documents", s.documents());
        out.put("explained", s.explained());
        out.put("labels", s.labels());
        out.put("accuracy", s.accuracy());
        out.put("skipped", s.skipped());
        out.put("model", s.model());
        out.put("corpus", s.corpus());
        out.put("seed", s.seed());
        AuditSettings a = s.settings();
        Map<String, Object> settings = new LinkedHashMap<>();
        settings.put("sample", a.sample());
        settings.put("probes", a.probes());
        settings.put("words", a.words());
        settings.put("picks", a.picks());
        settings.put("scrubAll", a.scrubAll());
        settings.put("failOn", a.failOn().key());
        settings.put("alpha", a.alpha());
        settings.put("batch", a.batch());
        settings.put("analyzer", a.analyzer());
        settings.put("policy", a.policy());
        out.put("settings", settings);
        out.put("associationBasis", s.associationBasis().key());
        out.put("zThreshold", s.zThreshold());
        out.put("termsTested", s.termsTested());
        out.put("caution", "Explanations are local approximations of the model, not causes; a clean audit does not "
                + "certify a model. Results name documents of the corpus, which may contain personal data.");
        return out;
    }

    private static String capital(String word) {
        return word.isEmpty() ? word : word.substring(0, 1).toUpperCase(Locale.ROOT) + word.substring(1);
    }

    private static String oneLine(String text) {
        return text.replace('\n', ' ').replace('\r', ' ');
    }
}
