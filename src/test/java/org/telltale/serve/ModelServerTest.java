package org.telltale.serve;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.telltale.connect.SupportQueueModel;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ScoreMatrix;

class ModelServerTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final HttpClient CLIENT = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
    private static BuiltinModel model;
    private static ModelServer server;
    private static final ByteArrayOutputStream LOG = new ByteArrayOutputStream();

    @BeforeAll
    static void start() {
        model = SupportQueueModel.train();
        server = ModelServer.start(model, model.labels(),
                ServerSettings.defaults("support").withPort(0).withThreads(2).withMaxBatch(8).withMaxBody(4096),
                new PrintStream(LOG, true, StandardCharsets.UTF_8));
    }

    @AfterAll
    static void stop() {
        server.close();
    }

    private static HttpResponse<String> post(String path, String body) throws IOException, InterruptedException {
        return CLIENT.send(HttpRequest.newBuilder(URI.create(server.url() + path)).timeout(Duration.ofSeconds(10))
                .POST(HttpRequest.BodyPublishers.ofString(body, StandardCharsets.UTF_8)).build(),
                HttpResponse.BodyHandlers.ofString(StandardCharsets.UTF_8));
    }

    private static HttpResponse<String> get(String path) throws IOException, InterruptedException {
        return CLIENT.send(HttpRequest.newBuilder(URI.create(server.url() + path)).timeout(Duration.ofSeconds(10)).GET().build(),
                HttpResponse.BodyHandlers.ofString(StandardCharsets.UTF_8));
    }

    private static String textsJson(List<String> texts) throws IOException {
        return JSON.writeValueAsString(java.util.Map.of("texts", texts));
    }

    @Test
    void bindsLoopbackByDefault() {
        assertTrue(server.url().startsWith("http://127.0.0.1:"), server.url());
        assertFalse(server.exposed());
    }

    @Test
    void aHostThatDoesNotResolveIsNamedWithItsAddress() {
        // RFC 6761 §6.4: names under .invalid never resolve.
        org.telltale.TelltaleException e = org.junit.jupiter.api.Assertions.assertThrows(org.telltale.TelltaleException.class,
                () -> ModelServer.start(model, model.labels(), ServerSettings.defaults("support").withHost("desk.invalid")
                        .withPort(0), new PrintStream(LOG, true, StandardCharsets.UTF_8)));
        assertEquals("cannot listen on desk.invalid:0: unknown host", e.getMessage());
    }

    @Test
    void scoreAnswersTheModelsExactDoubles() throws Exception {
        HttpResponse<String> r = post("/score", textsJson(SupportQueueModel.PROBES));
        assertEquals(200, r.statusCode(), r.body());
        JsonNode body = JSON.readTree(r.body());
        ScoreMatrix expected = model.score(SupportQueueModel.PROBES);
        assertEquals(expected.labels(), JSON.convertValue(body.get("labels"), List.class));
        for (int i = 0; i < expected.size(); i++) {
            double[] row = JSON.convertValue(body.get("scores").get(i), double[].class);
            assertArrayEquals(expected.row(i), row, 0, "row " + i);
        }
    }

    @Test
    void openInferenceMetadataNamesTheLabelsAndInferAnswersFp32() throws Exception {
        JsonNode meta = JSON.readTree(get("/v2/models/support").body());
        assertEquals("support", meta.get("name").asText());
        assertEquals(model.labels(), JSON.convertValue(meta.get("outputs").get(0).get("parameters").get("labels"), List.class));
        String req = "{\"id\":\"r1\",\"inputs\":[{\"name\":\"text\",\"shape\":[2],\"datatype\":\"BYTES\",\"data\":[\"refund please\",\"site down\"]}]}";
        HttpResponse<String> r = post("/v2/models/support/infer", req);
        assertEquals(200, r.statusCode(), r.body());
        JsonNode out = JSON.readTree(r.body());
        assertEquals("r1", out.get("id").asText());
        JsonNode tensor = out.get("outputs").get(0);
        assertEquals("FP32", tensor.get("datatype").asText());
        assertEquals(List.of(2, 3), JSON.convertValue(tensor.get("shape"), List.class));
        double[] expected = model.score(List.of("refund please")).row(0);
        for (int j = 0; j < 3; j++) {
            assertEquals((float) expected[j], (float) tensor.get("data").get(j).doubleValue());
        }
    }

    @Test
    void healthRoutesAnswer() throws Exception {
        assertEquals(200, get("/health").statusCode());
        assertEquals("true", JSON.readTree(get("/v2/health/ready").body()).get("ready").asText());
    }

    @Test
    void oversizedBodiesAre413() throws Exception {
        HttpResponse<String> r = post("/score", textsJson(List.of("x".repeat(5000))));
        assertEquals(413, r.statusCode());
        assertTrue(JSON.readTree(r.body()).get("error").asText().contains("limit of 4096 bytes"), r.body());
    }

    @Test
    void hugeBatchesAre400() throws Exception {
        HttpResponse<String> r = post("/score", textsJson(java.util.Collections.nCopies(9, "a")));
        assertEquals(400, r.statusCode());
        assertTrue(r.body().contains("at most 8 per request"), r.body());
    }

    @Test
    void malformedRequestsGetAJsonErrorWithoutAStackTrace() throws Exception {
        for (String bad : List.of("{\"texts\": [\"a\",", "[]", "{\"texts\": [1]}", "", "{\"texts\": \"a\"}", "\u0000\u0001")) {
            HttpResponse<String> r = post("/score", bad);
            assertEquals(400, r.statusCode(), bad);
            JsonNode body = JSON.readTree(r.body());
            assertTrue(body.get("error").isTextual(), r.body());
            assertFalse(r.body().contains("at org."), r.body());
            assertFalse(r.body().contains("Exception"), r.body());
        }
        HttpResponse<String> infer = post("/v2/models/support/infer", "{\"inputs\":[{\"datatype\":\"FP32\",\"shape\":[1],\"data\":[1]}]}");
        assertEquals(400, infer.statusCode());
    }

    @Test
    void unknownRoutesAndMethodsAreRefused() throws Exception {
        assertEquals(404, get("/nope").statusCode());
        assertEquals(404, get("/v2/models/other").statusCode());
        assertEquals(405, get("/score").statusCode());
        assertEquals(405, post("/health", "{}").statusCode());
    }

    @Test
    void nameOfAModelFileIsItsBaseName() {
        assertEquals("support-v2", ServerSettings.nameOf(java.nio.file.Path.of("/tmp/models/support-v2.json")));
    }
}
