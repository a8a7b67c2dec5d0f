package org.telltale.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/** The scoring protocol has no version field (docs/protocol.md); its reader is strict about fields and types. */
class ScoreRequestsTest {
    private static HttpError error(String body) {
        return assertThrows(HttpError.class, () -> ScoreRequests.nativeTexts(body.getBytes(StandardCharsets.UTF_8), 64));
    }

    @Test
    void aRequestWithoutTextsIsA400NamingTheField() {
        assertEquals("400 the request body: texts: missing (expected {\"texts\": [\"…\", …]})",
                error("{\"text\": [\"a\"]}").status() + " " + error("{\"text\": [\"a\"]}").getMessage());
    }

    @Test
    void aTextThatIsNotAStringIsNamedWithItsIndexAndValue() {
        assertEquals("the request body: texts[1]: expected a string, found the number 3 (expected {\"texts\": [\"…\", …]})",
                error("{\"texts\": [\"a\", 3]}").getMessage());
    }
}
