package org.telltale.text;

import java.util.ArrayList;
import java.util.List;
import org.apache.lucene.analysis.Analyzer;

/** The terms and spans an analyzer gives, for assertions. */
final class Tokens {
    private Tokens() {
    }

    static List<String> terms(Analyzer analyzer, String text) {
        List<String> terms = new ArrayList<>();
        TermIndex.forEachToken(text, analyzer, (term, span) -> terms.add(term));
        return terms;
    }

    static List<String> termsWithSpans(Analyzer analyzer, String text) {
        List<String> out = new ArrayList<>();
        TermIndex.forEachToken(text, analyzer, (term, span) -> out.add(term + "@" + span.start() + "-" + span.end()));
        return out;
    }
}
