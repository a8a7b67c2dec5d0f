package org.telltale.report.terminal;

/**
 * The few ANSI SGR sequences the terminal views use (ECMA-48 §8.3.117), or nothing at all when
 * colour is off. Green marks a unit that raises the explained label's score and purple one that
 * lowers it, in the hues of ColorBrewer's PRGn that the HTML reports use: xterm 256-colour entries
 * of equal, middle lightness, so that each keeps 3:1 on a black and on a white terminal background
 * and the two stay apart under simulated protanopia, deuteranopia and tritanopia
 * (AnsiColoursTest). The sign is always printed too, so nothing rests on colour alone.
 */
final class Ansi {
    /** xterm 256-colour index 29, #00875f. */
    static final int RAISES = 29;
    /** xterm 256-colour index 97, #875faf. */
    static final int LOWERS = 97;

    private final boolean on;

    Ansi(boolean on) {
        this.on = on;
    }

    boolean on() {
        return on;
    }

    String raises(String s, boolean strong) {
        return wrap(s, (strong ? "1;38;5;" : "38;5;") + RAISES);
    }

    String lowers(String s, boolean strong) {
        return wrap(s, (strong ? "1;38;5;" : "38;5;") + LOWERS);
    }

    String dim(String s) {
        return wrap(s, "2");
    }

    String bold(String s) {
        return wrap(s, "1");
    }

    private String wrap(String s, String code) {
        return on ? "\u001b[" + code + "m" + s + "\u001b[0m" : s;
    }
}
