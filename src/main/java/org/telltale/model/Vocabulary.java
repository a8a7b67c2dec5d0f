package org.telltale.model;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The features a built-in model knows, each with its column number. Terms outside the vocabulary
 * are ignored when scoring, as the multinomial models of the textbooks do.
 *
 * <p>Immutable and thread-safe.
 */
public final class Vocabulary {
    private final List<String> terms;
    private final Map<String, Integer> index;

    /** @throws IllegalArgumentException when a term is null or repeated */
    public Vocabulary(List<String> terms) {
        this.terms = List.copyOf(terms);
        this.index = new HashMap<>(terms.size() * 2);
        for (int i = 0; i < this.terms.size(); i++) {
            Integer previous = index.put(this.terms.get(i), i);
            if (previous != null) {
                throw new IllegalArgumentException("term '" + this.terms.get(i) + "' appears twice, at "
                        + previous + " and " + i);
            }
        }
    }

    public int size() {
        return terms.size();
    }

    public List<String> terms() {
        return terms;
    }

    public String term(int column) {
        return terms.get(column);
    }

    /** The column of {@code term}, or -1 when the model does not know it. */
    public int indexOf(String term) {
        Integer i = index.get(term);
        return i == null ? -1 : i;
    }

    /**
     * The known features of {@code counts} as a sparse vector with columns in increasing order;
     * unknown terms are left out.
     */
    public SparseCounts vectorize(Map<String, Integer> counts) {
        int[] columns = new int[counts.size()];
        int n = 0;
        for (String term : counts.keySet()) {
            int c = indexOf(term);
            if (c >= 0) {
                columns[n++] = c;
            }
        }
        columns = Arrays.copyOf(columns, n);
        Arrays.sort(columns);
        double[] values = new double[n];
        for (int k = 0; k < n; k++) {
            values[k] = counts.get(terms.get(columns[k]));
        }
        return new SparseCounts(columns, values);
    }

    /** A vocabulary of the given terms sorted in {@link String} order, so files do not depend on corpus order. */
    public static Vocabulary sortedOf(Iterable<String> terms) {
        List<String> list = new ArrayList<>();
        terms.forEach(list::add);
        list.sort(null);
        return new Vocabulary(list);
    }
}
