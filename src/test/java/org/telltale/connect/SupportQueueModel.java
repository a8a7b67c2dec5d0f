package org.telltale.connect;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ModelFile;
import org.telltale.model.NaiveBayesTrainer;
import org.telltale.model.TermCounter;
import org.telltale.model.TrainingSet;

/**
 * A small built-in model trained on an invented support queue (billing, outage, login tickets of
 * a fictional web host), saved as a model file for connector and server tests.
 */
public final class SupportQueueModel {
    public static final List<String> TICKETS = List.of(
            "I was charged twice for my invoice this month", "billing",
            "please refund the duplicate payment on my card", "billing",
            "the invoice shows the wrong plan price", "billing",
            "my website is down and returns error 502", "outage",
            "the server has been unreachable since this morning", "outage",
            "all pages time out, is there an outage", "outage",
            "I cannot log in, my password reset link expired", "login",
            "two factor code is never accepted at sign in", "login",
            "locked out of my account after a password change", "login");

    /** Texts to score in tests: ticket-like sentences the model has not seen. */
    public static final List<String> PROBES = List.of(
            "refund my payment please", "site down error", "password link expired again",
            "", "Ünïcödé \"quotes\" and a\nnew line", "charged for an outage while locked out");

    private SupportQueueModel() {
    }

    public static BuiltinModel train() {
        TermCounter counter = new TermCounter("standard", 1);
        List<Map<String, Integer>> counts = new ArrayList<>();
        List<String> gold = new ArrayList<>();
        for (int i = 0; i < TICKETS.size(); i += 2) {
            counts.add(counter.count(TICKETS.get(i)));
            gold.add(TICKETS.get(i + 1));
        }
        return new NaiveBayesTrainer(1.0).fit(TrainingSet.of(counts, gold), counter, null);
    }

    /** Trains the model and writes it to {@code dir/support.json}. */
    public static Path write(Path dir) {
        Path file = dir.resolve("support.json");
        ModelFile.save(train(), file);
        return file;
    }
}
