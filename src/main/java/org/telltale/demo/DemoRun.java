package org.telltale.demo;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * The whole demo: generate the Quillmoor corpus in both variants, then train, serve and audit a
 * model for each, leaky first. See docs/demo.md.
 */
public final class DemoRun {
    static final List<String> VARIANTS = List.of("leaky", "clean");

    private DemoRun() {
    }

    public static DemoOutcome run(DemoSettings settings, DemoProgress progress) {
        DemoFolder folder = new DemoFolder(settings.out());
        folder.prepare(settings.force(), VARIANTS);
        progress.step(String.format(Locale.ROOT, "generating %d invented support messages of Quillmoor Broadband (seed %d)",
                settings.size(), settings.seed()));
        DemoCorpus corpus = new SupportCorpusGenerator(settings.seed(), settings.size()).generate();
        List<Path> files = CorpusFiles.write(corpus, folder.corpusDir());
        VariantRun variant = new VariantRun(settings, folder, progress);
        VariantOutcome leaky = variant.run("leaky", files.get(0), corpus.leaky());
        VariantOutcome clean = variant.run("clean", files.get(1), corpus.clean());
        return new DemoOutcome(leaky, clean);
    }
}
