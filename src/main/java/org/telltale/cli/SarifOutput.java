package org.telltale.cli;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Set;
import java.util.function.Supplier;
import org.telltale.audit.AuditResult;
import org.telltale.audit.Baseline;
import org.telltale.report.sarif.AuditSarif;
import org.telltale.report.sarif.SarifLog;
import org.telltale.report.sarif.SarifWriter;
import org.telltale.text.CorpusReader;
import org.telltale.text.RecordPlaces;

/** Writes an audit's SARIF log, with its example documents located in the corpus file when it can be read. */
final class SarifOutput {
    private SarifOutput() {
    }

    /**
     * @param corpusPath the corpus as given on the command line (its URI reference in the log)
     * @param corpus     opens the corpus to find the example documents' lines, or {@code null}
     *                   when it is not at hand (the locations then name the file alone)
     */
    static Path write(AuditResult audit, Path file, boolean force, Path corpusPath, Supplier<CorpusReader> corpus) {
        return write(audit, file, force, corpusPath, corpus, null);
    }

    /** As above, each result with its state against a baseline ({@code since}; {@code null}: none). */
    static Path write(AuditResult audit, Path file, boolean force, Path corpusPath, Supplier<CorpusReader> corpus,
            Baseline.Comparison since) {
        String corpusUri = SarifWriter.uri(corpusPath);
        Map<String, SarifLog.Location> places = new HashMap<>();
        if (corpus != null) {
            Set<String> ids = AuditSarif.exampleIds(audit);
            try (CorpusReader reader = corpus.get()) {
                RecordPlaces.find(reader, ids).forEach((id, place) -> places.put(id,
                        new SarifLog.Location(SarifWriter.uri(place.file()), place.line(), id)));
            }
        }
        SarifWriter.write(AuditSarif.of(audit, VersionProvider.version(), corpusUri, places, since), file, force);
        return file;
    }
}
