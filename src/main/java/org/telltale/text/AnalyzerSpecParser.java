package org.telltale.text;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.BiConsumer;
import org.apache.lucene.analysis.CharFilterFactory;
import org.apache.lucene.analysis.TokenFilterFactory;
import org.apache.lucene.analysis.TokenizerFactory;
import org.telltale.UsageException;

/**
 * Reads {@link AnalyzerSpec} strings. Grammar:
 *
 * <pre>
 * spec     = preset | "custom:" part (";" part)*
 * part     = key "=" stage ("," stage)*        key: tokenizer (exactly one stage), charfilters, filters
 * stage    = name [ "(" param ("," param)* ")" ]
 * param    = name "=" value
 * value    = bare | '"' (any char, '""' for a quote)* '"'
 * </pre>
 *
 * Every key, component name and parameter is checked here, against the components Lucene
 * offers, so the error names the exact bad part.
 */
final class AnalyzerSpecParser {
    private static final Set<String> KEYS = Set.of("tokenizer", "charfilters", "filters");
    private static final String SPECIAL = ",;()=\"";

    private final String spec;
    private int at;

    private AnalyzerSpecParser(String spec) {
        this.spec = spec;
    }

    static AnalyzerSpec parse(String spec) {
        if (spec == null || spec.isBlank()) {
            throw new UsageException("empty analyzer spec (expected standard, english, whitespace or custom:tokenizer=...)");
        }
        String trimmed = spec.strip();
        String lower = trimmed.toLowerCase(Locale.ROOT);
        if (AnalyzerSpec.PRESETS.containsKey(lower)) {
            return new AnalyzerSpec(lower, null, null, null);
        }
        if (!lower.startsWith(AnalyzerSpec.CUSTOM)) {
            throw new UsageException("unknown analyzer '" + spec + "' (expected standard, english, whitespace or custom:tokenizer=...)");
        }
        return new AnalyzerSpecParser(trimmed).chain();
    }

    private AnalyzerSpec chain() {
        at = AnalyzerSpec.CUSTOM.length();
        Map<String, List<AnalyzerSpec.Stage>> parts = new LinkedHashMap<>();
        while (true) {
            skipSpaces();
            String key = word("a key (tokenizer, charfilters or filters)").toLowerCase(Locale.ROOT);
            if (!KEYS.contains(key)) {
                throw error("unknown key '" + key + "' (expected tokenizer, charfilters or filters)");
            }
            if (parts.containsKey(key)) {
                throw error("key '" + key + "' given twice");
            }
            expect('=');
            List<AnalyzerSpec.Stage> stages = new ArrayList<>();
            do {
                stages.add(stage());
            } while (accept(','));
            parts.put(key, stages);
            skipSpaces();
            if (at == spec.length()) {
                break;
            }
            expect(';');
            skipSpaces();
            if (at == spec.length()) {
                break; // a trailing semicolon is harmless
            }
        }
        List<AnalyzerSpec.Stage> tokenizers = parts.get("tokenizer");
        if (tokenizers == null) {
            throw new UsageException("analyzer spec '" + spec + "': no tokenizer (add tokenizer=standard, for example)");
        }
        if (tokenizers.size() != 1) {
            throw new UsageException("analyzer spec '" + spec + "': exactly one tokenizer allowed, got " + tokenizers.size());
        }
        AnalyzerSpec.Stage tokenizer = tokenizers.get(0);
        check(tokenizer, "tokenizer", TokenizerFactory.availableTokenizers(), TokenizerFactory::forName);
        List<AnalyzerSpec.Stage> charFilters = parts.getOrDefault("charfilters", List.of());
        charFilters.forEach(s -> check(s, "char filter", CharFilterFactory.availableCharFilters(), CharFilterFactory::forName));
        List<AnalyzerSpec.Stage> filters = parts.getOrDefault("filters", List.of());
        filters.forEach(s -> check(s, "filter", TokenFilterFactory.availableTokenFilters(), TokenFilterFactory::forName));
        return new AnalyzerSpec(null, charFilters, tokenizer, filters);
    }

    private AnalyzerSpec.Stage stage() {
        skipSpaces();
        String name = word("a component name").toLowerCase(Locale.ROOT);
        Map<String, String> params = new LinkedHashMap<>();
        skipSpaces();
        if (accept('(')) {
            do {
                skipSpaces();
                String key = word("a parameter name");
                expect('=');
                String value = value();
                if (params.put(key, value) != null) {
                    throw error("parameter '" + key + "' of '" + name + "' given twice");
                }
                skipSpaces();
            } while (accept(','));
            expect(')');
        }
        return new AnalyzerSpec.Stage(name, params);
    }

    private String value() {
        skipSpaces();
        if (at < spec.length() && spec.charAt(at) == '"') {
            StringBuilder out = new StringBuilder();
            at++;
            while (true) {
                if (at >= spec.length()) {
                    throw error("unterminated quoted value");
                }
                char c = spec.charAt(at++);
                if (c == '"') {
                    if (at < spec.length() && spec.charAt(at) == '"') {
                        out.append('"');
                        at++;
                    } else {
                        return out.toString();
                    }
                } else {
                    out.append(c);
                }
            }
        }
        int start = at;
        while (at < spec.length() && SPECIAL.indexOf(spec.charAt(at)) < 0) {
            at++;
        }
        return spec.substring(start, at).strip();
    }

    private String word(String what) {
        int start = at;
        while (at < spec.length() && (Character.isLetterOrDigit(spec.charAt(at)) || spec.charAt(at) == '_' || spec.charAt(at) == '.')) {
            at++;
        }
        if (start == at) {
            throw error("expected " + what);
        }
        return spec.substring(start, at);
    }

    private boolean accept(char c) {
        skipSpaces();
        if (at < spec.length() && spec.charAt(at) == c) {
            at++;
            return true;
        }
        return false;
    }

    private void expect(char c) {
        if (!accept(c)) {
            throw error("expected '" + c + "'");
        }
    }

    private void skipSpaces() {
        while (at < spec.length() && Character.isWhitespace(spec.charAt(at))) {
            at++;
        }
    }

    private UsageException error(String what) {
        String found = at < spec.length() ? "'" + spec.charAt(at) + "'" : "the end";
        return new UsageException("analyzer spec '" + spec + "': " + what + " at position " + (at + 1) + " (found " + found + ")");
    }

    /** Checks that Lucene knows the component and accepts its parameters, naming both if not. */
    private void check(AnalyzerSpec.Stage stage, String role, Set<String> available, BiConsumer<String, Map<String, String>> create) {
        Set<String> known = new TreeSet<>();
        available.forEach(n -> known.add(n.toLowerCase(Locale.ROOT)));
        if (!known.contains(stage.name())) {
            throw new UsageException("analyzer spec '" + spec + "': unknown " + role + " '" + stage.name() + "' (known: "
                    + String.join(", ", known) + ")");
        }
        try {
            create.accept(stage.name(), new java.util.HashMap<>(stage.params()));
        } catch (IllegalArgumentException e) {
            throw new UsageException("analyzer spec '" + spec + "': " + role + " '" + stage.name() + "': " + e.getMessage());
        }
    }

    /** Writes {@code value} bare when it can be read back bare, else in double quotes. */
    static String quoteIfNeeded(String value) {
        boolean bare = !value.isEmpty() && value.strip().equals(value);
        for (int i = 0; bare && i < value.length(); i++) {
            bare = SPECIAL.indexOf(value.charAt(i)) < 0;
        }
        return bare ? value : "\"" + value.replace("\"", "\"\"") + "\"";
    }
}
