package org.telltale.text;

import java.io.IOException;
import java.io.InputStream;
import java.util.Arrays;

/**
 * Splits a byte stream into lines ended by LF, CRLF or a lone CR, counting them from 1. A line
 * longer than the limit is passed over to its end and reported, so one oversized record cannot
 * exhaust memory.
 */
final class LineSource implements AutoCloseable {
    private final InputStream in;
    private final int maxBytes;
    private byte[] buffer = new byte[8192];
    private int length;
    private boolean overlong;
    private int lineNumber;
    private int pending = -2; // -2: nothing peeked; otherwise the byte read after a CR
    private boolean atEnd;

    LineSource(InputStream in, int maxBytes) {
        this.in = in;
        this.maxBytes = maxBytes;
    }

    /** Reads the next line into {@link #bytes()}; false at the end of the stream. */
    boolean next() throws IOException {
        if (atEnd) {
            return false;
        }
        length = 0;
        overlong = false;
        boolean any = false;
        while (true) {
            int b;
            if (pending != -2) {
                b = pending;
                pending = -2;
            } else {
                b = in.read();
            }
            if (b < 0) {
                atEnd = true;
                if (!any) {
                    return false;
                }
                break;
            }
            any = true;
            if (b == '\n') {
                break;
            }
            if (b == '\r') {
                int after = in.read();
                if (after != '\n') {
                    pending = after;
                }
                break;
            }
            append((byte) b);
        }
        lineNumber++;
        return true;
    }

    private void append(byte b) {
        if (length >= maxBytes) {
            overlong = true;
            return;
        }
        if (length == buffer.length) {
            buffer = Arrays.copyOf(buffer, (int) Math.min((long) buffer.length * 2, maxBytes));
        }
        buffer[length++] = b;
    }

    /** The current line's bytes, without its terminator; valid up to {@link #length()}. */
    byte[] bytes() {
        return buffer;
    }

    int length() {
        return length;
    }

    /** True when the current line exceeded the limit and was cut short. */
    boolean overlong() {
        return overlong;
    }

    /** The current line's number, from 1. */
    int lineNumber() {
        return lineNumber;
    }

    @Override
    public void close() throws IOException {
        in.close();
    }
}
