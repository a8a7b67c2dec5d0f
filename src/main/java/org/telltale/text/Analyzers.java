package org.telltale.text;

import org.apache.lucene.analysis.Analyzer;

/**
 * Named factories for the analyzers Telltale offers, and the way back from a stored spec to an
 * analyzer. Every preset keeps stop words: in an explanation "not" and "no" often matter most.
 *
 * <p>A spec is a preset name or a custom chain (see {@link AnalyzerSpec}); a file that must
 * rebuild the same analyzer stores {@link #canonical(String)} of the spec and later calls
 * {@link #byName(String)} with it. Lucene analyzers are thread-safe.
 */
public final class Analyzers {
    private Analyzers() {
    }

    /** Unicode word boundaries (UAX #29), lower-cased. */
    public static Analyzer standard() {
        return AnalyzerSpec.parse("standard").build();
    }

    /** Standard tokens, possessives removed, lower-cased and Porter-stemmed. */
    public static Analyzer english() {
        return AnalyzerSpec.parse("english").build();
    }

    /** Runs of non-whitespace, case kept. */
    public static Analyzer whitespace() {
        return AnalyzerSpec.parse("whitespace").build();
    }

    /**
     * The analyzer a spec describes: {@code standard}, {@code english}, {@code whitespace} or
     * {@code custom:tokenizer=...;filters=...}.
     *
     * @throws org.telltale.UsageException naming the bad key, component or parameter
     */
    public static Analyzer byName(String spec) {
        return AnalyzerSpec.parse(spec).build();
    }

    /** The canonical form of a spec: equal analyzers, equal strings; {@link #byName} reads it back. */
    public static String canonical(String spec) {
        return AnalyzerSpec.parse(spec).toString();
    }
}
