package org.telltale.model;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.telltale.TelltaleException;
import org.telltale.text.Analyzers;

/**
 * Turns a text into the term counts a built-in model reads: the Lucene terms of the named
 * analyzer and, with {@code ngrams = 2}, also every pair of adjacent terms, written as the two
 * terms joined by one space (no analyzer Telltale offers emits a term containing a space).
 *
 * <p>Thread-safe: Lucene analyzers keep one token stream per thread.
 */
public final class TermCounter implements AutoCloseable {
    /** Joins the two terms of a bigram. */
    public static final String BIGRAM_SEPARATOR = " ";

    private final String analyzerSpec;
    private final int ngrams;
    private final Analyzer analyzer;

    /**
     * @param analyzerSpec a name or spec that {@link Analyzers#byName} understands
     * @param ngrams       1 for terms only, 2 for terms and adjacent pairs
     * @throws TelltaleException when the analyzer is unknown or ngrams is not 1 or 2
     */
    public TermCounter(String analyzerSpec, int ngrams) {
        if (ngrams != 1 && ngrams != 2) {
            throw new TelltaleException("ngrams must be 1 or 2: " + ngrams);
        }
        try {
            this.analyzer = Analyzers.byName(analyzerSpec);
        } catch (IllegalArgumentException e) {
            throw new TelltaleException(e.getMessage(), e);
        }
        this.analyzerSpec = analyzerSpec;
        this.ngrams = ngrams;
    }

    public String analyzerSpec() {
        return analyzerSpec;
    }

    public int ngrams() {
        return ngrams;
    }

    /** The analyzer's terms of {@code text}, in order. */
    public List<String> terms(String text) {
        List<String> terms = new ArrayList<>();
        try (TokenStream stream = analyzer.tokenStream("text", text)) {
            CharTermAttribute term = stream.addAttribute(CharTermAttribute.class);
            stream.reset();
            while (stream.incrementToken()) {
                terms.add(term.toString());
            }
            stream.end();
        } catch (IOException e) {
            throw new UncheckedIOException("analyzer failed on an in-memory string", e);
        }
        return terms;
    }

    /** How often each feature (term, and bigram when ngrams is 2) occurs, in order of first appearance. */
    public Map<String, Integer> count(String text) {
        List<String> terms = terms(text);
        Map<String, Integer> counts = new LinkedHashMap<>();
        for (int i = 0; i < terms.size(); i++) {
            counts.merge(terms.get(i), 1, Integer::sum);
            if (ngrams == 2 && i > 0) {
                counts.merge(terms.get(i - 1) + BIGRAM_SEPARATOR + terms.get(i), 1, Integer::sum);
            }
        }
        return counts;
    }

    @Override
    public void close() {
        analyzer.close();
    }
}
