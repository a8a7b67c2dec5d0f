package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.function.Function;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.telltale.UnknownKeyException;

/** The explanation engine's closed choices read like every other enum: one exception, the accepted keys listed (common practice). */
class ExplainChoiceKeysTest {
    static Stream<Arguments> parsers() {
        return Stream.of(
                Arguments.of((Function<String, Object>) Sampling::fromKey, "unknown sampling 'x'; one of: uniform, kernel", " Kernel ", Sampling.KERNEL),
                Arguments.of((Function<String, Object>) Pairing::fromKey, "unknown pairing 'x'; one of: none, complement, disjoint", "complement", Pairing.COMPLEMENT),
                Arguments.of((Function<String, Object>) Selection::fromKey, "unknown selection 'x'; one of: forward, lasso", "LASSO", Selection.LASSO),
                Arguments.of((Function<String, Object>) Target::fromKey, "unknown target 'x'; one of: probability, log-odds, auto", "log-odds", Target.LOG_ODDS),
                Arguments.of((Function<String, Object>) Weighting::fromKey, "unknown weighting 'x'; one of: cosine, shapley", "Shapley", Weighting.SHAPLEY));
    }

    @ParameterizedTest
    @MethodSource("parsers")
    void anUnknownKeyNamesTheAcceptedOnes(Function<String, Object> parse, String message, String known, Object value) {
        assertEquals(message, assertThrows(UnknownKeyException.class, () -> parse.apply("x")).getMessage());
    }

    @ParameterizedTest
    @MethodSource("parsers")
    void keysAreReadWithoutCaseOrSurroundingSpace(Function<String, Object> parse, String message, String known, Object value) {
        assertEquals(value, parse.apply(known));
    }
}
