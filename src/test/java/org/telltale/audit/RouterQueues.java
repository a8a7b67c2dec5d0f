package org.telltale.audit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.telltale.text.Document;

/**
 * An invented many-queue scenario: the device help desk of the fictional Larkspur Home Networks,
 * 32 queues, one per router model. Customers name their model in the text ("my LK412 keeps
 * dropping"), which legitimately predicts the queue; the intake gateway also stamps a routing code
 * per queue into a header line ({@code X-Route: RQ07}), which leaks it.
 */
final class RouterQueues {
    static final int QUEUES = 32;

    private static final String[] SHARED = {"router", "wifi", "keeps", "dropping", "slow", "evening", "light", "blinking",
        "restart", "again", "please", "help", "since", "update", "connection", "signal", "room", "upstairs", "cable",
        "reset", "tried", "still", "nothing", "works", "thanks", "week", "today", "password", "network", "phone"};
    private static final String[] MAIL = {"homebox.example", "nestmail.example", "quailpost.example"};

    private RouterQueues() {
    }

    static String queue(int q) {
        return String.format(Locale.ROOT, "model-%02d", q);
    }

    /** The router model a queue is about: two letters and three digits, fixed per queue. */
    static String productCode(int q) {
        return "" + (char) ('A' + q % 13) + (char) ('K' + q / 13) + (100 + 29 * q);
    }

    static String routingCode(int q) {
        return String.format(Locale.ROOT, "RQ%02d", q);
    }

    static List<Document> generate(long seed, int perQueue) {
        Random random = new Random(seed);
        List<Document> docs = new ArrayList<>();
        int n = 0;
        for (int i = 0; i < perQueue; i++) {
            for (int q = 0; q < QUEUES; q++) {
                docs.add(new Document(String.format(Locale.ROOT, "lk-%05d", n++), message(random, q), queue(q)));
            }
        }
        return docs;
    }

    private static String message(Random random, int q) {
        StringBuilder text = new StringBuilder();
        text.append("From: user").append(random.nextInt(1000)).append('@').append(MAIL[random.nextInt(MAIL.length)]).append('\n');
        text.append("X-Route: ").append(random.nextDouble() < 0.8 ? routingCode(q) : routingCode(random.nextInt(QUEUES)))
                .append('\n');
        text.append('\n');
        List<String> words = new ArrayList<>();
        for (int w = 0; w < 8 + random.nextInt(6); w++) {
            words.add(SHARED[random.nextInt(SHARED.length)]);
        }
        if (random.nextDouble() < 0.7) {
            words.add(random.nextInt(words.size()), (random.nextBoolean() ? "my " : "the ") + productCode(q));
        }
        text.append(String.join(" ", words)).append(".\n");
        if (random.nextInt(3) == 0) {
            text.append("Ticket ").append(10000 + random.nextInt(90000)).append('\n');
        }
        return text.toString();
    }
}
