package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.telltale.report.html.ColourVision.Deficiency;

class ColourVisionTest {

    /** Every colour the report palette defines, with its tints, and the sRGB primaries and greys. */
    private static List<String> colours() {
        Set<String> all = new LinkedHashSet<>(List.of("#ff0000", "#00ff00", "#0000ff", "#ffffff", "#000000", "#808080",
                Palette.PAPER, Palette.CARD, Palette.INK, Palette.MUTED, Palette.RULE, Palette.TOWARD, Palette.AWAY,
                Palette.TOWARD_DEEP, Palette.AWAY_DEEP, Palette.HIGH, Palette.MEDIUM, Palette.LOW));
        for (int level = 1; level <= Palette.LEVELS; level++) {
            all.add(Palette.tint(true, level));
            all.add(Palette.tint(false, level));
        }
        return List.copyOf(all);
    }

    @Test
    void simulationMatchesTheMachadoMatricesOfCulori() throws Exception {
        // Reference: culori 4.0.2 (npm), filterDeficiencyProt/Deuter/Trit at severity 1, which carry
        // Machado, Oliveira and Fernandes' (2009) published matrices and apply them to sRGB channels.
        List<String> colours = colours();
        String out = NodeScript.run("import {filterDeficiencyProt, filterDeficiencyDeuter, filterDeficiencyTrit} from 'culori';\n"
                + "const sims = [filterDeficiencyProt(1), filterDeficiencyDeuter(1), filterDeficiencyTrit(1)];\n"
                + "for (const c of " + jsArray(colours) + ") for (const s of sims) { const r = s(c); console.log([r.r, r.g, r.b].join(' ')); }\n",
                "culori");
        String[] lines = out.strip().split("\n");
        assertEquals(colours.size() * 3, lines.length, out);
        int i = 0;
        for (String colour : colours) {
            for (Deficiency d : List.of(Deficiency.PROTANOPIA, Deficiency.DEUTERANOPIA, Deficiency.TRITANOPIA)) {
                String[] expected = lines[i++].split(" ");
                double[] actual = ColourVision.simulate(d, colour);
                for (int ch = 0; ch < 3; ch++) {
                    assertEquals(Double.parseDouble(expected[ch]), actual[ch], 1e-9, colour + " under " + d + ", channel " + ch);
                }
            }
        }
    }

    @Test
    void colourDifferencesMatchCuloriInCielabD65() throws Exception {
        // Reference: culori 4.0.2 differenceEuclidean('lab65'), CIE 1976 ΔE*ab in CIELAB under D65.
        // Tolerance 0.05: culori derives its sRGB matrix from the primaries at full precision, the
        // code here uses IEC 61966-2-1's four-digit one.
        List<String> colours = colours();
        List<String[]> pairs = new ArrayList<>();
        for (int a = 0; a < colours.size(); a++) {
            for (int b = a + 1; b < colours.size(); b++) {
                pairs.add(new String[] {colours.get(a), colours.get(b)});
            }
        }
        StringBuilder js = new StringBuilder("import {differenceEuclidean} from 'culori';\nconst d = differenceEuclidean('lab65');\nconst pairs = [");
        for (String[] p : pairs) {
            js.append("['").append(p[0]).append("','").append(p[1]).append("'],");
        }
        js.append("];\nfor (const [a, b] of pairs) console.log(d(a, b));\n");
        String[] lines = NodeScript.run(js.toString(), "culori").strip().split("\n");
        assertEquals(pairs.size(), lines.length);
        for (int i = 0; i < pairs.size(); i++) {
            assertEquals(Double.parseDouble(lines[i]), ColourVision.deltaE(pairs.get(i)[0], pairs.get(i)[1]), 0.05,
                    pairs.get(i)[0] + " against " + pairs.get(i)[1]);
        }
    }

    @Test
    void cielabOfWhiteAndRedAreTheKnownValues() {
        // From memory: sRGB white is L* 100, a* 0, b* 0 under D65; pure red is about (53.24, 80.09, 67.20).
        // Tolerance 0.02 for white: the four-digit matrix rows sum to the white point only to 1e-4.
        double[] white = ColourVision.lab("#ffffff");
        assertEquals(100, white[0], 0.02);
        assertEquals(0, white[1], 0.02);
        assertEquals(0, white[2], 0.02);
        double[] red = ColourVision.lab("#ff0000");
        assertEquals(53.24, red[0], 0.02);
        assertEquals(80.09, red[1], 0.05);
        assertEquals(67.20, red[2], 0.05);
    }

    @Test
    void simulatedColoursAreClampedToTheGamut() {
        // Machado's protanopia matrix sends pure green to (1.052583, 0.786281, -0.048116): red is
        // clamped to ff, blue to 00, green is 0.786281 × 255 = 200.5 → c9.
        assertEquals(1.052583, ColourVision.simulate(Deficiency.PROTANOPIA, "#00ff00")[0], 1e-12);
        assertEquals("#ffc900", ColourVision.simulatedHex(Deficiency.PROTANOPIA, "#00ff00"));
    }

    @Test
    void thePaletteDirectionsAreColorBrewersPrgnClasses() throws Exception {
        // Reference: the colorbrewer npm package (1.7.0), Cynthia Brewer's own scheme file.
        String out = NodeScript.run("import cb from 'colorbrewer/index.es.js';\nconsole.log(cb.PRGn[11].join(' '));\n", "colorbrewer");
        List<String> prgn = List.of(out.strip().toLowerCase(Locale.ROOT).split(" "));
        assertEquals(Palette.AWAY_DEEP, prgn.get(0));
        assertEquals(Palette.AWAY, prgn.get(1));
        assertEquals(Palette.TOWARD, prgn.get(9));
        assertEquals(Palette.TOWARD_DEEP, prgn.get(10));
    }

    private static String jsArray(List<String> colours) {
        return colours.stream().map(c -> "'" + c + "'").collect(java.util.stream.Collectors.joining(",", "[", "]"));
    }
}
