package org.telltale.text;

import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.MalformedInputException;
import java.nio.charset.StandardCharsets;

/**
 * Decodes UTF-8 strictly and reports a bad byte only when the reader of the characters gets
 * there. {@link java.io.InputStreamReader} decodes ahead in large blocks and fails early, so a
 * parser on top of it would blame the wrong record; here every character before the bad byte is
 * handed out first, and the error gives the byte's position in the file.
 */
final class StrictUtf8Reader extends Reader {
    private final InputStream in;
    private final CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
            .onMalformedInput(CodingErrorAction.REPORT)
            .onUnmappableCharacter(CodingErrorAction.REPORT);
    private final ByteBuffer bytes = ByteBuffer.allocate(1 << 16);
    private final CharBuffer chars = CharBuffer.allocate(1 << 16);
    private long bytesBefore; // bytes of the file consumed before the start of the byte buffer
    private long badByte = -1; // 1-based file position of a bad byte once found
    private boolean eof;
    private boolean done;
    private long handedOut;
    private long limit = Long.MAX_VALUE;

    /** @param in positioned after any byte-order mark; {@code skipped} bytes come before it */
    StrictUtf8Reader(InputStream in, long skipped) {
        this.in = in;
        this.bytesBefore = skipped;
        chars.flip();
        bytes.flip();
    }

    /** Characters handed out so far. */
    long handedOut() {
        return handedOut;
    }

    /**
     * Refuses to hand out more than {@code moreChars} characters beyond those handed out so far:
     * the next read past them throws {@link RecordTooLongException}. Bounds the memory an
     * unclosed quote can take.
     */
    void allowAtMost(long moreChars) {
        limit = handedOut + moreChars;
    }

    /** Thrown when a caller reads past the limit set with {@link #allowAtMost}. */
    static final class RecordTooLongException extends IOException {
        private static final long serialVersionUID = 1L;

        RecordTooLongException() {
            super("record too long");
        }
    }

    /** The 1-based position in the file of the first invalid byte, or -1 when none was met. */
    long badByte() {
        return badByte;
    }

    @Override
    public int read(char[] buffer, int offset, int length) throws IOException {
        if (length == 0) {
            return 0;
        }
        while (!chars.hasRemaining()) {
            if (badByte >= 0) {
                throw new MalformedInputException(1);
            }
            if (!fill()) {
                return -1;
            }
        }
        if (handedOut >= limit) {
            throw new RecordTooLongException();
        }
        int n = (int) Math.min(Math.min(length, chars.remaining()), limit - handedOut);
        chars.get(buffer, offset, n);
        handedOut += n;
        return n;
    }

    /** Decodes more characters; false at the end of the input. */
    private boolean fill() throws IOException {
        if (done) {
            return false;
        }
        chars.clear();
        try {
            while (chars.position() == 0) {
                if (!eof && bytes.remaining() < 4) {
                    readMoreBytes();
                }
                CoderResult result = decoder.decode(bytes, chars, eof);
                if (result.isError()) {
                    badByte = bytesBefore + bytes.position() + 1;
                    return true; // hand out what came before; the next read throws
                }
                if (eof && !bytes.hasRemaining()) {
                    decoder.flush(chars);
                    done = true;
                    return chars.position() > 0;
                }
            }
            return true;
        } finally {
            chars.flip();
        }
    }

    private void readMoreBytes() throws IOException {
        bytesBefore += bytes.position();
        bytes.compact();
        int n = in.read(bytes.array(), bytes.position(), bytes.remaining());
        if (n < 0) {
            eof = true;
        } else {
            bytes.position(bytes.position() + n);
        }
        bytes.flip();
    }

    @Override
    public void close() throws IOException {
        in.close();
    }
}
