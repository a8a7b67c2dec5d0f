package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.StringLength;

class StrictUtf8ReaderPropertyTest {

    @Property(tries = 60)
    void decodesValidUtf8LikeTheJdk(@ForAll @StringLength(max = 300_000) String text) throws IOException {
        // Reference: the JDK's own UTF-8 decoder; unpaired surrogates become '?' when encoding, so
        // compare against the round trip of the bytes.
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        assertEquals(new String(bytes, StandardCharsets.UTF_8), StrictUtf8ReaderTest.readAll(new StrictUtf8Reader(new ByteArrayInputStream(bytes), 0)));
    }
}
