package org.telltale.audit;

import java.io.Serializable;
import java.math.BigDecimal;

/**
 * A sum of doubles kept exactly, so that parts added in any order and merged in any grouping give
 * the same total to the last bit: what lets a distributed front reduce the scrub test's score
 * drops by partition and still write the single machine's numbers. {@link #value()} rounds the
 * exact sum once. Infinite and NaN terms are summed apart, where IEEE addition of them is already
 * order-free (NaN absorbs, opposite infinities give NaN).
 *
 * <p>Immutable and thread-safe.
 */
public final class ExactSum implements Serializable {
    private static final long serialVersionUID = 1L;

    /** The empty sum. */
    public static final ExactSum ZERO = new ExactSum(BigDecimal.ZERO, 0, false);

    private final BigDecimal finite;
    private final double nonFinite;
    private final boolean hasNonFinite;

    private ExactSum(BigDecimal finite, double nonFinite, boolean hasNonFinite) {
        this.finite = finite;
        this.nonFinite = nonFinite;
        this.hasNonFinite = hasNonFinite;
    }

    /** This sum with {@code x} added. */
    public ExactSum plus(double x) {
        if (Double.isFinite(x)) {
            return new ExactSum(finite.add(new BigDecimal(x)), nonFinite, hasNonFinite);
        }
        return new ExactSum(finite, hasNonFinite ? nonFinite + x : x, true);
    }

    /** The sum of both. */
    public ExactSum plus(ExactSum other) {
        double special = hasNonFinite && other.hasNonFinite ? nonFinite + other.nonFinite
                : hasNonFinite ? nonFinite : other.nonFinite;
        return new ExactSum(finite.add(other.finite), special, hasNonFinite || other.hasNonFinite);
    }

    /** The exact sum rounded to the nearest double; infinite or NaN when such a term was added. */
    public double value() {
        return hasNonFinite ? nonFinite : finite.doubleValue();
    }

    @Override
    public boolean equals(Object o) {
        // Equal when the totals are: a non-finite term decides the total whatever the finite ones add to.
        if (!(o instanceof ExactSum s) || hasNonFinite != s.hasNonFinite) {
            return false;
        }
        return hasNonFinite ? Double.compare(nonFinite, s.nonFinite) == 0 : finite.compareTo(s.finite) == 0;
    }

    @Override
    public int hashCode() {
        return hasNonFinite ? Double.hashCode(nonFinite) : finite.signum() == 0 ? 0 : finite.stripTrailingZeros().hashCode();
    }

    @Override
    public String toString() {
        return Double.toString(value());
    }
}
