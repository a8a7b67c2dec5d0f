package org.telltale.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * An invented corpus: messages to the help desk of a fictional town library, Harbourview, in
 * three labels. Each message mixes phrases typical of its label with shared filler, so a model
 * learns something but not everything.
 */
final class LibraryDeskCorpus {
    static final List<String> LABELS = List.of("events", "loans", "membership");
    private static final String[][] PHRASES = {
        {"is the poetry evening still on", "can my class join the author talk", "tickets for the film night",
            "the chess club meets on thursday", "storytime for toddlers"},
        {"my loan is overdue", "can I renew the atlas", "the book I reserved has not arrived",
            "return the audiobook late", "how many items can I borrow"},
        {"my library card expired", "change the address on my membership", "family card for two adults",
            "I lost my card", "student membership discount"},
    };
    private static final String[] FILLER = {"hello", "thanks a lot", "kind regards", "please help", "quick question"};

    private LibraryDeskCorpus() {
    }

    /** Writes {@code perLabel} messages of each label as JSON Lines and returns the path. */
    static Path write(Path dir, int perLabel, long seed, boolean withLabels) throws IOException {
        SplittableRandom random = new SplittableRandom(seed);
        List<String> lines = new ArrayList<>();
        int n = 0;
        for (int k = 0; k < perLabel; k++) {
            for (int c = 0; c < LABELS.size(); c++) {
                String text = FILLER[random.nextInt(FILLER.length)] + ", " + PHRASES[c][random.nextInt(5)]
                        + (random.nextInt(3) == 0 ? " and " + PHRASES[random.nextInt(3)][random.nextInt(5)] : "")
                        + ". " + FILLER[random.nextInt(FILLER.length)];
                String label = withLabels ? ",\"label\":\"" + LABELS.get(c) + "\"" : "";
                lines.add(String.format(Locale.ROOT, "{\"id\":\"hv-%03d\",\"text\":\"%s\"%s}", ++n, text, label));
            }
        }
        Path file = dir.resolve(withLabels ? "desk.jsonl" : "desk-unlabelled.jsonl");
        Files.write(file, lines, StandardCharsets.UTF_8);
        return file;
    }
}
