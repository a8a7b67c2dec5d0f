package org.telltale.report.terminal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.telltale.report.html.ColourVision;
import org.telltale.report.html.Contrast;
import org.telltale.report.html.Palette;

class AnsiColoursTest {

    /** The sRGB colour of an entry of xterm's 6×6×6 cube, 16 + 36r + 6g + b, levels 0, 95, 135, 175, 215, 255 (from memory). */
    static String xterm(int index) {
        int[] levels = {0, 95, 135, 175, 215, 255};
        int i = index - 16;
        return String.format(Locale.ROOT, "#%02x%02x%02x", levels[i / 36], levels[i / 6 % 6], levels[i % 6]);
    }

    @Test
    void theTerminalColoursAreTheDocumentedXtermEntries() {
        assertEquals("#00875f", xterm(Ansi.RAISES));
        assertEquals("#875faf", xterm(Ansi.LOWERS));
    }

    @Test
    void eachTerminalColourIsNearerItsOwnReportDirection() {
        String raises = xterm(Ansi.RAISES);
        String lowers = xterm(Ansi.LOWERS);
        assertTrue(ColourVision.deltaE(raises, Palette.TOWARD) < ColourVision.deltaE(raises, Palette.AWAY));
        assertTrue(ColourVision.deltaE(lowers, Palette.AWAY) < ColourVision.deltaE(lowers, Palette.TOWARD));
    }

    @Test
    void theTerminalColoursStayApartAndReadOnDarkAndLightBackgrounds() {
        for (ColourVision.Deficiency d : ColourVision.Deficiency.values()) {
            String raises = ColourVision.simulatedHex(d, xterm(Ansi.RAISES));
            String lowers = ColourVision.simulatedHex(d, xterm(Ansi.LOWERS));
            // The same least distance as the report marks (PaletteVisionTest.APART).
            assertTrue(ColourVision.deltaE(raises, lowers) >= 20, d + ": " + raises + " / " + lowers);
        }
        for (String colour : new String[] {xterm(Ansi.RAISES), xterm(Ansi.LOWERS)}) {
            for (String background : new String[] {"#000000", "#ffffff"}) {
                // WCAG 2.1 success criterion 1.4.11: 3:1 against what surrounds it.
                assertTrue(Contrast.ratio(colour, background) >= Contrast.AA_GRAPHICS, colour + " on " + background);
            }
        }
    }
}
