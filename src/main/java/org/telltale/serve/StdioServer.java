package org.telltale.serve;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.telltale.model.TextClassifier;

/**
 * Serves a model over stdin/stdout in the line form of the scoring protocol — one request object
 * per line in, one answer object per line out — so a built-in model can itself be run as an
 * {@code exec:} subprocess. A bad line gets an answer {@code {"error": "…"}} and the loop goes on;
 * end of input ends it.
 */
public final class StdioServer {
    private StdioServer() {
    }

    /** Answers lines until {@code in} ends; returns how many requests it answered. */
    public static int run(TextClassifier model, InputStream in, OutputStream out, int maxBatch) throws IOException {
        BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
        int answered = 0;
        String line;
        while ((line = reader.readLine()) != null) {
            if (line.isBlank()) {
                continue;
            }
            byte[] answer;
            try {
                List<String> texts = ScoreRequests.nativeTexts(line.getBytes(StandardCharsets.UTF_8), maxBatch);
                answer = ScoreRequests.nativeAnswer(model.score(texts));
            } catch (HttpError e) {
                answer = ScoreRequests.error(e.getMessage());
            } catch (RuntimeException e) {
                answer = ScoreRequests.error("internal error: " + e.getClass().getSimpleName());
            }
            out.write(answer);
            out.write('\n');
            out.flush();
            answered++;
        }
        return answered;
    }
}
