package org.telltale.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class JsonValueTest {
    private static final String AUDIT = """
            {"format": "telltale.audit", "version": 2,
             "findings": [{"support": 3}, {"support": 4}, {"support": 5}, {"support": "12"}, {}]}
            """;

    private static String error(Runnable read) {
        return assertThrows(ContractException.class, read::run).getMessage();
    }

    private static JsonValue finding(int i) {
        return JsonValue.parse(AUDIT, "audit.json").array("findings").get(i);
    }

    @Test
    void aMistypedFieldNamesSourcePathAndWhatWasFound() {
        assertEquals("audit.json: findings[3].support: expected an integer, found the string \"12\"",
                error(() -> finding(3).integer("support")));
    }

    @Test
    void aMissingFieldNamesItsPath() {
        assertEquals("audit.json: findings[4].support: missing", error(() -> finding(4).integer("support")));
    }

    @Test
    void aFractionIsNotAnInteger() {
        assertEquals("x: n: expected an integer, found the number 1.5",
                error(() -> JsonValue.parse("{\"n\": 1.5}", "x").integer("n")));
    }

    @Test
    void aNullRequiredFieldIsNamed() {
        assertEquals("x: n: expected a value, found null", error(() -> JsonValue.parse("{\"n\": null}", "x").number("n")));
    }

    @Test
    void anOptionalFieldMayBeAbsentOrNullButNotMistyped() {
        JsonValue v = JsonValue.parse("{\"a\": null, \"c\": 7}", "x");
        assertEquals(java.util.Arrays.asList(null, null), java.util.Arrays.asList(v.optionalString("a"), v.optionalString("b")));
        assertEquals("x: c: expected a string, found the number 7", error(() -> v.optionalString("c")));
    }

    @Test
    void aNullableNumberMustBePresent() {
        assertEquals("x: n: missing", error(() -> JsonValue.parse("{}", "x").numberOrNaN("n")));
    }

    @Test
    void aNullableNumberReadsNullAsNaN() {
        assertEquals(Double.NaN, JsonValue.parse("{\"n\": null}", "x").numberOrNaN("n"));
    }

    @Test
    void aNullableStringMustBePresent() {
        assertEquals("x: gold: missing", error(() -> JsonValue.parse("{}", "x").nullableString("gold")));
    }

    @Test
    void theVersionCheckNamesTheFormatAndTheVersionsRead() {
        assertEquals("audit.json: version: telltale.audit version 2 is not supported (this Telltale reads version 1)",
                error(() -> JsonValue.parse(AUDIT, "audit.json").version("telltale.audit", 1)));
    }

    @Test
    void theFormatCheckNamesBothFormats() {
        assertEquals("audit.json: format: expected \"telltale.overlap\", found \"telltale.audit\"",
                error(() -> JsonValue.parse(AUDIT, "audit.json").version("telltale.overlap", 1)));
    }

    /** RFC 8259 §4 leaves duplicate names undefined; a contract reader refuses them (common practice). */
    @Test
    void duplicateKeysAreRefused() {
        assertEquals(true, error(() -> JsonValue.parse("{\"a\": 1, \"a\": 2}", "x")).startsWith("x: not valid JSON: Duplicate field 'a'"));
    }

    @Test
    void trailingContentIsRefused() {
        assertEquals(true, error(() -> JsonValue.parse("{\"a\": 1} {\"b\": 2}", "x")).startsWith("x: not valid JSON: "));
    }

    /** Jackson's StreamReadConstraints default nesting limit is 1,000 (from memory of its 2.15 release notes). */
    @Test
    void deepNestingIsAClearErrorNotAStackOverflow() {
        String deep = "[".repeat(100_000) + "]".repeat(100_000);
        assertEquals(true, error(() -> JsonValue.parse(deep, "x")).startsWith("x: not valid JSON: "));
    }
}
