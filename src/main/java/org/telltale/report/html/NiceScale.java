package org.telltale.report.html;

import java.util.ArrayList;
import java.util.List;

/**
 * Axis ticks at "nice" round numbers (1, 2 or 5 times a power of ten), after Heckbert,
 * "Nice numbers for graph labels", Graphics Gems (1990): the range is widened to whole ticks.
 */
record NiceScale(double min, double max, double step) {

    static NiceScale of(double low, double high, int ticks) {
        if (!(high > low)) {
            high = low + 1;
        }
        double range = nice(high - low, false);
        double step = nice(range / (ticks - 1), true);
        return new NiceScale(Math.floor(low / step) * step, Math.ceil(high / step) * step, step);
    }

    List<Double> ticks() {
        List<Double> ticks = new ArrayList<>();
        for (double t = min; t <= max + step * 1e-9; t += step) {
            ticks.add(Math.abs(t) < step * 1e-9 ? 0.0 : t);
        }
        return ticks;
    }

    /** Where {@code value} falls between {@code from} (at min) and {@code to} (at max). */
    double map(double value, double from, double to) {
        return from + (value - min) / (max - min) * (to - from);
    }

    static double nice(double x, boolean round) {
        double exponent = Math.floor(Math.log10(x));
        double fraction = x / Math.pow(10, exponent);
        double niceFraction;
        if (round) {
            niceFraction = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
        } else {
            niceFraction = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
        }
        return niceFraction * Math.pow(10, exponent);
    }
}
