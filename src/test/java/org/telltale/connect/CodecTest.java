package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Test;

class CodecTest {
    private static byte[] b(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    @Test
    void nativeRequestEscapesTextsAsJsonStrings() {
        assertEquals("{\"texts\":[\"a \\\"q\\\"\\n\",\"ü\"]}", new String(NativeCodec.request(List.of("a \"q\"\n", "ü")), StandardCharsets.UTF_8));
    }

    @Test
    void nativeAnswerIsReadExactly() {
        RawScores r = NativeCodec.parse(b("{\"labels\":[\"a\",\"b\"],\"scores\":[[0.1,0.9],[0.30000000000000004,0.7]]}"));
        assertEquals(List.of("a", "b"), r.labels());
        assertArrayEquals(new double[] {0.30000000000000004, 0.7}, r.rows()[1], 0);
    }

    @Test
    void nanLiteralsAreReadSoThatValidationCanNameThem() {
        RawScores r = NativeCodec.parse(b("{\"labels\":[\"a\"],\"scores\":[[NaN]]}"));
        assertTrue(Double.isNaN(r.rows()[0][0]));
    }

    @Test
    void malformedNativeAnswersGetClearMessages() {
        assertTrue(msg(() -> NativeCodec.parse(b("{\"labels\":[\"a\"],\"scores\":[[0.1,"))).startsWith("the response: not valid JSON: Unexpected end-of-input"));
        assertTrue(msg(() -> NativeCodec.parse(b("[1,2]"))).startsWith("the response: expected an object, found an array; response: [1,2]"));
        assertTrue(msg(() -> NativeCodec.parse(b("{\"labels\":[1],\"scores\":[]}"))).startsWith("the response: labels[0]: expected a string, found the number 1; response: "));
        assertTrue(msg(() -> NativeCodec.parse(b("{\"labels\":[\"a\"],\"scores\":[[\"0.5\"]]}"))).startsWith("the response: scores[0][0]: expected a number, found the string \"0.5\"; response: "));
        assertEquals("the model answered an error: out of memory", msg(() -> NativeCodec.parse(b("{\"error\":\"out of memory\"}"))));
        assertEquals("the response: empty, expected JSON", msg(() -> NativeCodec.parse(b(""))));
    }

    @Test
    void aNativeAnswerWithoutItsScoresNamesTheMissingField() {
        assertTrue(msg(() -> NativeCodec.parse(b("{\"labels\":[\"a\"]}"))).startsWith("the response: scores: missing"),
                msg(() -> NativeCodec.parse(b("{\"labels\":[\"a\"]}"))));
    }

    @Test
    void openInferenceOutputIsReadFlatOrNested() {
        // Open Inference Protocol v2, REST: tensor "data" is row-major, flat or nested (from the protocol's spec).
        List<String> labels = List.of("ham", "spam");
        RawScores flat = OpenInferenceCodec.parseInfer(b("{\"outputs\":[{\"name\":\"scores\",\"datatype\":\"FP32\",\"shape\":[2,2],\"data\":[0.25,0.75,1,0]}]}"), 2, labels);
        RawScores nested = OpenInferenceCodec.parseInfer(b("{\"outputs\":[{\"name\":\"scores\",\"datatype\":\"FP32\",\"shape\":[2,2],\"data\":[[0.25,0.75],[1,0]]}]}"), 2, labels);
        assertArrayEquals(flat.rows()[0], nested.rows()[0]);
        assertArrayEquals(new double[] {1, 0}, nested.rows()[1]);
        assertTrue(msg(() -> OpenInferenceCodec.parseInfer(b("{\"outputs\":[{\"datatype\":\"FP32\",\"shape\":[2,2],\"data\":[1,0,1]}]}"), 2, labels))
                .startsWith("the output tensor has shape [2,2] but 3 values"));
    }

    @Test
    void openInferenceMetadataGivesInputNameAndLabels() {
        var m = OpenInferenceCodec.parseMetadata(b("{\"name\":\"m\",\"inputs\":[{\"name\":\"body\",\"datatype\":\"BYTES\",\"shape\":[-1]}],"
                + "\"outputs\":[{\"name\":\"scores\",\"datatype\":\"FP32\",\"shape\":[-1,2],\"parameters\":{\"labels\":[\"x\",\"y\"]}}]}"), List.of());
        assertEquals("body", m.input());
        assertEquals(List.of("x", "y"), m.labels());
    }

    @Test
    void instancesAcceptRowsOrLabelObjects() {
        RawScores rows = InstancesCodec.parse(b("{\"predictions\":[[0.2,0.8]]}"), List.of());
        assertEquals(List.of("0", "1"), rows.labels());
        RawScores named = InstancesCodec.parse(b("{\"predictions\":[{\"spam\":0.8,\"ham\":0.2},{\"ham\":0.6,\"spam\":0.4}]}"), List.of());
        assertEquals(List.of("spam", "ham"), named.labels());
        assertArrayEquals(new double[] {0.4, 0.6}, named.rows()[1]);
        assertTrue(msg(() -> InstancesCodec.parse(b("{\"predictions\":[{\"spam\":0.8,\"ham\":0.2},{\"eggs\":1,\"ham\":0}]}"), List.of()))
                .startsWith("prediction 1 has label 'eggs'"));
    }

    @Test
    void pipelineListsAreReorderedToTheFirstTextsLabels() {
        // Lists sorted by score, as the text-classification pipeline answers with every label's score.
        RawScores r = PipelineCodec.parse(b("[[{\"label\":\"spam\",\"score\":0.8},{\"label\":\"ham\",\"score\":0.2}],"
                + "[{\"label\":\"ham\",\"score\":0.6},{\"label\":\"spam\",\"score\":0.4}]]"));
        assertEquals(List.of("spam", "ham"), r.labels());
        assertArrayEquals(new double[] {0.8, 0.2}, r.rows()[0]);
        assertArrayEquals(new double[] {0.4, 0.6}, r.rows()[1]);
        RawScores wrapped = PipelineCodec.parse(b("{\"predictions\":[[{\"label\":\"a\",\"score\":1}]]}"));
        assertEquals(List.of("a"), wrapped.labels());
    }

    @Test
    void pipelineAnswersThatDoNotScoreEveryLabelAreClearErrors() {
        String two = "[{\"label\":\"spam\",\"score\":0.8},{\"label\":\"ham\",\"score\":0.2}]";
        assertTrue(msg(() -> PipelineCodec.parse(b("[" + two + ",[{\"label\":\"spam\",\"score\":1}]]")))
                .startsWith("text 1 has 1 labels, text 0 has 2 [spam, ham]"));
        assertTrue(msg(() -> PipelineCodec.parse(b("[" + two + ",[{\"label\":\"eggs\",\"score\":1},{\"label\":\"ham\",\"score\":0}]]")))
                .startsWith("text 1 scores label 'eggs' that text 0 lacks"));
        assertTrue(msg(() -> PipelineCodec.parse(b("[" + two + ",[{\"label\":\"ham\",\"score\":1},{\"label\":\"ham\",\"score\":0}]]")))
                .startsWith("text 1 scores label 'ham' twice"));
        // A top label alone (the pipeline's default without every score) is not enough to explain.
        assertTrue(msg(() -> PipelineCodec.parse(b("[{\"label\":\"spam\",\"score\":0.8}]")))
                .startsWith("the answer for text 0 is not a non-empty list"));
        assertTrue(msg(() -> PipelineCodec.parse(b("[[{\"label\":\"spam\",\"score\":\"high\"}]]")))
                .startsWith("the response: [0][0].score: expected a number, found the string \"high\"; response: "));
        assertTrue(msg(() -> PipelineCodec.parse(b("{\"error\":\"model says no\"}"))).startsWith("the model answered an error"));
    }

    private static String msg(Runnable r) {
        return assertThrows(MalformedResponse.class, r::run).getMessage();
    }
}
