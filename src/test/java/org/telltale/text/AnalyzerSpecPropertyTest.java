package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.apache.lucene.analysis.Analyzer;
import org.telltale.UsageException;

/**
 * Any spec string either builds an analyzer that survives arbitrary text, or is refused with a
 * {@link UsageException}; a spec that builds reads back from its canonical form to an equal spec.
 */
class AnalyzerSpecPropertyTest {
    private static final List<String> NAMES = List.of("standard", "whitespace", "keyword", "pattern", "ngram", "edgengram",
            "classic", "letter", "uax29urlemail", "pathhierarchy", "lowercase", "uppercase", "porterstem", "kstem", "stop",
            "length", "shingle", "worddelimitergraph", "worddelimiter", "asciifolding", "synonymgraph", "trim", "truncate",
            "reversestring", "limittokencount", "htmlstrip", "mapping", "patternreplace", "englishpossessive", "nosuch");
    private static final List<String> PARAMS = List.of("min", "max", "pattern", "words", "maxTokenLength", "minGramSize",
            "maxGramSize", "preserveOriginal", "prefixLength", "maxTokenCount", "replacement", "group", "ignoreCase", "x");
    private static final List<String> VALUES = List.of("0", "1", "2", "3", "-5", "true", "false", "a", "\"[,;]+\"", "\"(\"",
            "stopwords.txt", "99999999999", "\"\"");

    @Provide
    Arbitrary<String> specs() {
        Arbitrary<String> param = Arbitraries.of(PARAMS).flatMap(p -> Arbitraries.of(VALUES).map(v -> p + "=" + v));
        Arbitrary<String> stage = Arbitraries.of(NAMES).flatMap(name -> param.list().ofMaxSize(3)
                .map(ps -> ps.isEmpty() ? name : name + "(" + String.join(",", ps) + ")"));
        Arbitrary<String> stages = stage.list().ofMinSize(1).ofMaxSize(3).map(l -> String.join(",", l));
        Arbitrary<String> part = Arbitraries.of("tokenizer", "filters", "charfilters", "filter", "Tokenizer")
                .flatMap(key -> stages.map(s -> key + "=" + s));
        Arbitrary<String> structured = part.list().ofMinSize(1).ofMaxSize(3).map(l -> "custom:" + String.join(";", l));
        Arbitrary<String> noise = Arbitraries.strings().ofMaxLength(30).map(s -> "custom:" + s);
        return Arbitraries.oneOf(structured, structured, noise, Arbitraries.strings().ofMaxLength(12));
    }

    @Property(tries = 1500)
    void specsBuildOrAreRefusedWithAUsageError(@ForAll("specs") String spec, @ForAll("texts") String text) {
        Analyzer analyzer;
        try {
            analyzer = Analyzers.byName(spec);
        } catch (UsageException refused) {
            return;
        }
        AnalyzerSpec parsed = AnalyzerSpec.parse(spec);
        assertEquals(parsed, AnalyzerSpec.parse(parsed.toString()));
        for (UnitKind kind : UnitKind.values()) {
            TermIndex index = TermIndex.of(text, analyzer, kind);
            assertEquals(text, Masker.cutting().mask(index, new java.util.BitSet()));
        }
    }

    @Provide
    Arbitrary<String> texts() {
        return Arbitraries.strings().ofMaxLength(60);
    }
}
