package org.telltale.overlap;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Invented support tickets of a fictional ferry operator, Harbourline, and the ways a copy of one
 * drifts from the original: word edits, reply quoting, reordered sentences, re-casing, re-wrapping.
 * Seeded; made-up words keep unrelated tickets unrelated.
 */
public final class SupportTickets {
    public static final String[] LABELS = {"billing", "booking", "lost-property", "accessibility"};
    private static final String[] COMMON = {"the", "my", "to", "and", "is", "for", "on", "we", "a", "it",
        "ferry", "ticket", "crossing", "harbourline", "please", "refund", "cabin", "port"};
    private static final String[] SYLLABLES = {"ka", "lo", "mer", "ti", "sun", "dra", "vel", "po", "ris", "an",
        "ob", "ul", "ze", "fin", "gor", "hal", "que", "wy", "es", "tor"};

    private final Random random;
    private final List<String> lexicon = new ArrayList<>();

    public SupportTickets(long seed) {
        random = new Random(seed);
        for (int i = 0; i < 4000; i++) {
            StringBuilder w = new StringBuilder();
            int parts = 2 + random.nextInt(2);
            for (int p = 0; p < parts; p++) {
                w.append(SYLLABLES[random.nextInt(SYLLABLES.length)]);
            }
            lexicon.add(w.toString());
        }
    }

    /** A new ticket: 6–10 sentences of 8–14 words, in paragraphs of two or three sentences. */
    public String ticket() {
        List<String> sentences = new ArrayList<>();
        int n = 6 + random.nextInt(5);
        for (int s = 0; s < n; s++) {
            sentences.add(sentence());
        }
        return join(sentences);
    }

    public String label() {
        return LABELS[random.nextInt(LABELS.length)];
    }

    private String sentence() {
        int n = 8 + random.nextInt(7);
        StringBuilder out = new StringBuilder();
        for (int w = 0; w < n; w++) {
            String word = random.nextInt(10) < 3 ? COMMON[random.nextInt(COMMON.length)] : lexicon.get(random.nextInt(lexicon.size()));
            if (w == 0) {
                word = Character.toUpperCase(word.charAt(0)) + word.substring(1);
            } else {
                out.append(' ');
            }
            out.append(word);
        }
        out.append(".!?".charAt(random.nextInt(3)));
        return out.toString();
    }

    private String join(List<String> sentences) {
        StringBuilder out = new StringBuilder();
        for (int s = 0; s < sentences.size(); s++) {
            if (s > 0) {
                out.append(s % 3 == 0 ? "\n\n" : " ");
            }
            out.append(sentences.get(s));
        }
        return out.toString();
    }

    static List<String> sentences(String ticket) {
        List<String> out = new ArrayList<>();
        for (String part : ticket.split("(?<=[.!?])\\s+")) {
            out.add(part.strip());
        }
        return out;
    }

    /** One word replaced by another. */
    public String wordEdit(String ticket) {
        String[] words = ticket.split(" ", -1);
        int at = random.nextInt(words.length);
        String w = words[at];
        String tail = w.replaceAll("^[\\p{L}\\p{N}]+", "");
        words[at] = lexicon.get(random.nextInt(lexicon.size())) + tail;
        return String.join(" ", words);
    }

    /** The ticket quoted in a reply, optionally under an attribution line. */
    String quoted(String ticket, boolean attribution) {
        StringBuilder out = new StringBuilder(attribution ? "On Tuesday the passenger wrote:\n" : "");
        for (String line : ticket.split("\n", -1)) {
            out.append(line.isEmpty() ? ">" : "> " + line).append('\n');
        }
        return out.toString();
    }

    /** The sentences in a new order. */
    String reordered(String ticket) {
        List<String> s = sentences(ticket);
        Collections.shuffle(s, random);
        return join(s);
    }

    String recased(String ticket) {
        return random.nextBoolean() ? ticket.toUpperCase(Locale.ROOT) : ticket.toLowerCase(Locale.ROOT);
    }

    /** Re-wrapped at a random width, with doubled spaces and tabs here and there. */
    String rewrapped(String ticket) {
        int width = 30 + random.nextInt(40);
        StringBuilder out = new StringBuilder();
        int column = 0;
        for (String word : ticket.split(" ")) {
            if (column > 0 && column + word.length() > width) {
                out.append(random.nextBoolean() ? "\r\n" : "\n");
                column = 0;
            } else if (column > 0) {
                out.append(random.nextInt(5) == 0 ? "  \t" : " ");
            }
            out.append(word);
            column += word.length() + 1;
        }
        return "  " + out + "\n\n";
    }

    /** One of the drifts above, or two of them, chosen at random; the name says which. */
    public String[] drift(String ticket) {
        return switch (random.nextInt(7)) {
            case 0 -> new String[] {"word edit", wordEdit(ticket)};
            case 1 -> new String[] {"quoted", quoted(ticket, random.nextBoolean())};
            case 2 -> new String[] {"reordered", reordered(ticket)};
            case 3 -> new String[] {"recased", recased(ticket)};
            case 4 -> new String[] {"rewrapped", rewrapped(ticket)};
            case 5 -> new String[] {"reordered and quoted", quoted(reordered(ticket), true)};
            default -> new String[] {"recased and word edit", recased(wordEdit(ticket))};
        };
    }

    Random random() {
        return random;
    }
}
