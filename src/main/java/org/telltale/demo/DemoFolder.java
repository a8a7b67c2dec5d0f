package org.telltale.demo;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.telltale.TelltaleException;
import org.telltale.UsageException;
import org.telltale.audit.OutputFolder;

/**
 * The demo's output folder and where each file goes in it:
 * <pre>
 * OUT/report.html, OUT/audit.json, ...   the audit of the model trained on the leaky corpus
 * OUT/clean/report.html, ...             the audit of the model trained on the clean corpus
 * OUT/corpus/                            the generated corpora and their held-out parts
 * OUT/models/                            the two trained model files
 * </pre>
 * An earlier demo's files are replaced only with {@code --force}, and then only the files the
 * demo writes: nothing else in the folder is touched.
 */
public final class DemoFolder {
    /** What an audit writes into its folder; removed before a forced rerun. */
    static final List<String> AUDIT_FILES = List.of(OutputFolder.REPORT, OutputFolder.AUDIT, OutputFolder.EXPLANATIONS,
            OutputFolder.JOURNAL);

    private final Path root;

    public DemoFolder(Path root) {
        this.root = root;
    }

    public Path root() {
        return root;
    }

    /** The folder of one variant's audit: the root for the leaky variant, {@code clean/} for the clean one. */
    public Path auditDir(String variant) {
        return "leaky".equals(variant) ? root : root.resolve(variant);
    }

    public Path corpusDir() {
        return root.resolve("corpus");
    }

    public Path model(String variant) {
        return root.resolve("models").resolve("support-" + variant + ".json");
    }

    public Path report(String variant) {
        return auditDir(variant).resolve(OutputFolder.REPORT);
    }

    /**
     * Makes the folder ready: refuses an earlier demo's output unless {@code force}, and with it
     * deletes exactly the files a demo writes.
     */
    public void prepare(boolean force, List<String> variants) {
        List<Path> earlier = new ArrayList<>();
        for (String variant : variants) {
            for (String name : AUDIT_FILES) {
                earlier.add(auditDir(variant).resolve(name));
            }
            earlier.add(model(variant));
        }
        List<Path> present = earlier.stream().filter(Files::exists).toList();
        if (!present.isEmpty() && !force) {
            throw new UsageException(root + " holds an earlier demo (" + present.get(0).getFileName()
                    + "); pass {force} to replace it or {out} to write elsewhere");
        }
        try {
            for (Path file : present) {
                Files.delete(file);
            }
            Files.createDirectories(corpusDir());
            Files.createDirectories(model(variants.get(0)).getParent());
            for (String variant : variants) {
                Files.createDirectories(auditDir(variant));
            }
        } catch (IOException e) {
            throw new TelltaleException("cannot prepare the demo folder " + root + ": " + e.getMessage(), e);
        }
    }
}
