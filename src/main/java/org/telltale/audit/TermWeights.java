package org.telltale.audit;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.telltale.explain.Explanation;
import org.telltale.explain.Explanation.TermWeight;

/**
 * The explanations of an audit summed up per term and explained label: global importance
 * sqrt(Σ |w|) (Ribeiro et al. 2016, §4), mean signed weight, sign consistency, how many
 * explanations selected the term, and the first few documents where they did.
 *
 * <p>Not thread-safe; feed it explanations in a fixed order for a reproducible result.
 */
public final class TermWeights {
    /** How many example documents a term keeps for the report. */
    static final int MAX_EXAMPLES = 5;

    /** The running sums of one (term, label) pair. */
    public static final class Entry {
        private final String term;
        private final String label;
        private double sumAbs;
        private double sum;
        private int selected;
        private int positive;
        private final List<AuditResult.Example> examples = new ArrayList<>();

        Entry(String term, String label) {
            this.term = term;
            this.label = label;
        }

        public String term() {
            return term;
        }

        public String label() {
            return label;
        }

        public double importance() {
            return Math.sqrt(sumAbs);
        }

        public double meanWeight() {
            return selected == 0 ? 0 : sum / selected;
        }

        /** Share of the weights that have the sign of the mean (1 when all agree). */
        public double signConsistency() {
            if (selected == 0) {
                return 0;
            }
            int agreeing = meanWeight() >= 0 ? positive : selected - positive;
            return (double) agreeing / selected;
        }

        public int selected() {
            return selected;
        }

        public List<AuditResult.Example> examples() {
            return List.copyOf(examples);
        }
    }

    private final Map<String, Entry> entries = new LinkedHashMap<>();

    /** Adds one explanation's selected terms under the label it explains. */
    public void add(Explanation explanation) {
        for (TermWeight tw : explanation.terms()) {
            Entry e = entries.computeIfAbsent(tw.term() + '\u0000' + explanation.label(),
                    k -> new Entry(tw.term(), explanation.label()));
            e.sumAbs += Math.abs(tw.weight());
            e.sum += tw.weight();
            e.selected++;
            if (tw.weight() > 0) {
                e.positive++;
            }
            if (e.examples.size() < MAX_EXAMPLES) {
                e.examples.add(new AuditResult.Example(explanation.id(), tw.spans()));
            }
        }
    }

    /** Every (term, label) pair seen, in the order first seen. */
    public List<Entry> entries() {
        return List.copyOf(entries.values());
    }

    /** The distinct terms selected anywhere, sorted. */
    public Set<String> terms() {
        Set<String> terms = new TreeSet<>();
        entries.values().forEach(e -> terms.add(e.term));
        return terms;
    }

    /** The largest importance of any term for {@code label}; 0 when nothing was explained for it. */
    public double maxImportance(String label) {
        return entries.values().stream().filter(e -> e.label.equals(label))
                .mapToDouble(Entry::importance).max().orElse(0);
    }
}
