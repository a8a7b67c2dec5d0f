package org.telltale.report.html;

import java.util.Locale;

/**
 * Contrast between two sRGB colours as WCAG 2.1 defines it (success criterion 1.4.3, "relative
 * luminance" and "contrast ratio" in the glossary): ratios run from 1:1 to 21:1, and AA asks
 * 4.5:1 for body text and 3:1 for large text and user-interface graphics (1.4.11).
 */
public final class Contrast {
    /** WCAG 2.1 AA for normal text. */
    public static final double AA_TEXT = 4.5;
    /** WCAG 2.1 AA for large text and non-text graphics such as underlines and chart marks. */
    public static final double AA_GRAPHICS = 3.0;

    private Contrast() {
    }

    /** The contrast ratio (L1 + 0.05) / (L2 + 0.05), lighter over darker, of two {@code #rrggbb} colours. */
    public static double ratio(String hexA, String hexB) {
        double a = relativeLuminance(hexA);
        double b = relativeLuminance(hexB);
        return (Math.max(a, b) + 0.05) / (Math.min(a, b) + 0.05);
    }

    /** WCAG 2.1 relative luminance: 0.2126 R + 0.7152 G + 0.0722 B of the linearised sRGB channels. */
    public static double relativeLuminance(String hex) {
        int rgb = parse(hex);
        return 0.2126 * linear((rgb >> 16) & 0xff) + 0.7152 * linear((rgb >> 8) & 0xff) + 0.0722 * linear(rgb & 0xff);
    }

    private static double linear(int channel) {
        double c = channel / 255.0;
        // WCAG 2.1 states the threshold as 0.03928 (sRGB's own is 0.04045; no 8-bit value lies between).
        return c <= 0.03928 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }

    static int parse(String hex) {
        if (hex == null || !hex.matches("#[0-9a-fA-F]{6}")) {
            throw new IllegalArgumentException("colour must be #rrggbb: " + hex);
        }
        return Integer.parseInt(hex.substring(1).toLowerCase(Locale.ROOT), 16);
    }
}
