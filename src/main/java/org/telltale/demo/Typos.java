package org.telltale.demo;

import java.util.Random;

/**
 * Adds the slips of a hurried writer: swapped, dropped and doubled letters. Only plain words of
 * four letters or more are touched, so numbers, addresses and codes stay intact.
 */
final class Typos {
    private Typos() {
    }

    /** {@code text} with each eligible word misspelt with probability {@code rate}. */
    static String sprinkle(String text, double rate, Random random) {
        if (rate <= 0) {
            return text;
        }
        String[] words = text.split(" ", -1);
        for (int i = 0; i < words.length; i++) {
            if (isPlainWord(words[i]) && random.nextDouble() < rate) {
                words[i] = misspell(words[i], random);
            }
        }
        return String.join(" ", words);
    }

    private static boolean isPlainWord(String word) {
        if (word.length() < 4) {
            return false;
        }
        for (int i = 0; i < word.length(); i++) {
            if (!Character.isLetter(word.charAt(i))) {
                return false;
            }
        }
        return true;
    }

    private static String misspell(String word, Random random) {
        int at = 1 + random.nextInt(word.length() - 2);
        return switch (random.nextInt(3)) {
            case 0 -> word.substring(0, at) + word.charAt(at + 1) + word.charAt(at) + word.substring(at + 2);
            case 1 -> word.substring(0, at) + word.substring(at + 1);
            default -> word.substring(0, at) + word.charAt(at) + word.substring(at);
        };
    }
}
