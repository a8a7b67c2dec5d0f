package org.telltale.text;

import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import org.telltale.TelltaleException;

/**
 * Strict UTF-8 decoding for corpus files. Telltale never replaces bad bytes: a replacement
 * character would change the text the model sees and the spans of the explanation, so invalid
 * UTF-8 is an error that names the place (or a counted skip).
 */
final class Utf8 {
    /** EF BB BF, the UTF-8 encoding of U+FEFF (Unicode 15.0, §23.8). */
    private static final byte[] BOM = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};

    private Utf8() {
    }

    /** The length of a UTF-8 byte-order mark at the start of {@code bytes}: 3 or 0. */
    static int bomLength(byte[] bytes, int length) {
        return length >= 3 && bytes[0] == BOM[0] && bytes[1] == BOM[1] && bytes[2] == BOM[2] ? 3 : 0;
    }

    /**
     * Refuses files that start with a UTF-16 or UTF-32 byte-order mark: they are not UTF-8, and
     * decoding them as such would give a clear error only at the first non-ASCII character.
     */
    static void refuseOtherEncodings(byte[] bytes, int length, String file) {
        boolean utf16 = length >= 2 && ((bytes[0] == (byte) 0xFE && bytes[1] == (byte) 0xFF)
                || (bytes[0] == (byte) 0xFF && bytes[1] == (byte) 0xFE));
        boolean utf32be = length >= 4 && bytes[0] == 0 && bytes[1] == 0 && bytes[2] == (byte) 0xFE && bytes[3] == (byte) 0xFF;
        if (utf16 || utf32be) {
            throw new TelltaleException(file + ": starts with a UTF-16/UTF-32 byte-order mark; Telltale reads UTF-8 only"
                    + " (convert it, e.g. with iconv -t UTF-8)");
        }
    }

    /**
     * Decodes {@code bytes[offset, offset+length)}; on invalid UTF-8 throws a {@link BadRecord}
     * whose message starts with {@code where} and gives the byte position within the record.
     */
    static String decode(byte[] bytes, int offset, int length, String where) {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes, offset, length);
        CharBuffer out = CharBuffer.allocate(length);
        CoderResult result = decoder.decode(in, out, true);
        if (result.isError()) {
            throw new BadRecord(SkipReason.INVALID_UTF8, where + ": invalid UTF-8 at byte " + (in.position() - offset + 1)
                    + " (Telltale reads UTF-8 only and never replaces bad bytes)");
        }
        decoder.flush(out);
        out.flip();
        return out.toString();
    }
}
