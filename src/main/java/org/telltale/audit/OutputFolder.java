package org.telltale.audit;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import org.telltale.TelltaleException;
import org.telltale.UsageException;

/**
 * The folder an audit writes into. Every file it hands out is a plain name directly inside the
 * folder, never a symbolic link, so no output can land outside it; finished outputs are written
 * to a temporary file and moved into place, so a killed run never leaves half a report. An
 * earlier audit's results are not overwritten unless asked ({@code --force}, or {@code --resume}
 * to finish the same audit).
 */
public final class OutputFolder {
    public static final String AUDIT = "audit.json";
    public static final String EXPLANATIONS = "explanations.jsonl";
    public static final String JOURNAL = "journal.jsonl";
    public static final String REPORT = "report.html";

    private final Path dir;

    private OutputFolder(Path dir) {
        this.dir = dir;
    }

    /**
     * Opens (creating if needed) {@code dir} for an audit.
     *
     * @throws UsageException when earlier results or an unfinished journal are there and neither
     *                        {@code force} nor {@code resume} was given
     */
    public static OutputFolder open(Path dir, boolean force, boolean resume) {
        Path normal = dir.toAbsolutePath().normalize();
        try {
            Files.createDirectories(normal);
        } catch (IOException e) {
            throw new TelltaleException("cannot create output folder " + dir + ": " + e.getMessage(), e);
        }
        OutputFolder folder = new OutputFolder(normal);
        if (!force && !resume) {
            for (String name : List.of(AUDIT, REPORT)) {
                if (Files.exists(folder.file(name), LinkOption.NOFOLLOW_LINKS)) {
                    throw new UsageException(folder.file(name) + " exists: use {force} to overwrite it, or {out} "
                            + "for another folder");
                }
            }
            if (Files.exists(folder.file(JOURNAL), LinkOption.NOFOLLOW_LINKS)) {
                throw new UsageException(folder.file(JOURNAL) + " holds an unfinished audit: use {resume} to "
                        + "finish it, or {force} to start over");
            }
        }
        return folder;
    }

    public Path dir() {
        return dir;
    }

    /** The path of {@code name} inside the folder; refuses names with separators and symbolic links. */
    public Path file(String name) {
        Path resolved = dir.resolve(name).normalize();
        if (name.isEmpty() || name.contains("/") || name.contains("\\") || name.equals("..") || name.equals(".")
                || !dir.equals(resolved.getParent())) {
            throw new TelltaleException("output name '" + name + "' would leave " + dir);
        }
        if (Files.isSymbolicLink(resolved)) {
            throw new TelltaleException("refusing to write through a symbolic link: " + resolved);
        }
        return resolved;
    }

    /** Writes {@code content} as UTF-8 to {@code name}, atomically where the file system allows. */
    public Path write(String name, String content) {
        Path target = file(name);
        Path temp = file("." + name + ".tmp");
        try {
            Files.writeString(temp, content, StandardCharsets.UTF_8);
            try {
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
            }
            return target;
        } catch (IOException e) {
            throw new TelltaleException("cannot write " + target + ": " + e.getMessage(), e);
        }
    }
}
