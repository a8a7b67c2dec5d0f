package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.telltale.UsageException;

class CommandSplitterTest {
    @Test
    void splitsOnWhitespaceAndHonoursQuotes() {
        // POSIX shell word splitting for the subset we support (common practice).
        assertEquals(List.of("python3", "my model.py", "--k", "a b", "it's"),
                CommandSplitter.split("python3 'my model.py'  --k \"a b\" it\\'s"));
    }

    @Test
    void rejectsAnUnclosedQuoteAndAnEmptyCommand() {
        assertThrows(UsageException.class, () -> CommandSplitter.split("python3 'oops"));
        assertThrows(UsageException.class, () -> CommandSplitter.split("   "));
    }
}
