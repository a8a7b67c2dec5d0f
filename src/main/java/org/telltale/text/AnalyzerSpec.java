package org.telltale.text;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.CharArraySet;
import org.apache.lucene.analysis.core.WhitespaceAnalyzer;
import org.apache.lucene.analysis.custom.CustomAnalyzer;
import org.apache.lucene.analysis.en.EnglishAnalyzer;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.telltale.UsageException;

/**
 * An analyzer described by a string, so that a model file or a report can store it and rebuild
 * exactly the same analyzer later. Either a preset ({@code standard}, {@code english},
 * {@code whitespace}) or a custom chain of Lucene components:
 *
 * <pre>
 * custom:tokenizer=standard;filters=lowercase,length(min=2,max=40),porterstem
 * custom:charfilters=htmlstrip;tokenizer=whitespace;filters=lowercase
 * custom:tokenizer=pattern(pattern="[,;]+")
 * </pre>
 *
 * Components are named as Lucene's analysis factories name themselves (case does not matter);
 * parameters go in parentheses; a value holding {@code , ; ( ) = "} or spaces is written in
 * double quotes, a quote inside written twice. {@link #toString()} gives the canonical form, which
 * {@link #parse} reads back to an equal spec.
 *
 * @param preset      the preset name, or {@code null} for a custom chain
 * @param charFilters for a custom chain, the character filters applied before tokenizing
 * @param tokenizer   for a custom chain, the tokenizer; {@code null} for a preset
 * @param filters     for a custom chain, the token filters in order
 */
public record AnalyzerSpec(String preset, List<Stage> charFilters, Stage tokenizer, List<Stage> filters) {
    /** The prefix of custom chains. */
    public static final String CUSTOM = "custom:";

    /** The presets and the custom chains they equal (checked in tests against Lucene's own analyzers). */
    static final Map<String, String> PRESETS = Map.of(
            "standard", "custom:tokenizer=standard;filters=lowercase",
            "english", "custom:tokenizer=standard;filters=englishpossessive,lowercase,porterstem",
            "whitespace", "custom:tokenizer=whitespace");

    /**
     * One component of a chain: a Lucene factory name (lower-cased) and its parameters.
     *
     * @param params parameter names to values, sorted by name
     */
    public record Stage(String name, Map<String, String> params) {
        public Stage {
            Objects.requireNonNull(name, "name");
            params = Collections.unmodifiableMap(new TreeMap<>(params));
        }

        @Override
        public String toString() {
            if (params.isEmpty()) {
                return name;
            }
            List<String> parts = new ArrayList<>();
            params.forEach((key, value) -> parts.add(key + "=" + AnalyzerSpecParser.quoteIfNeeded(value)));
            return name + "(" + String.join(",", parts) + ")";
        }
    }

    public AnalyzerSpec {
        charFilters = charFilters == null ? List.of() : List.copyOf(charFilters);
        filters = filters == null ? List.of() : List.copyOf(filters);
        if ((preset == null) == (tokenizer == null)) {
            throw new IllegalArgumentException("an analyzer spec is either a preset or a chain with a tokenizer");
        }
    }

    /**
     * Reads a spec; a {@link UsageException} names the bad key, component or parameter.
     *
     * @param spec a preset name or {@code custom:...}
     */
    public static AnalyzerSpec parse(String spec) {
        return AnalyzerSpecParser.parse(spec);
    }

    public boolean isPreset() {
        return preset != null;
    }

    /** The same analyzer as a custom chain: presets expand to their components. */
    public AnalyzerSpec expanded() {
        return isPreset() ? parse(PRESETS.get(preset)) : this;
    }

    /** The canonical form: the preset name, or the chain with lower-case names and sorted parameters. */
    @Override
    public String toString() {
        if (isPreset()) {
            return preset;
        }
        List<String> parts = new ArrayList<>();
        if (!charFilters.isEmpty()) {
            parts.add("charfilters=" + join(charFilters));
        }
        parts.add("tokenizer=" + tokenizer);
        if (!filters.isEmpty()) {
            parts.add("filters=" + join(filters));
        }
        return CUSTOM + String.join(";", parts);
    }

    /** A new analyzer for this spec. Presets keep stop words: "not" and "no" often matter most. */
    public Analyzer build() {
        if (isPreset()) {
            return switch (preset) {
                case "standard" -> new StandardAnalyzer(CharArraySet.EMPTY_SET);
                case "english" -> new EnglishAnalyzer(CharArraySet.EMPTY_SET);
                case "whitespace" -> new WhitespaceAnalyzer();
                default -> throw new IllegalStateException("preset without a builder: " + preset);
            };
        }
        try {
            CustomAnalyzer.Builder builder = CustomAnalyzer.builder();
            for (Stage stage : charFilters) {
                builder.addCharFilter(stage.name(), mutable(stage));
            }
            builder.withTokenizer(tokenizer.name(), mutable(tokenizer));
            for (Stage stage : filters) {
                builder.addTokenFilter(stage.name(), mutable(stage));
            }
            Analyzer analyzer = builder.build();
            tryOnce(analyzer);
            return analyzer;
        } catch (IllegalArgumentException | IllegalStateException | IndexOutOfBoundsException e) {
            throw new UsageException("analyzer spec '" + this + "': " + e.getMessage());
        } catch (IOException e) {
            throw new UsageException("analyzer spec '" + this + "': cannot load " + e.getMessage()
                    + " (parameters naming files are not supported: a stored spec must rebuild anywhere)");
        }
    }

    /** Text that reaches most code paths of a chain: letters, digits, punctuation, markup, scripts. */
    private static final String TRIAL = "Aa Bb Cc Dd Ee Ff Gg Hh Ii Jj Kk Ll Mm Nn Oo Pp Qq Rr Ss Tt Uu Vv Ww Xx Yy Zz 0123456789"
            + " .,;:!?-_'\"()[]{}<>/\\@#$%&*+=~`|^ <b>x</b> &amp; caf\u00e9 \u65e5\u672c \ud83d\ude00 wi-fi 3.5 U.S.A.\n\r\n";

    /**
     * Some factories check their parameters only when the first token stream is made (n-gram
     * sizes, pattern groups); analyzing a trial text once turns those into errors here, where the
     * spec can be named, rather than in the middle of an audit.
     */
    private static void tryOnce(Analyzer analyzer) throws IOException {
        try (var stream = analyzer.tokenStream("text", TRIAL)) {
            stream.reset();
            while (stream.incrementToken()) {
                // consume
            }
            stream.end();
        }
    }

    /** Factories consume their parameters from the map, so each gets its own copy. */
    private static Map<String, String> mutable(Stage stage) {
        return new HashMap<>(stage.params());
    }

    private static String join(List<Stage> stages) {
        List<String> parts = new ArrayList<>();
        stages.forEach(stage -> parts.add(stage.toString()));
        return String.join(",", parts);
    }
}
