package org.telltale.serve;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.telltale.connect.SupportQueueModel;
import org.telltale.model.BuiltinModel;

/** Arbitrary request bodies never crash the server's parsers: a result or a 400 (common practice: parser fuzzing). */
class RequestParserPropertyTest {
    private static final BuiltinModel MODEL = SupportQueueModel.train();

    private static void parseAll(byte[] body) {
        try {
            ScoreRequests.nativeTexts(body, 64);
        } catch (HttpError e) {
            if (e.status() != 400) {
                throw e;
            }
        }
        try {
            ScoreRequests.inferTexts(body, 64);
        } catch (HttpError e) {
            if (e.status() != 400) {
                throw e;
            }
        }
    }

    @Property(tries = 500)
    void arbitraryBytesAreAResultOrA400(@ForAll byte[] body) {
        parseAll(body);
    }

    @Property(tries = 500)
    void mutatedRequestsAreAResultOrA400(@ForAll("mutants") String body) {
        parseAll(body.getBytes(StandardCharsets.UTF_8));
    }

    @Provide
    Arbitrary<String> mutants() {
        Arbitrary<String> base = Arbitraries.of("{\"texts\":[\"a\",\"b\"]}",
                "{\"inputs\":[{\"name\":\"text\",\"shape\":[2],\"datatype\":\"BYTES\",\"data\":[\"a\",\"b\"]}]}");
        Arbitrary<String> junk = Arbitraries.of("", "[", "]", "{", "}", ",", "\"", "null", "-1", "1e999", "[[", "\\ud800", "true", "9999999999");
        return net.jqwik.api.Combinators.combine(base, Arbitraries.integers().between(0, 90), junk, Arbitraries.integers().between(0, 4))
                .as((b, at, j, cut) -> {
                    int i = Math.min(at, b.length());
                    return b.substring(0, i) + j + b.substring(Math.min(b.length(), i + cut));
                });
    }

    @Property(tries = 100)
    void theLineServerAnswersEveryLineWithAnAnswerOrAnError(@ForAll("lines") String line) throws Exception {
        Assume.that(!line.isBlank() && line.indexOf('\n') < 0 && line.indexOf('\r') < 0);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        int answered = StdioServer.run(MODEL, new ByteArrayInputStream((line + "\n").getBytes(StandardCharsets.UTF_8)), out, 64);
        String answer = out.toString(StandardCharsets.UTF_8);
        if (answered != 1 || !(answer.startsWith("{\"labels\"") || answer.startsWith("{\"error\""))) {
            throw new AssertionError("line " + line + " got " + answer);
        }
    }

    @Provide
    Arbitrary<String> lines() {
        return Arbitraries.oneOf(mutants(), Arbitraries.strings().ofMaxLength(40));
    }
}
