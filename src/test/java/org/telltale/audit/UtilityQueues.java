package org.telltale.audit;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.telltale.text.Document;

/**
 * An invented scenario for the audit tests: the support mailbox of Kestrel Valley Utilities, a
 * fictional water and power company, with three queues (billing, outage, meter). The text says
 * little about the queue — most words are shared, only a few lean one way — while the leaky
 * variant plants collection artefacts that decide it:
 * <ul>
 *   <li>outage mail came in through the phone line, whose gateway stamps {@code X-Intake: ivr7}
 *       into the header block (header);</li>
 *   <li>billing tickets carry case codes {@code BLQ-nnnn} (identifier) and a reply address at the
 *       billing contractor's domain, {@code ledgerline.example} (address);</li>
 *   <li>meter mail was typed on field tablets that append one signature line (boilerplate).</li>
 * </ul>
 * The clean variant has the same layout, but every queue shares the same header values, case
 * code style and signature.
 */
public final class UtilityQueues {
    public static final List<String> QUEUES = List.of("billing", "meter", "outage");
    static final String TABLET_SIGNATURE = "Sent via the Fernhill field tablet app";
    static final String DESK_SIGNATURE = "Kestrel Valley Utilities customer desk";

    private static final String[] SHARED = {"please", "help", "account", "house", "yesterday", "today", "week",
        "again", "still", "problem", "thanks", "address", "call", "back", "soon", "number", "customer", "sure",
        "what", "happened", "street", "flat", "morning", "evening", "kind", "regards", "issue", "check", "look",
        "update", "waiting", "since", "around", "really", "need", "know", "tell", "whether", "could", "would"};
    private static final String[][] LEANING = {
        {"invoice", "charged", "payment", "refund", "direct", "debit", "tariff", "overpaid"},
        {"reading", "dial", "estimate", "register", "digits", "smart", "display", "photo"},
        {"power", "dark", "lights", "cut", "restore", "substation", "flicker", "fuse"}};
    private static final String[] NAMES = {"alder", "birch", "cedar", "rowan", "hazel", "larch", "maple", "willow"};
    private static final String[] DOMAINS = {"mailbox.example", "postal.example", "homenet.example", "inbox.example"};

    private UtilityQueues() {
    }

    /** {@code perQueue} messages per queue; {@code leaky} plants the artefacts in 90% of a queue's mail, 3% elsewhere. */
    public static List<Document> generate(long seed, int perQueue, boolean leaky) {
        Random random = new Random(seed);
        List<Document> docs = new ArrayList<>();
        int n = 0;
        for (int i = 0; i < perQueue; i++) {
            for (int q = 0; q < QUEUES.size(); q++) {
                docs.add(new Document(String.format(Locale.ROOT, "kv-%05d", n++), message(random, q, leaky),
                        QUEUES.get(q)));
            }
        }
        return docs;
    }

    private static boolean planted(Random random, boolean leaky, boolean home) {
        return leaky && random.nextDouble() < (home ? 0.9 : 0.03);
    }

    private static String message(Random random, int queue, boolean leaky) {
        String name = NAMES[random.nextInt(NAMES.length)];
        StringBuilder text = new StringBuilder();
        text.append("From: ").append(name).append('.').append(random.nextInt(900) + 100).append('@')
                .append(DOMAINS[random.nextInt(DOMAINS.length)]).append('\n');
        text.append("Subject: ").append(pick(random, SHARED)).append(' ').append(pick(random, SHARED)).append('\n');
        text.append("X-Intake: ").append(planted(random, leaky, queue == 2) ? "ivr7" : "web").append('\n');
        text.append('\n');
        text.append("Hello,\n");
        for (int line = 0; line < 2 + random.nextInt(2); line++) {
            List<String> words = new ArrayList<>();
            for (int w = 0; w < 7 + random.nextInt(5); w++) {
                words.add(pick(random, SHARED));
            }
            // One line in three has a word that leans towards a queue, and only two times in three towards its own.
            if (random.nextInt(3) == 0) {
                int towards = random.nextInt(3) < 2 ? queue : random.nextInt(3);
                words.add(random.nextInt(words.size()), pick(random, LEANING[towards]));
            }
            text.append(String.join(" ", words)).append(".\n");
        }
        int code = 1000 + random.nextInt(9000);
        text.append(planted(random, leaky, queue == 0) ? "Case BLQ-" + code : "Case #" + code).append('\n');
        if (planted(random, leaky, queue == 0)) {
            text.append("Reply to accounts@ledgerline.example with questions.\n");
        } else {
            text.append("Reply to this message with questions.\n");
        }
        text.append('\n').append(planted(random, leaky, queue == 1) ? TABLET_SIGNATURE : DESK_SIGNATURE).append('\n');
        return text.toString();
    }

    private static String pick(Random random, String[] words) {
        return words[random.nextInt(words.length)];
    }

    /** Writes {@code docs} as JSON Lines with id, text and label. */
    public static Path write(List<Document> docs, Path file) throws IOException {
        ObjectMapper mapper = new ObjectMapper();
        StringBuilder out = new StringBuilder();
        for (Document d : docs) {
            ObjectNode node = mapper.createObjectNode();
            node.put("id", d.id());
            node.put("text", d.text());
            if (d.label() != null) {
                node.put("label", d.label());
            }
            out.append(node).append('\n');
        }
        Files.writeString(file, out, StandardCharsets.UTF_8);
        return file;
    }
}
