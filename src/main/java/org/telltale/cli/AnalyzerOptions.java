package org.telltale.cli;

import org.apache.lucene.analysis.Analyzer;
import org.telltale.text.Analyzers;
import picocli.CommandLine.Option;

/**
 * The {@code --analyzer} option: a preset name ({@code standard}, {@code english},
 * {@code whitespace}) or a custom chain spec (see docs/corpora.md). Use as
 * {@code @Mixin AnalyzerOptions analyzer;}. Store {@link #spec()} in files that must rebuild the
 * same analyzer later: {@code Analyzers.byName(spec)} gives it back.
 */
final class AnalyzerOptions {
    @Option(names = "--analyzer", paramLabel = "NAME|SPEC", defaultValue = "standard",
            description = "Tokenizer chain: standard, english (Porter stemming), whitespace, or custom:tokenizer=...;filters=... (default: ${DEFAULT-VALUE}).")
    String analyzer;

    private Analyzer built;

    /** The analyzer spec as given; {@code Analyzers.byName} accepts it. */
    String spec() {
        return analyzer;
    }

    /** The analyzer, built once; a usage error names the bad part of the spec. */
    Analyzer analyzer() {
        if (built == null) {
            built = Analyzers.byName(analyzer);
        }
        return built;
    }
}
