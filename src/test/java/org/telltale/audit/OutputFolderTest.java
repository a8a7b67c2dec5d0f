package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;
import org.telltale.UsageException;

class OutputFolderTest {

    @Test
    void earlierResultsAreKeptUnlessForcedOrResumed(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("run");
        OutputFolder.open(out, false, false).write(OutputFolder.AUDIT, "{}\n");
        UsageException refused = assertThrows(UsageException.class, () -> OutputFolder.open(out, false, false));
        assertTrue(refused.getMessage().contains("{force}"), refused.getMessage());
        OutputFolder.open(out, true, false).write(OutputFolder.AUDIT, "{\"again\":1}\n");
        assertEquals("{\"again\":1}\n", Files.readString(out.resolve(OutputFolder.AUDIT)));
        OutputFolder.open(out, false, true);

        Path other = dir.resolve("killed");
        Files.createDirectories(other);
        Files.writeString(other.resolve(OutputFolder.JOURNAL), "{}\n");
        UsageException unfinished = assertThrows(UsageException.class, () -> OutputFolder.open(other, false, false));
        assertTrue(unfinished.getMessage().contains("{resume}"), unfinished.getMessage());
    }

    @Test
    void noOutputLeavesTheFolder(@TempDir Path dir) throws Exception {
        OutputFolder folder = OutputFolder.open(dir.resolve("run"), false, false);
        assertThrows(TelltaleException.class, () -> folder.file("../audit.json"));
        assertThrows(TelltaleException.class, () -> folder.file("sub/audit.json"));
        assertThrows(TelltaleException.class, () -> folder.file(".."));
        Path outside = dir.resolve("outside.html");
        Files.createSymbolicLink(folder.dir().resolve(OutputFolder.REPORT), outside);
        assertThrows(TelltaleException.class, () -> folder.write(OutputFolder.REPORT, "<p>x</p>"));
        assertTrue(Files.notExists(outside), "nothing was written through the link");
    }
}
