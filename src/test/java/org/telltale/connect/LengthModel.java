package org.telltale.connect;

import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

/**
 * A tiny deterministic classifier for connector tests: P(long) grows with the text's length, so
 * every text has its own score and a mixed-up order shows. Counts its calls and the largest
 * number of calls it served at once.
 */
final class LengthModel implements TextClassifier {
    static final List<String> LABELS = List.of("short", "long");
    final AtomicInteger calls = new AtomicInteger();
    final AtomicInteger inFlight = new AtomicInteger();
    final AtomicInteger maxInFlight = new AtomicInteger();
    private final long pauseMillis;

    LengthModel(long pauseMillis) {
        this.pauseMillis = pauseMillis;
    }

    LengthModel() {
        this(0);
    }

    static double[] expected(String text) {
        double p = text.length() / (text.length() + 10.0);
        return new double[] {1 - p, p};
    }

    @Override
    public ScoreMatrix score(List<String> texts) {
        calls.incrementAndGet();
        int now = inFlight.incrementAndGet();
        maxInFlight.accumulateAndGet(now, Math::max);
        try {
            if (pauseMillis > 0) {
                Thread.sleep(pauseMillis);
            }
            double[][] rows = new double[texts.size()][];
            for (int i = 0; i < rows.length; i++) {
                rows[i] = expected(texts.get(i));
            }
            return new ScoreMatrix(LABELS, rows);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        } finally {
            inFlight.decrementAndGet();
        }
    }

    @Override
    public String describe() {
        return "length model";
    }
}
