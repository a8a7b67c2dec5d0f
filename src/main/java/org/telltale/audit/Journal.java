package org.telltale.audit;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.telltale.TelltaleException;
import org.telltale.json.JsonValue;

/**
 * The append-only record of an audit's finished work, one JSON object per line, each line forced
 * to disk before the next piece of work starts: a {@code start} line with the format, version and
 * the run's {@link RunFingerprint} field by field, one {@code scored} line per scored batch of the
 * corpus (keyed by the position of its first document, so that a resumed run may use another
 * batch size), and one {@code explained} line per
 * explained document (the explanation in the {@code telltale.explanations} line form). A killed
 * audit leaves at most one torn last line, which {@link #resume} cuts off; everything before it is
 * kept and not redone.
 *
 * <p>Not thread-safe: one audit appends from one thread.
 */
public final class Journal implements AutoCloseable {
    private static final ObjectMapper MAPPER = new ObjectMapper();
    /** The journal's format name and version, in its start line. */
    public static final String FORMAT = "telltale.journal";
    public static final int VERSION = 2;

    /**
     * One scored batch: the position in the corpus of its first document, a hash of its documents'
     * ids (to notice a corpus that changed), the model's labels, and the label the model predicted
     * for each document.
     */
    public record ScoredBatch(long start, long idsHash, List<String> labels, List<String> predicted, long retries) {
        public ScoredBatch {
            labels = List.copyOf(labels);
            predicted = List.copyOf(predicted);
        }
    }

    /** The hash a scored line keeps of its batch's ids: 64-bit FNV-1a over the ids, each ended by a NUL. */
    public static long idsHash(List<String> ids) {
        long h = 0xcbf29ce484222325L;
        for (String id : ids) {
            for (byte b : (id + '\u0000').getBytes(StandardCharsets.UTF_8)) {
                h ^= b & 0xff;
                h *= 0x100000001b3L;
            }
        }
        return h;
    }

    private final Path file;
    private final FileChannel channel;
    private final Map<Long, ScoredBatch> scored;
    private final Map<String, String> explained;
    private long journaledRetries;

    private Journal(Path file, FileChannel channel, Map<Long, ScoredBatch> scored, Map<String, String> explained,
            long journaledRetries) {
        this.file = file;
        this.channel = channel;
        this.scored = scored;
        this.explained = explained;
        this.journaledRetries = journaledRetries;
    }

    /** Starts a new journal at {@code file}, replacing any old one. */
    public static Journal create(Path file, RunFingerprint fingerprint) {
        try {
            refuseLink(file);
            FileChannel channel = FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING, LinkOption.NOFOLLOW_LINKS);
            Journal journal = new Journal(file, channel, new LinkedHashMap<>(), new LinkedHashMap<>(), 0);
            ObjectNode start = MAPPER.createObjectNode();
            start.put("type", "start");
            start.put("format", FORMAT);
            start.put("version", VERSION);
            ObjectNode fields = start.putObject("fingerprint");
            fingerprint.fields().forEach(fields::put);
            journal.append(start.toString());
            return journal;
        } catch (IOException e) {
            throw new TelltaleException("cannot write journal " + file + ": " + e.getMessage(), e);
        }
    }

    /**
     * Opens the journal of an interrupted audit: checks that it was written by the same run
     * (fingerprint, field by field), cuts off a torn last line, and loads the finished work.
     */
    public static Journal resume(Path file, RunFingerprint fingerprint) {
        if (!Files.isRegularFile(file, LinkOption.NOFOLLOW_LINKS)) {
            throw new TelltaleException("nothing to resume: no journal at " + file);
        }
        try {
            byte[] bytes = Files.readAllBytes(file);
            int end = bytes.length;
            while (end > 0 && bytes[end - 1] != '\n') {
                end--; // the torn tail of a line that was being written when the run was killed
            }
            String text = new String(bytes, 0, end, StandardCharsets.UTF_8);
            String[] lines = text.isEmpty() ? new String[0] : text.split("\n", -1);
            Map<Long, ScoredBatch> scored = new LinkedHashMap<>();
            Map<String, String> explained = new LinkedHashMap<>();
            long retries = 0;
            boolean started = false;
            for (int i = 0; i < lines.length; i++) {
                if (lines[i].isEmpty()) {
                    continue;
                }
                JsonValue node = JsonValue.parse(lines[i], file + ":" + (i + 1));
                String type = node.requireObject().string("type");
                switch (type) {
                    case "start" -> {
                        checkFormat(node, file);
                        RunFingerprint was = fingerprintOf(node.object("fingerprint"));
                        var difference = was.difference(fingerprint);
                        if (difference.isPresent()) {
                            throw new TelltaleException(file + ": cannot resume an audit whose " + difference.get()
                                    + "; rerun without {resume} and with {force} to start over");
                        }
                        started = true;
                    }
                    case "scored" -> {
                        ScoredBatch batch = new ScoredBatch(node.integer("start"), hash(node),
                                interned(node.strings("labels")), interned(node.strings("predicted")),
                                node.integer("retries"));
                        scored.put(batch.start(), batch);
                        retries += batch.retries();
                    }
                    case "explained" -> {
                        explained.put(node.string("id"), node.object("explanation").node().toString());
                        retries += node.integer("retries");
                    }
                    default -> throw node.at("type", "unknown journal line type '" + type + "'");
                }
                if (!started) {
                    throw new TelltaleException(file + ":" + (i + 1) + ": the journal does not begin with its start line");
                }
            }
            if (!started) {
                throw new TelltaleException(file + " is empty: nothing to resume; rerun with {force} to start over");
            }
            FileChannel channel = FileChannel.open(file, StandardOpenOption.WRITE, LinkOption.NOFOLLOW_LINKS);
            channel.truncate(end);
            channel.position(end);
            channel.force(true);
            return new Journal(file, channel, scored, explained, retries);
        } catch (IOException e) {
            throw new TelltaleException("cannot read journal " + file + ": " + e.getMessage(), e);
        }
    }

    public Path file() {
        return file;
    }

    /**
     * The finished batch that starts at corpus position {@code start}, or {@code null}; handed out
     * once, so that the journal does not keep the whole corpus's predictions in memory.
     */
    public ScoredBatch takeScored(long start) {
        return scored.remove(start);
    }

    /** The explanation line of the finished document {@code id}, or {@code null}. */
    public String explained(String id) {
        return explained.get(id);
    }

    /** Number of documents explained so far. */
    public int explainedCount() {
        return explained.size();
    }

    /** Retries counted in the journal, earlier runs included. */
    public long retries() {
        return journaledRetries;
    }

    /** Appends a scored batch whose first document is at corpus position {@code start}. */
    public void appendScored(long start, List<String> ids, List<String> labels, List<String> predicted, long retries) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("type", "scored");
        node.put("start", start);
        node.put("ids_hash", Long.toHexString(idsHash(ids)));
        ArrayNode labelArray = node.putArray("labels");
        labels.forEach(labelArray::add);
        ArrayNode predictedArray = node.putArray("predicted");
        predicted.forEach(predictedArray::add);
        node.put("retries", retries);
        append(node.toString());
        journaledRetries += retries;
    }

    /** Appends the explanation of {@code id}; {@code explanationJson} is one JSON object. */
    public void appendExplained(String id, String explanationJson, long retries) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("type", "explained");
        node.put("id", id);
        node.put("retries", retries);
        String head = node.toString();
        // The explanation goes in as written by its own writer, so the journal keeps its bytes.
        append(head.substring(0, head.length() - 1) + ",\"explanation\":" + explanationJson.strip() + "}");
        explained.put(id, explanationJson.strip());
        journaledRetries += retries;
    }

    private void append(String line) {
        if (line.indexOf('\n') >= 0) {
            throw new IllegalArgumentException("a journal line must not contain a newline");
        }
        try {
            ByteBuffer buffer = ByteBuffer.wrap((line + "\n").getBytes(StandardCharsets.UTF_8));
            while (buffer.hasRemaining()) {
                channel.write(buffer);
            }
            channel.force(false);
        } catch (IOException e) {
            throw new TelltaleException("cannot append to journal " + file + ": " + e.getMessage(), e);
        }
    }

    @Override
    public void close() {
        try {
            channel.close();
        } catch (IOException e) {
            throw new TelltaleException("cannot close journal " + file + ": " + e.getMessage(), e);
        }
    }

    /** One format and version check (JsonValue.version); a journal from before version 2 has no format at all. */
    private static void checkFormat(JsonValue start, Path file) {
        if (!start.has("format")) {
            throw new TelltaleException(file + ": not a " + FORMAT + " version " + VERSION + " journal (found an older "
                    + "journal without a format); rerun without {resume} and with {force} to start over");
        }
        start.version(FORMAT, VERSION);
    }

    private static RunFingerprint fingerprintOf(JsonValue fields) {
        Map<String, String> out = new LinkedHashMap<>();
        fields.fields().forEach((name, value) -> out.put(name, value.asString()));
        return new RunFingerprint(out);
    }

    private static long hash(JsonValue scored) {
        String hex = scored.string("ids_hash");
        try {
            return Long.parseUnsignedLong(hex, 16);
        } catch (NumberFormatException e) {
            throw scored.get("ids_hash").here("expected up to 16 hexadecimal digits");
        }
    }

    /** The same few label strings over and over: share one instance of each. */
    private static List<String> interned(List<String> labels) {
        Map<String, String> pool = new java.util.HashMap<>();
        return labels.stream().map(l -> pool.computeIfAbsent(l, k -> k)).toList();
    }

    private static void refuseLink(Path file) {
        if (Files.isSymbolicLink(file)) {
            throw new TelltaleException("refusing to write through a symbolic link: " + file);
        }
    }
}
