package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.MalformedInputException;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

class StrictUtf8ReaderTest {

    static String readAll(Reader reader) throws IOException {
        StringBuilder out = new StringBuilder();
        char[] buffer = new char[977]; // odd size, so reads straddle the decoder's blocks
        for (int n; (n = reader.read(buffer, 0, buffer.length)) >= 0; ) {
            out.append(buffer, 0, n);
        }
        return out.toString();
    }

    @Test
    void handsOutEverythingBeforeABadByteFarIntoTheFileThenNamesItsPosition() throws IOException {
        byte[] good = "\u00e9".repeat(50_000).getBytes(StandardCharsets.UTF_8); // 100,000 bytes, past one block
        byte[] bytes = CorpusFiles.concat(good, new byte[] {(byte) 0xFF}, good);
        StrictUtf8Reader reader = new StrictUtf8Reader(new ByteArrayInputStream(bytes), 3);
        char[] buffer = new char[7_001];
        int[] handedOut = {0};
        IOException e = assertThrows(IOException.class, () -> {
            for (int n; (n = reader.read(buffer, 0, buffer.length)) >= 0; ) {
                handedOut[0] += n;
            }
        });
        assertEquals(MalformedInputException.class, e.getClass());
        assertEquals(50_000, handedOut[0]);
        assertEquals(3 + good.length + 1, reader.badByte());
    }

    @Test
    void aTruncatedSequenceAtTheEndIsInvalid() throws IOException {
        byte[] bytes = {'a', (byte) 0xE2, (byte) 0x82};
        StrictUtf8Reader reader = new StrictUtf8Reader(new ByteArrayInputStream(bytes), 0);
        char[] buffer = new char[8];
        assertEquals(1, reader.read(buffer, 0, 8));
        assertThrows(MalformedInputException.class, () -> reader.read(buffer, 0, 8));
        assertEquals(2, reader.badByte());
    }
}
