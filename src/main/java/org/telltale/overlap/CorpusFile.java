package org.telltale.overlap;

import java.nio.file.Path;
import java.util.function.Consumer;
import org.telltale.text.Corpora;
import org.telltale.text.CorpusReader;
import org.telltale.text.CorpusSettings;
import org.telltale.text.Document;
import org.telltale.text.SkipReport;

/** A corpus file (or label folder) as a {@link DocumentSource}: each reading opens it afresh. */
public final class CorpusFile implements DocumentSource {
    private final Path path;
    private final CorpusSettings settings;
    private SkipReport lastSkips;

    public CorpusFile(Path path, CorpusSettings settings) {
        this.path = path;
        this.settings = settings;
    }

    @Override
    public String name() {
        return path.toString();
    }

    public Path path() {
        return path;
    }

    @Override
    public void forEach(Consumer<? super Document> sink) {
        try (CorpusReader reader = Corpora.open(path, settings)) {
            while (reader.hasNext()) {
                sink.accept(reader.next());
            }
            lastSkips = reader.skipped();
        }
    }

    /** What the last complete reading passed over ({@code --skip-bad}); null before the first. */
    public SkipReport lastSkips() {
        return lastSkips;
    }
}
