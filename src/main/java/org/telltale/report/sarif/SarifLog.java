package org.telltale.report.sarif;

import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * What one SARIF 2.1.0 log says, in the few terms Telltale needs: the tool, its rules, the
 * results with their identity, level, message and locations, and the run's settings. Any kind
 * of result (today's audit findings, artefacts, a comparison with a baseline) is mapped into this
 * model, and {@link SarifWriter} turns it into the standard's JSON (OASIS SARIF 2.1.0, errata 01).
 *
 * <p>Immutable; collections are copied on construction.
 *
 * @param tool       the tool that produced the results
 * @param rules      the rules results refer to, in the order they are written
 * @param results    the results, in report order
 * @param settings   the run's settings, written as the run's property bag (§3.8) under "telltale"
 * @param automation the run's automation id (§3.17.3), e.g. {@code telltale-audit/mailbox.jsonl/},
 *                   or {@code null}
 */
public record SarifLog(Tool tool, List<Rule> rules, List<Result> results, Map<String, Object> settings,
        String automation) {

    public SarifLog {
        Objects.requireNonNull(tool, "tool");
        rules = List.copyOf(rules);
        results = List.copyOf(results);
        settings = settings == null ? Map.of() : java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(settings));
        for (Result r : results) {
            if (rules.stream().noneMatch(rule -> rule.id().equals(r.ruleId()))) {
                throw new IllegalArgumentException("result refers to rule '" + r.ruleId() + "', which the log does not define");
            }
        }
    }

    /** §3.19: the tool component that ran. */
    public record Tool(String name, String version, String informationUri) {
        public Tool {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(version, "version");
        }
    }

    /** §3.58.6 / §3.27.10: how serious a result is. */
    public enum Level {
        ERROR("error"), WARNING("warning"), NOTE("note"), NONE("none");

        private final String key;

        Level(String key) {
            this.key = key;
        }

        /** The value SARIF writes. */
        public String key() {
            return key;
        }
    }

    /** §3.27.24: a result's state against a baseline log. */
    public enum BaselineState {
        NEW("new"), UNCHANGED("unchanged"), UPDATED("updated"), ABSENT("absent");

        private final String key;

        BaselineState(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }

    /**
     * §3.49: a rule (reportingDescriptor).
     *
     * @param id               stable, opaque id results refer to
     * @param name             a readable PascalCase name
     * @param shortDescription one sentence
     * @param fullDescription  what the rule finds
     * @param help             how to fix what it finds, as plain text
     * @param helpMarkdown     the same help as Markdown
     * @param level            the default level of its results
     */
    public record Rule(String id, String name, String shortDescription, String fullDescription, String help,
            String helpMarkdown, Level level) {
        public Rule {
            Objects.requireNonNull(id, "id");
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(shortDescription, "shortDescription");
            Objects.requireNonNull(fullDescription, "fullDescription");
            Objects.requireNonNull(help, "help");
            Objects.requireNonNull(level, "level");
        }
    }

    /**
     * §3.27: one result.
     *
     * @param ruleId        the rule it belongs to
     * @param level         its level
     * @param message       what a reader sees first (plain text)
     * @param fingerprints  stable identity for viewers that track a result across runs
     *                      (§3.27.17 partialFingerprints: key with a version suffix, value)
     * @param locations     where it shows; the first is the primary location
     * @param suppression   the reviewer's reason when the result is suppressed, or {@code null}
     * @param baselineState its state against a baseline, or {@code null} when there was none
     * @param properties    further facts, written as its property bag
     */
    public record Result(String ruleId, Level level, String message, Map<String, String> fingerprints,
            List<Location> locations, Suppression suppression, BaselineState baselineState,
            Map<String, Object> properties) {
        public Result {
            Objects.requireNonNull(ruleId, "ruleId");
            Objects.requireNonNull(level, "level");
            Objects.requireNonNull(message, "message");
            fingerprints = fingerprints == null ? Map.of()
                    : java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(fingerprints));
            locations = List.copyOf(locations);
            properties = properties == null ? Map.of()
                    : java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(properties));
        }
    }

    /** §3.34: a suppression a reviewer decided outside the tool (kind {@code external}). */
    public record Suppression(String justification) {
    }

    /**
     * §3.28: where a result shows: a file and a line in it, and a named logical place.
     *
     * @param uri     the file, as a URI reference (relative to where the tool ran, or absolute)
     * @param line    the 1-based line, or 0 when the location names the whole file
     * @param logical the logical location's name (a document id), or {@code null}
     */
    public record Location(String uri, long line, String logical) {
        public Location {
            Objects.requireNonNull(uri, "uri");
            try {
                new java.net.URI(uri);
            } catch (java.net.URISyntaxException e) {
                throw new IllegalArgumentException("not a URI reference (RFC 3986): " + uri, e);
            }
            if (line < 0) {
                throw new IllegalArgumentException("line must be 0 (whole file) or positive: " + line);
            }
        }
    }
}
