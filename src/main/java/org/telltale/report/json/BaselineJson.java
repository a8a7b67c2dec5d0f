package org.telltale.report.json;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.telltale.audit.ArtefactIdentity;
import org.telltale.audit.Baseline;
import org.telltale.audit.Severity;
import org.telltale.json.JsonValue;

/**
 * The baseline's side of the {@code telltale.audit} contract: reads the artefacts of an earlier
 * audit.json (version 1: its {@code findings}, the pattern being the term; version 2: its
 * {@code artefacts}) with the strict reader, and writes and reads the {@code baseline} section a
 * compared audit carries:
 * {@code "baseline": {"file": …, "new": [entry…], "unchanged": [entry…], "resolved": [entry…]}}, each
 * entry {@code {"identity", "kind", "label", "pattern", "severity", "suppressed"}}.
 */
public final class BaselineJson {
    /** The top-level field of a compared audit.json. */
    public static final String SECTION = "baseline";

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private BaselineJson() {
    }

    /** The artefacts of the audit in {@code file}; {@code file} as given names the baseline. */
    public static Baseline read(Path file) {
        JsonValue root = JsonValue.read(file);
        int version = root.version(AuditJson.FORMAT, 1, 2);
        List<Baseline.Entry> entries = new ArrayList<>();
        if (version == 1) {
            for (JsonValue f : root.array("findings")) {
                entries.add(entry(f, f.string("term")));
            }
        } else {
            for (JsonValue a : root.array("artefacts")) {
                entries.add(entry(a, a.string("pattern")));
            }
        }
        return new Baseline(file.toString(), entries);
    }

    private static Baseline.Entry entry(JsonValue o, String pattern) {
        String kind = o.string("kind");
        String severity = o.string("severity");
        try {
            return new Baseline.Entry(new ArtefactIdentity(kind, o.string("label"), ArtefactIdentity.normalise(pattern)),
                    Severity.fromKey(severity), o.bool("suppressed"));
        } catch (IllegalArgumentException e) {
            throw o.at("severity", e.getMessage());
        }
    }

    /** The {@code baseline} section of a compared audit. */
    public static ObjectNode tree(Baseline.Comparison comparison) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("file", comparison.baseline());
        entries(o.putArray(Baseline.State.NEW.key()), comparison.added());
        entries(o.putArray(Baseline.State.UNCHANGED.key()), comparison.unchanged());
        entries(o.putArray(Baseline.State.RESOLVED.key()), comparison.resolved());
        return o;
    }

    private static void entries(ArrayNode array, List<Baseline.Entry> entries) {
        for (Baseline.Entry e : entries) {
            ObjectNode x = array.addObject();
            x.put("identity", e.identity().fingerprint());
            x.put("kind", e.identity().kind());
            x.put("label", e.identity().label());
            x.put("pattern", e.identity().pattern());
            x.put("severity", e.severity().key());
            x.put("suppressed", e.suppressed());
        }
    }

    /** The comparison an audit.json carries, or empty when it was not compared with a baseline. */
    public static Optional<Baseline.Comparison> section(Path auditJson) {
        JsonValue root = JsonValue.read(auditJson);
        root.version(AuditJson.FORMAT, AuditJson.VERSION);
        Optional<JsonValue> section = root.find(SECTION);
        if (section.isEmpty()) {
            return Optional.empty();
        }
        JsonValue s = section.get();
        return Optional.of(new Baseline.Comparison(s.string("file"), read(s, Baseline.State.NEW),
                read(s, Baseline.State.UNCHANGED), read(s, Baseline.State.RESOLVED)));
    }

    private static List<Baseline.Entry> read(JsonValue section, Baseline.State state) {
        List<Baseline.Entry> out = new ArrayList<>();
        for (JsonValue x : section.array(state.key())) {
            Baseline.Entry e = entry(x, x.string("pattern"));
            if (!e.identity().fingerprint().equals(x.string("identity"))) {
                throw x.at("identity", "does not match kind, label and pattern (expected " + e.identity().fingerprint() + ")");
            }
            out.add(e);
        }
        return out;
    }
}
