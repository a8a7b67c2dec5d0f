package org.telltale.report.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.telltale.TelltaleException;
import org.telltale.overlap.Inflation;
import org.telltale.overlap.OverlapPair;
import org.telltale.overlap.OverlapResult;
import org.telltale.overlap.OverlapSettings;
import org.telltale.overlap.OverlapSummary;
import org.telltale.overlap.PairKind;

class OverlapJsonTest {
    private static OverlapResult sample() {
        List<OverlapPair> pairs = List.of(
                new OverlapPair(PairKind.TRAIN_TEST, "t1", "s1", 1.0, true, "billing", "booking"),
                new OverlapPair(PairKind.TRAIN_TEST, "t2", "s2", 0.85, false, "billing", null),
                new OverlapPair(PairKind.WITHIN_TRAIN, "t1", "t3", 0.9, false, "billing", "billing"),
                new OverlapPair(PairKind.WITHIN_TEST, "s4", "s5", 1.0, true, null, null));
        OverlapSummary summary = new OverlapSummary(3, 5, 0, 1, 2, 1, 1, 1, 2, 1, 1, 2, 17);
        return new OverlapResult("train.jsonl", "test.jsonl", OverlapSettings.defaults().withSeed(9), pairs, summary,
                Map.of("t1", "Refund, please — \"now\"."), Map.of("s1", "refund please now"),
                new Inflation("model.json", 4, 3, 2, 1));
    }

    @Test
    void writesTheContractFieldsInSnakeCase() throws Exception {
        // The telltale.overlap v1 contract of the overlap issue: format, version, pairs with
        // train, test, similarity, exact, same_label; summary; r and b stated.
        JsonNode root = new ObjectMapper().readTree(OverlapJson.toJson(sample()));
        assertEquals("telltale.overlap", root.get("format").asText());
        assertEquals(1, root.get("version").asInt());
        JsonNode first = root.get("pairs").get(0);
        for (String field : List.of("train", "test", "similarity", "exact", "same_label")) {
            assertTrue(first.has(field), field);
        }
        assertEquals(false, first.get("same_label").asBoolean());
        assertTrue(root.get("pairs").get(1).get("same_label").isNull());
        assertEquals(7, root.get("settings").get("rows").asInt());
        assertEquals(17, root.get("settings").get("bands").asInt());
        assertEquals(2, root.get("summary").get("test_seen").asInt());
        assertEquals(0.4, root.get("summary").get("test_seen_share").asDouble(), 1e-12);
        assertEquals(0.25, root.get("accuracy").get("inflation").asDouble(), 1e-12);
        assertEquals("s4", root.get("within_test").get(0).get("first").asText());
    }

    @Test
    void readsBackWhatItWrote() {
        OverlapResult original = sample();
        OverlapResult read = OverlapJson.fromJson(OverlapJson.toJson(original));
        assertEquals(original.pairs(), read.pairs());
        assertEquals(original.summary(), read.summary());
        assertEquals(original.inflation(), read.inflation());
        assertEquals(original.trainTexts(), read.trainTexts());
        assertEquals(original.testTexts(), read.testTexts());
        assertEquals(original.settings().banding(), read.settings().banding());
        assertEquals(9, read.settings().seed());
    }

    @Test
    void refusesOtherFormatsAndNamesMissingFields() {
        TelltaleException wrong = assertThrows(TelltaleException.class,
                () -> OverlapJson.fromJson("{\"format\":\"telltale.audit\",\"version\":1}"));
        assertTrue(wrong.getMessage().contains("telltale.audit"), wrong.getMessage());
        String broken = OverlapJson.toJson(sample()).replace("\"similarity\" : 0.85", "\"similarity\" : \"high\"");
        TelltaleException missing = assertThrows(TelltaleException.class, () -> OverlapJson.fromJson(broken));
        assertTrue(missing.getMessage().contains("similarity") && missing.getMessage().contains("pairs[1]"), missing.getMessage());
    }

    private static String message(String json) {
        return assertThrows(org.telltale.json.ContractException.class, () -> OverlapJson.fromJson(json)).getMessage();
    }

    @Test
    void aMissingFieldIsNamedWithItsPath() {
        String json = OverlapJson.toJson(sample()).replace("\"train_seen\" : 2,", "");
        assertEquals("overlap result: summary.train_seen: missing", message(json));
    }

    @Test
    void aMistypedFieldIsNamedWithWhatWasFound() {
        String json = OverlapJson.toJson(sample()).replace("\"similarity\" : 0.85", "\"similarity\" : \"high\"");
        assertEquals("overlap result: pairs[1].similarity: expected a number, found the string \"high\"", message(json));
    }

    @Test
    void aSettingOutOfRangeIsNamedWithItsPlace() {
        String json = OverlapJson.toJson(sample()).replace("\"shingle\" : 5", "\"shingle\" : 0");
        assertEquals("overlap result: settings: shingle must be at least 1: 0, found an object", message(json));
    }

    @Test
    void anotherVersionIsRefusedByTheOneVersionCheck() {
        String json = OverlapJson.toJson(sample()).replace("\"version\" : 1", "\"version\" : 2");
        assertEquals("overlap result: version: telltale.overlap version 2 is not supported (this Telltale reads version 1)",
                message(json));
    }
}
