package org.telltale.text;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * What a corpus read passed over, by reason, with the first messages kept in full so a command
 * can print {@code skipped 3 bad lines (2 invalid JSON, 1 missing text)} and, when asked, where.
 *
 * @param counts   records passed over per reason, in the order of {@link SkipReason}
 * @param examples the first {@link #MAX_EXAMPLES} messages, each naming file, line and id
 * @param noun     what a record is in this format: {@code line}, {@code row} or {@code file}
 */
public record SkipReport(Map<SkipReason, Integer> counts, List<String> examples, String noun) {
    public static final int MAX_EXAMPLES = 20;

    public SkipReport {
        EnumMap<SkipReason, Integer> copy = new EnumMap<>(SkipReason.class);
        copy.putAll(counts);
        counts = java.util.Collections.unmodifiableMap(copy);
        examples = List.copyOf(examples);
    }

    public int count(SkipReason reason) {
        return counts.getOrDefault(reason, 0);
    }

    /** Records skipped because they were broken (only possible with skip-bad). */
    public int bad() {
        return counts.entrySet().stream().filter(e -> e.getKey().bad()).mapToInt(Map.Entry::getValue).sum();
    }

    /** Files passed over because they are not documents (binary, not .txt, links leaving the corpus). */
    public int ignored() {
        return counts.entrySet().stream().filter(e -> !e.getKey().bad()).mapToInt(Map.Entry::getValue).sum();
    }

    public boolean isEmpty() {
        return counts.isEmpty();
    }

    /**
     * One line for stderr, e.g. {@code skipped 3 bad lines (2 invalid JSON, 1 missing text)}, or
     * {@code skipped 1 bad file (1 invalid UTF-8); ignored 2 files (1 binary file, 1 not a .txt file)};
     * empty when nothing was passed over.
     */
    public String summary() {
        List<String> parts = new ArrayList<>();
        if (bad() > 0) {
            parts.add("skipped " + bad() + " bad " + plural(noun, bad()) + " (" + breakdown(true) + ")");
        }
        if (ignored() > 0) {
            parts.add("ignored " + ignored() + " " + plural("file", ignored()) + " (" + breakdown(false) + ")");
        }
        return String.join("; ", parts);
    }

    private String breakdown(boolean bad) {
        List<String> parts = new ArrayList<>();
        counts.forEach((reason, n) -> {
            if (reason.bad() == bad) {
                parts.add(n + " " + reason.phrase());
            }
        });
        return String.join(", ", parts);
    }

    private static String plural(String word, int n) {
        return n == 1 ? word : word + "s";
    }
}
