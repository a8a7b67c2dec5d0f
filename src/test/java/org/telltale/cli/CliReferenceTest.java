package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** docs/cli.md is generated from the picocli model; this fails when the committed copy is stale. */
class CliReferenceTest {

    @Test
    void committedReferenceMatchesTheCommandModel() throws IOException {
        String committed = Files.readString(Path.of("docs/cli.md"), StandardCharsets.UTF_8);
        assertEquals(CliReference.markdown(), committed,
                "docs/cli.md is stale: run java -cp target/telltale.jar org.telltale.cli.CliReference docs/cli.md");
    }

    @Test
    void referenceCoversEverySubcommand() {
        String md = CliReference.markdown();
        for (String name : Main.commandLine().getSubcommands().keySet()) {
            assertTrue(md.contains("## `telltale " + name + "`"), name);
        }
    }
}
