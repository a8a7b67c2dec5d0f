package org.telltale.report.terminal;

/**
 * The few ANSI SGR sequences the terminal views use (ECMA-48 §8.3.117), or nothing at all when
 * colour is off. Blue marks a unit that raises the explained label's score and orange one that
 * lowers it (a pair that stays distinct under the common colour-vision deficiencies); the sign is
 * always printed too, so nothing rests on colour alone.
 */
final class Ansi {
    private final boolean on;

    Ansi(boolean on) {
        this.on = on;
    }

    boolean on() {
        return on;
    }

    String raises(String s, boolean strong) {
        return wrap(s, strong ? "1;38;5;33" : "38;5;33");
    }

    String lowers(String s, boolean strong) {
        return wrap(s, strong ? "1;38;5;208" : "38;5;208");
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
