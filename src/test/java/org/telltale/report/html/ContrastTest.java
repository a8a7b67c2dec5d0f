package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;

class ContrastTest {

    @Test
    void blackOnWhiteIsTheMaximumTwentyOneToOne() {
        // WCAG 2.1, "contrast ratio": ratios range from 1 to 21 (white 1.0 + 0.05 over black 0 + 0.05).
        assertEquals(21.0, Contrast.ratio("#000000", "#ffffff"), 1e-9);
        assertEquals(21.0, Contrast.ratio("#FFFFFF", "#000000"), 1e-9);
        assertEquals(1.0, Contrast.ratio("#3d5a80", "#3d5a80"), 1e-12);
    }

    @Test
    void luminanceUsesTheWcagChannelCoefficients() {
        // WCAG 2.1, "relative luminance": L = 0.2126 R + 0.7152 G + 0.0722 B; full channels are 1.0.
        assertEquals(0.2126, Contrast.relativeLuminance("#ff0000"), 1e-12);
        assertEquals(0.7152, Contrast.relativeLuminance("#00ff00"), 1e-12);
        assertEquals(0.0722, Contrast.relativeLuminance("#0000ff"), 1e-12);
        // Below the 0.03928 threshold the channel is divided by 12.92: 10/255/12.92 (WCAG 2.1).
        assertEquals(0.7152 * (10 / 255.0 / 12.92), Contrast.relativeLuminance("#000a00"), 1e-15);
    }

    @Test
    void greySevenSixIsTheLightestGreyPassingAaOnWhite() {
        // From memory: #767676 on white is the widely quoted 4.54:1, the lightest grey passing AA; #777777 is 4.48:1.
        assertEquals(4.54, Contrast.ratio("#767676", "#ffffff"), 0.005);
        assertEquals(4.48, Contrast.ratio("#777777", "#ffffff"), 0.005);
    }

    @Test
    void rejectsMalformedColours() {
        assertThrows(IllegalArgumentException.class, () -> Contrast.ratio("#fff", "#000000"));
        assertThrows(IllegalArgumentException.class, () -> Contrast.ratio("blue", "#000000"));
    }

    @Test
    void everyPalettePairMeetsWcagAa() {
        List<String> failing = new ArrayList<>();
        for (Palette.Pair p : Palette.pairs()) {
            double ratio = Contrast.ratio(p.foreground(), p.background());
            if (ratio < p.minimum()) {
                failing.add(String.format(Locale.ROOT, "%s: %.2f < %.1f", p.name(), ratio, p.minimum()));
            }
        }
        assertTrue(Palette.pairs().size() > 30, "the palette lists its pairs");
        assertTrue(failing.isEmpty(), String.join("\n", failing));
    }

    @Test
    void deeperTintsAreDarkerSoIntensityReadsAsWeight() {
        for (boolean toward : new boolean[] {true, false}) {
            for (int level = 2; level <= Palette.LEVELS; level++) {
                assertTrue(Contrast.relativeLuminance(Palette.tint(toward, level))
                        < Contrast.relativeLuminance(Palette.tint(toward, level - 1)), "level " + level);
            }
        }
    }

    @Test
    void mixingIsPerChannelLinearInSrgb() {
        // Common practice: a 50 % mix of black over white is mid grey 0x80 (127.5 rounded up).
        assertEquals("#808080", Palette.mix("#000000", "#ffffff", 0.5));
        assertEquals("#0072b2", Palette.mix("#0072b2", "#ffffff", 1.0));
    }
}
