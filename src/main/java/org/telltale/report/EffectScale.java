package org.telltale.report;

import java.util.Locale;
import org.telltale.explain.Explanation;

/**
 * How big a weight looks in a view. Bars are a fixed share of the score range, not of the
 * document's largest weight, so a document whose weights are all near zero shows short bars, not
 * full ones: a full bar is a weight of {@link #FULL_PROBABILITY} in probability or
 * {@link #FULL_LOG_ODDS} in log-odds (which moves an even chance to 0.982). Weights print with
 * enough digits to be told from zero; an explanation whose every weight and interval end is below
 * {@link #NEGLIGIBLE} of a full bar has "no measurable effect". Intervals are shown so that they
 * hold their own estimate (an older file's bootstrap percentiles may not).
 */
public final class EffectScale {
    public static final double FULL_PROBABILITY = 0.5;
    public static final double FULL_LOG_ODDS = 4.0;
    /** A share of a full bar below which an effect is not measurable at the shown precision. */
    public static final double NEGLIGIBLE = 1e-4;

    private final double full;
    private final String unit;

    private EffectScale(double full, String unit) {
        this.full = full;
        this.unit = unit;
    }

    /** The scale of an explanation's target (probability unless its method says log-odds). */
    public static EffectScale of(Explanation e) {
        return of(e.method());
    }

    /** The scale of a method's target; probability when the method is unknown. */
    public static EffectScale of(Explanation.Method m) {
        boolean logOdds = m != null && m.logOdds();
        return logOdds ? new EffectScale(FULL_LOG_ODDS, "log-odds") : new EffectScale(FULL_PROBABILITY, "probability");
    }

    /** The weight a full bar stands for. */
    public double full() {
        return full;
    }

    /** The weight of a full bar as short plain text, e.g. "0.5" or "4". */
    public String fullText() {
        return java.math.BigDecimal.valueOf(full).stripTrailingZeros().toPlainString();
    }

    /** {@code probability} or {@code log-odds}. */
    public String unit() {
        return unit;
    }

    /** |weight| as a share of a full bar, in [0, 1] (larger weights are cut at a full bar). */
    public double share(double weight) {
        return Double.isNaN(weight) ? 0 : Math.min(1, Math.abs(weight) / full);
    }

    /** True when the weight's bar would be longer than a full one. */
    public boolean beyond(double weight) {
        return Math.abs(weight) > full;
    }

    /** True when no weight or interval end of {@code e} reaches {@link #NEGLIGIBLE} of a full bar. */
    public boolean nothingMeasurable(Explanation e) {
        double limit = NEGLIGIBLE * full;
        for (Explanation.TermWeight t : e.terms()) {
            if (Math.abs(t.weight()) >= limit || Math.abs(t.low()) >= limit || Math.abs(t.high()) >= limit) {
                return false;
            }
        }
        return true;
    }

    /** The lower end shown for a term: never above its weight. */
    public static double low(Explanation.TermWeight t) {
        return Double.isNaN(t.low()) ? t.weight() : Math.min(t.low(), t.weight());
    }

    /** The upper end shown for a term: never below its weight. */
    public static double high(Explanation.TermWeight t) {
        return Double.isNaN(t.high()) ? t.weight() : Math.max(t.high(), t.weight());
    }

    /**
     * A signed number with four decimals, or in scientific notation with three significant digits
     * when that would print a non-zero value as ±0.0000; exactly 0 prints as {@code +0}.
     */
    public static String signed(double v) {
        if (Double.isNaN(v)) {
            return "n/a";
        }
        if (v == 0) {
            return "+0";
        }
        if (Math.abs(v) < 0.00005) {
            return String.format(Locale.ROOT, "%+.2e", v);
        }
        return String.format(Locale.ROOT, "%+.4f", v);
    }
}
