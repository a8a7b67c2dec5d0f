package org.telltale.text;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Writes corpus files for tests, byte for byte. */
final class CorpusFiles {
    private CorpusFiles() {
    }

    static Path write(Path dir, String name, String content) {
        return write(dir, name, content.getBytes(StandardCharsets.UTF_8));
    }

    static Path write(Path dir, String name, byte[] content) {
        try {
            Path file = dir.resolve(name);
            Files.createDirectories(file.getParent());
            Files.write(file, content);
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static byte[] concat(byte[]... parts) {
        int n = 0;
        for (byte[] part : parts) {
            n += part.length;
        }
        byte[] all = new byte[n];
        int at = 0;
        for (byte[] part : parts) {
            System.arraycopy(part, 0, all, at, part.length);
            at += part.length;
        }
        return all;
    }

    static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }
}
