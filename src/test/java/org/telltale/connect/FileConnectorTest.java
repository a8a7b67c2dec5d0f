package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;
import org.telltale.UsageException;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

class FileConnectorTest {
    @TempDir
    Path dir;

    @Test
    void aModelFileIsScoredInProcessExactlyAsTheModelItself() {
        Path file = SupportQueueModel.write(dir);
        BuiltinModel direct = SupportQueueModel.train();
        ScoreMatrix expected = direct.score(SupportQueueModel.PROBES);
        try (TextClassifier c = Connectors.open(ConnectorSettings.of(file.toString()).withBatch(2).withParallel(2))) {
            ScoreMatrix got = c.score(SupportQueueModel.PROBES);
            assertEquals(direct.labels(), got.labels());
            for (int i = 0; i < got.size(); i++) {
                assertArrayEquals(expected.row(i), got.row(i), 0, "row " + i);
            }
            assertTrue(c.describe().contains("in process, batch 2, 2 in flight"), c.describe());
        }
    }

    @Test
    void aMissingFileIsAClearError() {
        var e = assertThrows(TelltaleException.class, () -> Connectors.open(ConnectorSettings.of(dir.resolve("nope.json").toString())));
        assertTrue(e.getMessage().contains("nope.json"), e.getMessage());
    }

    @Test
    void anUnknownSchemeIsAUsageError() {
        assertThrows(UsageException.class, () -> Connectors.open(ConnectorSettings.of("ftp://host/model")));
    }
}
