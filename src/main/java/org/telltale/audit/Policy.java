package org.telltale.audit;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Pattern;
import java.util.regex.PatternSyntaxException;
import org.telltale.EnumKeys;
import org.telltale.TelltaleException;
import org.telltale.UnknownKeyException;
import org.telltale.json.JsonValue;

/**
 * A reviewer's decisions about terms, read from a JSON file:
 * <pre>{"format": "telltale.policy", "version": 1, "rules": [
 *   {"term": "meter", "status": "accepted", "note": "meter talk is the billing queue's real evidence"},
 *   {"pattern": "ogx\\d*", "status": "artefact", "note": "outage ticket prefix"}]}</pre>
 * A rule names one {@code term} exactly or a {@code pattern} (a Java regular expression that must
 * match the whole term), or a whole artefact by its kind and a glob over its pattern:
 * <pre>  {"boilerplate": "Exported by Casefile*", "status": "accepted", "note": "archive footer"},
 *   {"header": "X-Intake-*", "status": "artefact", "note": "gateway stamps"},
 *   {"identifier": "HR-#####", "status": "artefact", "note": "returns case tag"}</pre>
 * In a glob {@code *} stands for any run of characters and {@code ?} for one; case, Unicode form
 * and runs of white space do not matter ({@link ArtefactIdentity#normalise}); a header glob
 * matches the field name or the whole pattern. {@code accepted} terms and artefacts are reported
 * as suppressed, never dropped; {@code artefact} terms are always flagged, {@code artefact}
 * artefacts at least medium. The first matching rule wins.
 *
 * <p>Immutable.
 */
public final class Policy {
    public static final String FORMAT = "telltale.policy";

    /** What a reviewer decided about a term. */
    public enum Status {
        ACCEPTED, ARTEFACT;

        /** The lower-case name used in policy files, JSON and reports. */
        public String key() {
            return name().toLowerCase(Locale.ROOT);
        }

        /** @throws UnknownKeyException for a name other than {@code accepted} or {@code artefact} */
        public static Status fromKey(String key) {
            return EnumKeys.parse("status", key, values(), Status::key);
        }
    }

    /**
     * One rule: exactly one of {@code term}, {@code pattern} and an artefact's {@code kind} with its
     * {@code glob}; a status and the reviewer's note.
     */
    public record Rule(String term, Pattern pattern, ArtefactKind kind, String glob, Status status, String note) {
        public Rule(String term, Pattern pattern, Status status, String note) {
            this(term, pattern, null, null, status, note);
        }

        /** Whether this is a rule about whole artefacts. */
        public boolean byArtefact() {
            return kind != null;
        }

        boolean matches(String candidate) {
            if (kind != null) {
                return false;
            }
            return term != null ? term.equals(candidate) : pattern.matcher(candidate).matches();
        }

        boolean matches(ArtefactKind artefactKind, String artefactPattern) {
            if (kind != artefactKind) {
                return false;
            }
            String wanted = ArtefactIdentity.normalise(glob);
            String text = ArtefactIdentity.normalise(artefactPattern);
            if (kind == ArtefactKind.HEADER) {
                int colon = text.indexOf(": ");
                if (colon >= 0 && globMatches(wanted, text.substring(0, colon))) {
                    return true;
                }
            }
            return globMatches(wanted, text);
        }
    }

    /**
     * Whether {@code glob} ({@code *} any run, {@code ?} one character, the rest literal) matches
     * all of {@code text}: the greedy wildcard match with one backtrack point, no recursion, at most
     * |glob| · |text| steps (common practice).
     */
    static boolean globMatches(String glob, String text) {
        int g = 0;
        int t = 0;
        int star = -1;
        int resume = 0;
        while (t < text.length()) {
            if (g < glob.length() && (glob.charAt(g) == '?' || glob.charAt(g) == text.charAt(t)) && glob.charAt(g) != '*') {
                g++;
                t++;
            } else if (g < glob.length() && glob.charAt(g) == '*') {
                star = g++;
                resume = t;
            } else if (star >= 0) {
                g = star + 1;
                t = ++resume;
            } else {
                return false;
            }
        }
        while (g < glob.length() && glob.charAt(g) == '*') {
            g++;
        }
        return g == glob.length();
    }

    private static final Set<String> TOP_KEYS = Set.of("format", "version", "rules");
    private static final List<ArtefactKind> RULE_KINDS = List.of(ArtefactKind.HEADER, ArtefactKind.ADDRESS,
            ArtefactKind.IDENTIFIER, ArtefactKind.BOILERPLATE);
    private static final Set<String> RULE_KEYS = Set.of("term", "pattern", "header", "address", "identifier",
            "boilerplate", "status", "note");
    private static final Policy EMPTY = new Policy(List.of());

    private final List<Rule> rules;

    private Policy(List<Rule> rules) {
        this.rules = List.copyOf(rules);
    }

    public static Policy empty() {
        return EMPTY;
    }

    public List<Rule> rules() {
        return rules;
    }

    /** The first term rule that matches {@code term}. */
    public Optional<Rule> match(String term) {
        return rules.stream().filter(r -> r.matches(term)).findFirst();
    }

    /** The first artefact rule that matches an artefact of {@code kind} with {@code pattern}. */
    public Optional<Rule> matchArtefact(ArtefactKind kind, String pattern) {
        return rules.stream().filter(r -> r.matches(kind, pattern)).findFirst();
    }

    /** Reads a policy file; every error names the file and the rule. */
    public static Policy read(Path file) {
        String json;
        try {
            json = Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new TelltaleException("policy file not found: " + file);
        } catch (IOException e) {
            throw new TelltaleException("cannot read policy file " + file + ": " + e.getMessage(), e);
        }
        return parse(json, file.toString());
    }

    /**
     * Parses policy JSON through the strict reader; {@code place} names its origin in errors, with
     * the path of the rule and its field ({@code p.json: rules[1].note: …}). A hand-written policy
     * may leave out {@code format} and {@code version}; given, they pass the one version check.
     */
    public static Policy parse(String json, String place) {
        JsonValue root = JsonValue.parse(json, place).requireObject();
        rejectUnknown(root, TOP_KEYS);
        if (root.find("format").isPresent() || root.find("version").isPresent()) {
            root.version(FORMAT, 1);
        }
        List<Rule> rules = new ArrayList<>();
        for (JsonValue rule : root.array("rules")) {
            rules.add(rule(rule.requireObject()));
        }
        return new Policy(rules);
    }

    private static Rule rule(JsonValue node) {
        rejectUnknown(node, RULE_KEYS);
        String term = node.optionalString("term");
        String pattern = node.optionalString("pattern");
        ArtefactKind kind = null;
        String glob = null;
        int named = (term == null ? 0 : 1) + (pattern == null ? 0 : 1);
        for (ArtefactKind k : RULE_KINDS) {
            String g = node.optionalString(k.key());
            if (g != null) {
                named++;
                kind = k;
                glob = g;
            }
        }
        if (named != 1) {
            throw node.here("a rule needs exactly one of \"term\", \"pattern\", \"header\", \"address\", "
                    + "\"identifier\" and \"boilerplate\"");
        }
        Status status;
        String statusKey = node.string("status");
        try {
            status = Status.fromKey(statusKey);
        } catch (UnknownKeyException e) {
            throw node.at("status", e.getMessage());
        }
        String note = node.optionalString("note");
        if (note == null || note.isBlank()) {
            throw node.at("note", "every rule needs a note saying why");
        }
        Pattern compiled = null;
        if (pattern != null) {
            try {
                compiled = Pattern.compile(pattern);
            } catch (PatternSyntaxException e) {
                throw node.at("pattern", "bad pattern '" + pattern + "': " + e.getDescription());
            }
        }
        return new Rule(term, compiled, kind, glob, status, note);
    }

    private static void rejectUnknown(JsonValue node, Set<String> known) {
        for (String name : node.fields().keySet()) {
            if (!known.contains(name)) {
                throw node.at(name, "unknown key (expected one of " + known.stream().sorted().toList() + ")");
            }
        }
    }
}
