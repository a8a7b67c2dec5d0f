package org.telltale.text;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Locale;
import org.telltale.TelltaleException;

/**
 * A label-folder corpus: every sub-folder of the root is a label, and every {@code .txt} file
 * beneath it (in nested folders too) is one document of that label. The id is the file's path
 * relative to the root with {@code /} separators, e.g. {@code billing/2024/0001.txt}.
 *
 * <p>Walked lazily in name order (by UTF-16 code unit, whatever the locale). A symbolic link to a
 * file is followed only when its real target lies inside the root; links leading outside, broken
 * links and links to folders (which could only read documents twice or loop) are passed over and
 * counted, as are binary files (a NUL byte), non-{@code .txt} files, files directly in the
 * root, and hidden files and folders (name starting with a dot, such as {@code .git}).
 */
final class FolderReader extends CorpusReader {
    private final Path root;
    private final Path realRoot;
    private final Deque<Path> pending = new ArrayDeque<>();

    FolderReader(Path path, CorpusSettings settings) throws IOException {
        super(path, CorpusFormat.FOLDER, settings.skipBad(), "file");
        this.root = path;
        this.realRoot = path.toRealPath();
        pushChildren(root);
    }

    @Override
    boolean checksDuplicates() {
        return false;
    }

    @Override
    Document readNext() throws IOException {
        while (!pending.isEmpty()) {
            Path entry = pending.pop();
            String relative = relativeId(entry);
            if (entry.getFileName().toString().startsWith(".")) {
                throw new BadRecord(SkipReason.HIDDEN, entry + ": hidden (its name starts with a dot), not read");
            }
            Path real = entry;
            if (Files.isSymbolicLink(entry)) {
                try {
                    real = entry.toRealPath();
                } catch (IOException e) {
                    throw new BadRecord(SkipReason.BROKEN_LINK, entry + ": a link whose target does not exist");
                }
                if (!real.startsWith(realRoot)) {
                    throw new BadRecord(SkipReason.LINK_OUTSIDE, entry + ": a link leading outside " + root);
                }
                if (Files.isDirectory(real)) {
                    throw new BadRecord(SkipReason.LINKED_FOLDER, entry + ": a link to a folder (not followed, so no document is read twice)");
                }
            } else if (Files.isDirectory(entry)) {
                pushChildren(entry);
                continue;
            }
            if (entry.getParent().equals(root)) {
                throw new BadRecord(SkipReason.OUTSIDE_LABEL_FOLDER, entry + ": a file directly in the corpus folder; documents go in label sub-folders");
            }
            if (!relative.toLowerCase(Locale.ROOT).endsWith(".txt")) {
                throw new BadRecord(SkipReason.NOT_TXT, entry + ": not a .txt file");
            }
            return read(entry, real, relative);
        }
        return null;
    }

    private Document read(Path entry, Path real, String id) throws IOException {
        if (Files.size(real) > Corpora.MAX_RECORD_BYTES) {
            throw new BadRecord(SkipReason.TOO_LONG, entry + ": larger than " + Corpora.MAX_RECORD_BYTES + " bytes");
        }
        byte[] bytes = Files.readAllBytes(real);
        for (byte b : bytes) {
            if (b == 0) {
                throw new BadRecord(SkipReason.BINARY_FILE, entry + ": a binary file (it holds a NUL byte)");
            }
        }
        String place = entry.toString();
        Utf8.refuseOtherEncodings(bytes, bytes.length, place);
        int bom = Utf8.bomLength(bytes, bytes.length);
        String text = Utf8.decode(bytes, bom, bytes.length - bom, place);
        String label = root.relativize(entry).getName(0).toString();
        return new Document(id, text, label, place);
    }

    /** Pushes the folder's entries so that they pop in name order. */
    private void pushChildren(Path folder) throws IOException {
        List<Path> children = new ArrayList<>();
        try (DirectoryStream<Path> stream = Files.newDirectoryStream(folder)) {
            stream.forEach(children::add);
        } catch (IOException e) {
            throw new TelltaleException("cannot list " + folder + ": " + e.getMessage(), e);
        }
        children.sort((a, b) -> a.getFileName().toString().compareTo(b.getFileName().toString()));
        for (int i = children.size() - 1; i >= 0; i--) {
            pending.push(children.get(i));
        }
    }

    private String relativeId(Path entry) {
        Path relative = root.relativize(entry);
        StringBuilder id = new StringBuilder();
        for (Path part : relative) {
            if (id.length() > 0) {
                id.append('/');
            }
            id.append(part);
        }
        return id.toString();
    }

    @Override
    public void close() {
        pending.clear();
    }
}
