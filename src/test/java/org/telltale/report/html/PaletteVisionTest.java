package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.telltale.report.html.ColourVision.Deficiency;

/**
 * The direction colours under simulated protanopia, deuteranopia and tritanopia (Machado et al.
 * 2009, see {@link ColourVision}): toward and away stay far apart, and every contrast the
 * stylesheet relies on still meets WCAG 2.1 AA as a dichromat sees it.
 */
class PaletteVisionTest {
    /**
     * The smallest ΔE*ab (CIE 1976) the two directions may keep. Common practice for colours that
     * must read as different categories at a glance puts it well above the just-noticeable
     * difference of about 2.3 (from memory); 20 keeps the marks apart even in small text.
     */
    static final double APART = 20;
    /**
     * The smallest ΔE*ab between the toward and away tints of one level from level 3 up. Tints sit
     * behind dark text, so they are paler by design (levels 1 and 2 are close to the paper); there
     * the solid or wavy underline and the ▲/▼ glyph carry the direction, and the tint only adds to it.
     */
    static final double TINTS_APART = 15;

    private record Apart(String name, String toward, String away, double least) {
    }

    private static String seen(Deficiency d, String hex) {
        return d == null ? hex : ColourVision.simulatedHex(d, hex);
    }

    private static List<Deficiency> visions() {
        List<Deficiency> all = new ArrayList<>();
        all.add(null);
        all.addAll(List.of(Deficiency.values()));
        return all;
    }

    private static String name(Deficiency d) {
        return d == null ? "typical vision" : d.name().toLowerCase(Locale.ROOT);
    }

    @Test
    void towardAndAwayStayApartUnderEveryDeficiency() {
        List<String> report = new ArrayList<>();
        boolean ok = true;
        List<Apart> pairs = new ArrayList<>(List.of(
                new Apart("marks", Palette.TOWARD, Palette.AWAY, APART),
                new Apart("text and underlines", Palette.TOWARD_DEEP, Palette.AWAY_DEEP, APART)));
        for (int level = 3; level <= Palette.LEVELS; level++) {
            pairs.add(new Apart("tint " + level, Palette.tint(true, level), Palette.tint(false, level), TINTS_APART));
        }
        for (Apart pair : pairs) {
            for (Deficiency d : visions()) {
                double e = ColourVision.deltaE(seen(d, pair.toward()), seen(d, pair.away()));
                report.add(String.format(Locale.ROOT, "%s under %s: %s / %s, ΔE %.1f (at least %.0f)", pair.name(), name(d),
                        seen(d, pair.toward()), seen(d, pair.away()), e, pair.least()));
                ok &= e >= pair.least();
            }
        }
        assertTrue(ok, "toward and away must stay apart:\n" + String.join("\n", report));
    }

    @Test
    void everyContrastHoldsAsADichromatSeesIt() {
        List<String> failing = new ArrayList<>();
        for (Deficiency d : Deficiency.values()) {
            for (Palette.Pair p : Palette.pairs()) {
                double ratio = Contrast.ratio(seen(d, p.foreground()), seen(d, p.background()));
                if (ratio < p.minimum()) {
                    failing.add(String.format(Locale.ROOT, "%s under %s: %.2f < %.1f", p.name(), name(d), ratio, p.minimum()));
                }
            }
        }
        assertTrue(failing.isEmpty(), String.join("\n", failing));
    }

    @Test
    void theCheckRejectsAPairThatMergesUnderDeuteranopia() {
        // Okabe and Ito's bluish green (#009e73) and reddish purple (#cc79a7) are far apart in typical
        // vision but close under Machado's deuteranopia: the distance check must catch such a pair.
        assertTrue(ColourVision.deltaE("#009e73", "#cc79a7") > 3 * APART);
        double merged = ColourVision.deltaE(seen(Deficiency.DEUTERANOPIA, "#009e73"), seen(Deficiency.DEUTERANOPIA, "#cc79a7"));
        assertTrue(merged < APART, "ΔE " + merged);
    }
}
