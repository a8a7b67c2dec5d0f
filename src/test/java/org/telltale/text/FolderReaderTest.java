package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FolderReaderTest {
    @TempDir
    Path dir;

    @Test
    void subFoldersAreLabelsAndTxtFilesAreDocumentsInNameOrder() {
        CorpusFiles.write(dir, "spam/b.txt", "Win a prize");
        CorpusFiles.write(dir, "spam/a.txt", "Cheap offer");
        CorpusFiles.write(dir, "ham/2024/c.txt", "Meeting at noon");
        CorpusFiles.write(dir, "ham/notes.md", "not a document");
        CorpusFiles.write(dir, "README.txt", "about this corpus");
        CorpusFiles.write(dir, ".git/notes/x.txt", "version control");
        CorpusFiles.write(dir, "spam/.draft.txt", "unfinished");
        try (CorpusReader reader = Corpora.open(dir)) {
            List<Document> docs = reader.readAll();
            assertEquals(List.of(new Document("ham/2024/c.txt", "Meeting at noon", "ham"),
                    new Document("spam/a.txt", "Cheap offer", "spam"),
                    new Document("spam/b.txt", "Win a prize", "spam")), docs);
            assertEquals(dir.resolve("spam/a.txt").toString(), docs.get(1).origin());
            assertEquals("ignored 4 files (1 not a .txt file, 1 outside a label folder, 2 hidden file or folder)",
                    reader.skipped().summary());
        }
    }
}
