package org.telltale.report.html;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The report colours, defined once and written into the stylesheet as CSS custom properties.
 *
 * <p>Direction uses the green and purple of ColorBrewer's diverging scheme PRGn (Brewer and
 * Harrower, colorbrewer2.org, marked colour-blind safe there): classes 10 and 2 of its 11-class
 * version for marks and tints, and its two end classes for text, underlines and glyphs. The pair
 * stays apart under simulated protanopia, deuteranopia and tritanopia (Machado, Oliveira and
 * Fernandes 2009, checked in the tests), and differs on purpose from the blue and orange pair
 * common in other explanation reports. The weight of a term is the depth of the tint, in
 * {@link #LEVELS} steps mixed toward the paper colour.
 * Colour is never the only channel: the stylesheet adds a solid or wavy underline and a glyph.
 */
public final class Palette {
    public static final int LEVELS = 5;

    public static final String PAPER = "#fbfaf6";
    public static final String CARD = "#ffffff";
    public static final String INK = "#1c1b22";
    public static final String MUTED = "#55535e";
    public static final String RULE = "#8a8794";
    public static final String CAUTION_BG = "#fff4d6";
    public static final String CAUTION_EDGE = "#8a5a00";
    /** PRGn 11-class, class 10 (green): a term that raised the explained label's score. */
    public static final String TOWARD = "#1b7837";
    /** PRGn 11-class, class 2 (purple): a term that lowered it. */
    public static final String AWAY = "#762a83";
    /** PRGn's end classes (11 and 1), the darker shades for underlines, glyphs and text on white. */
    public static final String TOWARD_DEEP = "#00441b";
    public static final String AWAY_DEEP = "#40004b";
    public static final String HIGH = "#9e1b32";
    public static final String MEDIUM = "#7a4d00";
    public static final String LOW = "#3d5a80";

    private Palette() {
    }

    /** The tint of {@code level} (1 = faint, {@link #LEVELS} = deepest) for one direction. */
    public static String tint(boolean toward, int level) {
        if (level < 1 || level > LEVELS) {
            throw new IllegalArgumentException("level must be 1.." + LEVELS + ": " + level);
        }
        // 12 % to 60 %: at 64 % dark ink on the deepest purple tint fell to 4.4:1 under simulated
        // protanopia (PaletteVisionTest), below WCAG AA for text.
        double share = 0.12 + 0.12 * (level - 1);
        return mix(toward ? TOWARD : AWAY, PAPER, share);
    }

    /** {@code share} of {@code colour} over {@code base}, per sRGB channel (common practice for tints). */
    static String mix(String colour, String base, double share) {
        int c = Contrast.parse(colour);
        int b = Contrast.parse(base);
        int rgb = 0;
        for (int shift = 16; shift >= 0; shift -= 8) {
            int cc = (c >> shift) & 0xff;
            int bb = (b >> shift) & 0xff;
            rgb |= (int) Math.round(bb + (cc - bb) * share) << shift;
        }
        return String.format(Locale.ROOT, "#%06x", rgb);
    }

    /** A pair of colours the report puts one over the other, and the contrast it must reach. */
    public record Pair(String name, String foreground, String background, double minimum) {
    }

    /** Every foreground/background pair the stylesheet uses, with the WCAG 2.1 AA level it needs. */
    public static List<Pair> pairs() {
        List<Pair> pairs = new ArrayList<>();
        for (String bg : List.of(PAPER, CARD)) {
            pairs.add(new Pair("ink on " + bg, INK, bg, Contrast.AA_TEXT));
            pairs.add(new Pair("muted on " + bg, MUTED, bg, Contrast.AA_TEXT));
            pairs.add(new Pair("toward text on " + bg, TOWARD_DEEP, bg, Contrast.AA_TEXT));
            pairs.add(new Pair("away text on " + bg, AWAY_DEEP, bg, Contrast.AA_TEXT));
            pairs.add(new Pair("high on " + bg, HIGH, bg, Contrast.AA_TEXT));
            pairs.add(new Pair("medium on " + bg, MEDIUM, bg, Contrast.AA_TEXT));
            pairs.add(new Pair("low on " + bg, LOW, bg, Contrast.AA_TEXT));
            pairs.add(new Pair("rule on " + bg, RULE, bg, Contrast.AA_GRAPHICS));
            pairs.add(new Pair("toward mark on " + bg, TOWARD, bg, Contrast.AA_GRAPHICS));
            pairs.add(new Pair("away mark on " + bg, AWAY, bg, Contrast.AA_GRAPHICS));
        }
        pairs.add(new Pair("ink on caution", INK, CAUTION_BG, Contrast.AA_TEXT));
        pairs.add(new Pair("caution edge on caution", CAUTION_EDGE, CAUTION_BG, Contrast.AA_TEXT));
        for (int level = 1; level <= LEVELS; level++) {
            pairs.add(new Pair("ink on toward tint " + level, INK, tint(true, level), Contrast.AA_TEXT));
            pairs.add(new Pair("ink on away tint " + level, INK, tint(false, level), Contrast.AA_TEXT));
            pairs.add(new Pair("toward underline on tint " + level, TOWARD_DEEP, tint(true, level), Contrast.AA_GRAPHICS));
            pairs.add(new Pair("away underline on tint " + level, AWAY_DEEP, tint(false, level), Contrast.AA_GRAPHICS));
        }
        return List.copyOf(pairs);
    }

    /** The palette as CSS custom properties, to be placed before the stylesheet that uses them. */
    public static String css() {
        StringBuilder css = new StringBuilder(":root{");
        prop(css, "paper", PAPER);
        prop(css, "card", CARD);
        prop(css, "ink", INK);
        prop(css, "muted", MUTED);
        prop(css, "rule", RULE);
        prop(css, "caution-bg", CAUTION_BG);
        prop(css, "caution-edge", CAUTION_EDGE);
        prop(css, "toward", TOWARD);
        prop(css, "away", AWAY);
        prop(css, "toward-deep", TOWARD_DEEP);
        prop(css, "away-deep", AWAY_DEEP);
        prop(css, "high", HIGH);
        prop(css, "medium", MEDIUM);
        prop(css, "low", LOW);
        for (int level = 1; level <= LEVELS; level++) {
            prop(css, "to" + level, tint(true, level));
            prop(css, "aw" + level, tint(false, level));
        }
        return css.append("}\n").toString();
    }

    private static void prop(StringBuilder css, String name, String value) {
        css.append("--tt-").append(name).append(':').append(value).append(';');
    }
}
