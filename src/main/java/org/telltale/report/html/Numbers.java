package org.telltale.report.html;

import java.util.Locale;

/** Number formats of the reports, fixed to {@code Locale.ROOT} so a report reads the same everywhere. */
final class Numbers {
    private Numbers() {
    }

    /** A weight with its sign, e.g. {@code +0.213} or {@code −0.048} (with a true minus sign). */
    static String signed(double value) {
        if (Double.isNaN(value)) {
            return "n/a";
        }
        // Three decimals, or three significant digits when that would show a non-zero value as ±0.000.
        String s = value != 0 && Math.abs(value) < 0.0005 ? String.format(Locale.ROOT, "%+.2e", value)
                : String.format(Locale.ROOT, "%+.3f", value);
        return s.startsWith("-") ? "\u2212" + s.substring(1) : s;
    }

    static String plain(double value, int decimals) {
        if (Double.isNaN(value)) {
            return "n/a";
        }
        return String.format(Locale.ROOT, "%." + decimals + "f", value);
    }

    static String percent(double share) {
        if (Double.isNaN(share)) {
            return "n/a";
        }
        return String.format(Locale.ROOT, "%.1f%%", share * 100);
    }

    /** A coordinate for an SVG attribute: two decimals, never a locale's decimal comma. */
    static String coord(double value) {
        return String.format(Locale.ROOT, "%.2f", value);
    }
}
