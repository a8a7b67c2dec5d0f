package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Arbitrary bytes, and JSON-looking mutations of good answers, never crash the answer parsers:
 * each either reads a result or reports a {@link MalformedResponse} (common practice: parser fuzzing).
 */
class ProtocolParserPropertyTest {
    private static final List<String> GOOD = List.of(
            "{\"labels\":[\"a\",\"b\"],\"scores\":[[0.1,0.9],[0.5,0.5]]}",
            "{\"outputs\":[{\"name\":\"s\",\"datatype\":\"FP32\",\"shape\":[2,2],\"data\":[0.1,0.9,0.5,0.5]}]}",
            "{\"name\":\"m\",\"inputs\":[{\"name\":\"t\"}],\"outputs\":[{\"parameters\":{\"labels\":[\"a\",\"b\"]}}]}",
            "{\"predictions\":[{\"a\":0.1,\"b\":0.9},[0.5,0.5]]}",
            "[[{\"label\":\"a\",\"score\":0.9},{\"label\":\"b\",\"score\":0.1}],[{\"label\":\"b\",\"score\":0.6},{\"label\":\"a\",\"score\":0.4}]]");

    private static List<Runnable> parsers(byte[] body) {
        return List.of(
                () -> NativeCodec.parse(body),
                () -> OpenInferenceCodec.parseInfer(body, 2, List.of("a", "b")),
                () -> OpenInferenceCodec.parseInfer(body, 2, List.of()),
                () -> OpenInferenceCodec.parseMetadata(body, List.of()),
                () -> InstancesCodec.parse(body, List.of()),
                () -> PipelineCodec.parse(body));
    }

    private static void parseAll(byte[] body) {
        parsers(body).forEach(ProtocolParserPropertyTest::check);
    }

    private static void check(Runnable parse) {
        try {
            parse.run();
        } catch (MalformedResponse expected) {
            // a clear error is the other allowed outcome
        }
    }

    @Property(tries = 500)
    void arbitraryBytesNeverCrashTheParsers(@ForAll byte[] body) {
        parseAll(body);
    }

    @Property(tries = 1000)
    void mutatedAnswersNeverCrashTheParsers(@ForAll("mutants") String body) {
        parseAll(body.getBytes(StandardCharsets.UTF_8));
    }

    @Provide
    Arbitrary<String> mutants() {
        Arbitrary<String> base = Arbitraries.of(GOOD);
        Arbitrary<String> junk = Arbitraries.of("", "[", "]", "{", "}", ",", ":", "\"", "null", "-1", "1e999", "NaN",
                "[[", "{\"a\":", "\\u0000", "true", "\"labels\"", "\"data\"", "[1,2]", "9999999999");
        return net.jqwik.api.Combinators.combine(base, Arbitraries.integers().between(0, 200), junk, Arbitraries.integers().between(0, 5))
                .as((b, at, j, cut) -> {
                    int i = Math.min(at, b.length());
                    String s = b.substring(0, i) + j + b.substring(Math.min(b.length(), i + cut));
                    return s;
                });
    }

    /** Nesting past Jackson's limit (1,000, StreamReadConstraints) is refused by every parser, never read. */
    @Property(tries = 200)
    void deeplyNestedJsonIsAClearError(@ForAll("depths") int depth) {
        byte[] bare = ("[".repeat(depth) + "]".repeat(depth)).getBytes(StandardCharsets.UTF_8);
        byte[] inField = ("{\"scores\":" + "[".repeat(depth) + "]".repeat(depth) + "}").getBytes(StandardCharsets.UTF_8);
        for (byte[] body : List.of(bare, inField)) {
            for (Runnable parse : parsers(body)) {
                MalformedResponse e = assertThrows(MalformedResponse.class, parse::run);
                assertTrue(e.getMessage().startsWith("the response: not valid JSON: Document nesting depth"), e.getMessage());
            }
        }
    }

    @Provide
    Arbitrary<Integer> depths() {
        return Arbitraries.integers().between(1001, 5000);
    }
}
