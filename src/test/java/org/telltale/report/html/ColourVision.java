package org.telltale.report.html;

import java.util.Locale;

/**
 * Simulated colour-vision deficiencies and colour differences, for checking the report palette.
 *
 * <p>Dichromacy is simulated with the severity-1.0 matrices of Machado, Oliveira and Fernandes,
 * "A Physiologically-based Model for Simulation of Color Vision Deficiency", IEEE TVCG 15(6),
 * 2009, applied to gamma-encoded sRGB channels as the authors' published tables and the culori
 * library do. The matrix values were written from memory and are cross-checked against culori's
 * {@code filterDeficiency*} in {@link ColourVisionTest}. Differences are CIE 1976 ΔE*ab in
 * CIELAB under D65 (CIE 15:2004), from sRGB as IEC 61966-2-1 defines it.
 */
public final class ColourVision {

    public enum Deficiency {
        PROTANOPIA(new double[] {
            0.152286, 1.052583, -0.204868,
            0.114503, 0.786281, 0.099216,
            -0.003882, -0.048116, 1.051998}),
        DEUTERANOPIA(new double[] {
            0.367322, 0.860646, -0.227968,
            0.280085, 0.672501, 0.047413,
            -0.011820, 0.042940, 0.968881}),
        TRITANOPIA(new double[] {
            1.255528, -0.076749, -0.178779,
            -0.078411, 0.930809, 0.147602,
            0.004733, 0.691367, 0.303900});

        private final double[] m;

        Deficiency(double[] m) {
            this.m = m;
        }
    }

    private ColourVision() {
    }

    /** The colour as a dichromat sees it: sRGB channels in 0..1, not clamped (the matrices can leave the gamut). */
    public static double[] simulate(Deficiency d, String hex) {
        double[] c = channels(hex);
        double[] m = d.m;
        return new double[] {
            m[0] * c[0] + m[1] * c[1] + m[2] * c[2],
            m[3] * c[0] + m[4] * c[1] + m[5] * c[2],
            m[6] * c[0] + m[7] * c[1] + m[8] * c[2]};
    }

    /** {@link #simulate} clamped to the sRGB gamut and rounded to {@code #rrggbb}. */
    public static String simulatedHex(Deficiency d, String hex) {
        double[] c = simulate(d, hex);
        int rgb = 0;
        for (int i = 0; i < 3; i++) {
            rgb = rgb << 8 | (int) Math.round(Math.max(0, Math.min(1, c[i])) * 255);
        }
        return String.format(Locale.ROOT, "#%06x", rgb);
    }

    /** CIELAB (L*, a*, b*) of an sRGB colour, D65 white (CIE 15:2004, IEC 61966-2-1). */
    public static double[] lab(String hex) {
        double[] c = channels(hex);
        double r = linear(c[0]);
        double g = linear(c[1]);
        double b = linear(c[2]);
        // IEC 61966-2-1 sRGB to XYZ, normalised to the D65 white point (0.95047, 1, 1.08883).
        double x = (0.4124 * r + 0.3576 * g + 0.1805 * b) / 0.95047;
        double y = 0.2126 * r + 0.7152 * g + 0.0722 * b;
        double z = (0.0193 * r + 0.1192 * g + 0.9505 * b) / 1.08883;
        double fx = f(x);
        double fy = f(y);
        double fz = f(z);
        return new double[] {116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)};
    }

    /** CIE 1976 colour difference ΔE*ab: the Euclidean distance in CIELAB. */
    public static double deltaE(String hexA, String hexB) {
        double[] a = lab(hexA);
        double[] b = lab(hexB);
        return Math.sqrt((a[0] - b[0]) * (a[0] - b[0]) + (a[1] - b[1]) * (a[1] - b[1]) + (a[2] - b[2]) * (a[2] - b[2]));
    }

    private static double f(double t) {
        double delta = 6.0 / 29;
        return t > delta * delta * delta ? Math.cbrt(t) : t / (3 * delta * delta) + 4.0 / 29;
    }

    private static double linear(double c) {
        return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
    }

    private static double[] channels(String hex) {
        int rgb = Contrast.parse(hex);
        return new double[] {((rgb >> 16) & 0xff) / 255.0, ((rgb >> 8) & 0xff) / 255.0, (rgb & 0xff) / 255.0};
    }
}
