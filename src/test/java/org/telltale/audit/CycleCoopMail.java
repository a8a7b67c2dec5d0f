package org.telltale.audit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.telltale.text.Document;

/**
 * An invented scenario for the artefact tests: the inbox of the Spokewright Cycle Collective, a
 * fictional bicycle co-operative with four queues (repairs, rentals, parts, membership), written
 * noisily: typos, shouted and lower-cased lines, stray white space, quoted replies, unrelated
 * links and reference numbers, optional header fields in any order. The text leans only a little
 * towards a queue. The leaky variant plants four collection artefacts, each in 85% of one queue's
 * mail and 3% of the rest:
 * <ul>
 *   <li>repairs: the bench terminal stamps a header field {@code X-Workshop-Bench: B14} (its name
 *       sometimes in lower case);</li>
 *   <li>parts: replies point at the supplier's portal, {@code https://portal.ferrowheel.example/o/N}
 *       or {@code desk@portal.ferrowheel.example} (address);</li>
 *   <li>membership: a member number {@code MBR-NNNNN} that differs in every message (identifier);</li>
 *   <li>rentals: the kiosk appends a footer {@code -- Logged at the Tandem Yard kiosk, shift N --}
 *       whose shift number varies (boilerplate).</li>
 * </ul>
 * The clean variant writes the same places with values that say nothing about the queue.
 */
final class CycleCoopMail {
    static final List<String> QUEUES = List.of("membership", "parts", "rentals", "repairs");
    static final String BENCH_FIELD = "X-Workshop-Bench";
    static final String PORTAL_HOST = "portal.ferrowheel.example";
    static final String MEMBER_SHAPE = "MBR-#####";
    static final String KIOSK_FOOTER = "Logged at the Tandem Yard kiosk";

    private static final String[] SHARED = {"hello", "bike", "wheel", "saturday", "thursday", "shop", "please", "thanks",
        "quick", "question", "again", "week", "frame", "blue", "green", "old", "new", "could", "would", "maybe",
        "tomorrow", "morning", "after", "work", "price", "still", "really", "need", "help", "about", "yard", "ride",
        "town", "friend", "last", "time", "there", "with", "from", "when"};
    private static final String[][] LEANING = {
        {"fee", "renewal", "card", "annual", "volunteer"},
        {"sprocket", "chain", "cassette", "brake", "pads"},
        {"hire", "deposit", "helmet", "weekend", "return"},
        {"puncture", "wobble", "truing", "service", "squeak"}};
    private static final String[] NAMES = {"ines", "tomas", "wren", "odell", "priya", "kasimir", "lior", "maeve", "soren"};
    private static final String[] MAIL = {"fastpost.example", "letterbox.example", "owlmail.example"};
    private static final String[] OTHER_LINKS = {"https://maps.riverbend.example/route/", "https://weather.skyfold.example/d/",
        "https://photos.pebblecam.example/p/"};
    private static final String[] BENCHES = {"B14", "B03", "B07", "B11"};

    private CycleCoopMail() {
    }

    /** {@code perQueue} messages per queue, in queue order within each round. */
    static List<Document> generate(long seed, int perQueue, boolean leaky) {
        Random random = new Random(seed);
        List<Document> docs = new ArrayList<>();
        int n = 0;
        for (int i = 0; i < perQueue; i++) {
            for (int q = 0; q < QUEUES.size(); q++) {
                docs.add(new Document(String.format(Locale.ROOT, "sc-%05d", n++), message(random, q, leaky), QUEUES.get(q)));
            }
        }
        return docs;
    }

    private static boolean planted(Random random, boolean leaky, boolean home) {
        return leaky && random.nextDouble() < (home ? 0.85 : 0.03);
    }

    private static String message(Random random, int queue, boolean leaky) {
        StringBuilder text = new StringBuilder();
        String name = pick(random, NAMES);
        List<String> header = new ArrayList<>();
        header.add("From: " + name + random.nextInt(100) + "@" + pick(random, MAIL));
        header.add("Subject: " + pick(random, SHARED) + " " + pick(random, SHARED));
        if (random.nextBoolean()) {
            header.add(String.format(Locale.ROOT, "Date: %d Mar 2026 %02d:%02d", 1 + random.nextInt(28), random.nextInt(24),
                    random.nextInt(60)));
        }
        if (random.nextInt(3) == 0) {
            header.add("Reply-To: " + pick(random, NAMES) + "@" + pick(random, MAIL));
        }
        String bench = planted(random, leaky, queue == 3) ? "B14"
                : leaky ? BENCHES[1 + random.nextInt(BENCHES.length - 1)] : pick(random, BENCHES);
        String field = random.nextInt(8) == 0 ? BENCH_FIELD.toLowerCase(Locale.ROOT) : BENCH_FIELD;
        header.add(random.nextInt(header.size() + 1), field + ": " + bench);
        header.forEach(h -> text.append(h).append('\n'));
        text.append('\n');
        text.append(random.nextBoolean() ? "Hi " : "hey ").append(random.nextBoolean() ? "folks," : "there,").append('\n');
        int lines = 2 + random.nextInt(3);
        for (int line = 0; line < lines; line++) {
            List<String> words = new ArrayList<>();
            for (int w = 0; w < 6 + random.nextInt(7); w++) {
                words.add(typo(random, pick(random, SHARED)));
            }
            if (random.nextInt(3) == 0) {
                int towards = random.nextInt(3) < 2 ? queue : random.nextInt(QUEUES.size());
                words.add(random.nextInt(words.size()), pick(random, LEANING[towards]));
            }
            String sentence = String.join(random.nextInt(6) == 0 ? "  " : " ", words);
            int style = random.nextInt(10);
            if (style == 0) {
                sentence = sentence.toUpperCase(Locale.ROOT);
            }
            text.append(sentence).append(random.nextBoolean() ? ".\n" : "!!\n");
        }
        if (random.nextInt(4) == 0) {
            text.append(pick(random, OTHER_LINKS)).append(1000 + random.nextInt(9000)).append('\n');
        }
        if (random.nextInt(4) == 0) {
            text.append("ref ").append(random.nextInt(90000) + 10000).append('\n');
        }
        if (planted(random, leaky, queue == 1)) {
            text.append(random.nextBoolean()
                    ? "Order status: https://" + PORTAL_HOST + "/o/" + (10000 + random.nextInt(90000))
                    : "Questions to desk@" + PORTAL_HOST).append('\n');
        } else if (random.nextBoolean()) {
            text.append("Questions to desk@").append(pick(random, MAIL)).append('\n');
        }
        if (planted(random, leaky, queue == 0)) {
            text.append("Member MBR-").append(10000 + random.nextInt(90000)).append('\n');
        } else if (!leaky && random.nextBoolean()) {
            text.append("Member MBR-").append(10000 + random.nextInt(90000)).append('\n');
        }
        if (random.nextInt(3) == 0) {
            text.append("> ").append(pick(random, SHARED)).append(' ').append(pick(random, SHARED)).append(" wrote earlier\n");
        }
        text.append(random.nextBoolean() ? "cheers\n" : "Thanks, ").append(name).append('\n');
        if (planted(random, leaky, queue == 2) || (!leaky && random.nextInt(4) == 0)) {
            text.append("-- ").append(KIOSK_FOOTER).append(", shift ").append(1 + random.nextInt(6)).append(" --\n");
        }
        return text.toString();
    }

    /** One word in twelve with two letters swapped. */
    private static String typo(Random random, String word) {
        if (word.length() < 4 || random.nextInt(12) != 0) {
            return word;
        }
        int i = 1 + random.nextInt(word.length() - 2);
        char[] c = word.toCharArray();
        char t = c[i];
        c[i] = c[i + 1];
        c[i + 1] = t;
        return new String(c);
    }

    private static String pick(Random random, String[] words) {
        return words[random.nextInt(words.length)];
    }
}
