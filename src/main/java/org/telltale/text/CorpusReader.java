package org.telltale.text;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Spliterator;
import java.util.Spliterators;
import java.util.stream.Stream;
import java.util.stream.StreamSupport;
import org.telltale.TelltaleException;

/**
 * Reads the documents of one corpus lazily, one record at a time: memory holds the current
 * record and the ids seen so far (to refuse duplicates), never the whole corpus.
 *
 * <p>A broken record stops the read with a {@link TelltaleException} naming file, line and id,
 * unless the settings say skip-bad; then it is passed over and counted in {@link #skipped()}.
 * Not thread-safe; close it when done.
 */
public abstract class CorpusReader implements Iterator<Document>, AutoCloseable {
    private final Path path;
    private final CorpusFormat format;
    private final boolean skipBad;
    private final String noun;
    private final EnumMap<SkipReason, Integer> skipCounts = new EnumMap<>(SkipReason.class);
    private final List<String> skipExamples = new ArrayList<>();
    private final Map<String, String> firstOrigin = new HashMap<>();
    private Document lookahead;
    private boolean finished;
    private int documents;
    private int blankTexts;

    CorpusReader(Path path, CorpusFormat format, boolean skipBad, String noun) {
        this.path = path;
        this.format = format;
        this.skipBad = skipBad;
        this.noun = noun;
    }

    /**
     * The next document in file order, or {@code null} at the end. Throws {@link BadRecord} for a
     * record that cannot become a document; it is called again afterwards to continue.
     */
    abstract Document readNext() throws IOException;

    /** Whether this format can repeat ids; label-folder ids are paths and cannot. */
    boolean checksDuplicates() {
        return true;
    }

    public Path path() {
        return path;
    }

    public CorpusFormat format() {
        return format;
    }

    /** Documents handed out so far. */
    public int documents() {
        return documents;
    }

    /** Documents handed out whose text is empty or only whitespace (kept: they are valid documents). */
    public int blankTexts() {
        return blankTexts;
    }

    /** What was passed over so far; complete once {@link #hasNext()} has returned false. */
    public SkipReport skipped() {
        return new SkipReport(skipCounts, skipExamples, noun);
    }

    @Override
    public boolean hasNext() {
        if (lookahead == null && !finished) {
            lookahead = fetch();
            finished = lookahead == null;
        }
        return lookahead != null;
    }

    @Override
    public Document next() {
        if (!hasNext()) {
            throw new NoSuchElementException("no more documents in " + path);
        }
        Document document = lookahead;
        lookahead = null;
        documents++;
        if (document.text().isBlank()) {
            blankTexts++;
        }
        return document;
    }

    /** The remaining documents as a sequential, lazy stream; closing the stream closes the reader. */
    public Stream<Document> stream() {
        return StreamSupport.stream(Spliterators.spliteratorUnknownSize(this, Spliterator.ORDERED | Spliterator.NONNULL), false)
                .onClose(this::close);
    }

    /** All remaining documents; for small corpora and tests. */
    public List<Document> readAll() {
        List<Document> all = new ArrayList<>();
        forEachRemaining(all::add);
        return all;
    }

    @Override
    public abstract void close();

    private Document fetch() {
        while (true) {
            try {
                Document document = readNext();
                if (document != null && checksDuplicates()) {
                    String earlier = firstOrigin.putIfAbsent(document.id(), document.origin());
                    if (earlier != null) {
                        throw new BadRecord(SkipReason.DUPLICATE_ID, document.origin() + ": duplicate id '"
                                + document.id() + "' (first at " + earlier + ")");
                    }
                }
                return document;
            } catch (BadRecord bad) {
                if (bad.reason().bad() && !skipBad) {
                    throw new TelltaleException(bad.getMessage() + " ({skipBad} skips and counts such " + noun + "s)");
                }
                skipCounts.merge(bad.reason(), 1, Integer::sum);
                if (skipExamples.size() < SkipReport.MAX_EXAMPLES) {
                    skipExamples.add(bad.getMessage());
                }
            } catch (IOException | UncheckedIOException e) {
                throw new TelltaleException("cannot read " + path + ": " + e.getMessage(), e);
            }
        }
    }
}
