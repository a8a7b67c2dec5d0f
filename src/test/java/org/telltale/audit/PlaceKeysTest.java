package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.telltale.text.Span;

class PlaceKeysTest {

    @Test
    void aUrlsHostIsItsAuthorityWithoutUserPortOrPath() {
        // RFC 3986 §3: "foo://example.com:8042/over/there?name=ferret#nose" has the authority
        // example.com:8042, whose host is example.com (the RFC's own example).
        assertEquals("example.com", PlaceKeys.host("foo://example.com:8042/over/there?name=ferret#nose"));
        assertEquals("moves.quillmoor.example", PlaceKeys.host("https://Moves.Quillmoor.example/track/ab12"));
        assertEquals("machine.example", PlaceKeys.host("jdoe@machine.example"));
        assertEquals("www.example.org", PlaceKeys.host("www.example.org/a."));
        assertEquals("192.0.2.1", PlaceKeys.host("192.0.2.1"));
    }

    @Test
    void shapesKeepLettersAndHideDigits() {
        assertEquals("HR-#####", PlaceKeys.shape("HR-49654"));
        assertEquals(PlaceKeys.shapeKey("HR-10100"), PlaceKeys.shapeKey("hr-49654"));
        assertEquals("####-##-##", PlaceKeys.shape("2026-03-14"));
    }

    @Test
    void lineTemplatesMergeCaseWhiteSpaceAndDigits() {
        assertEquals(PlaceKeys.lineTemplate("[Exported by Casefile Archive 3.2 · retention class B]"),
                PlaceKeys.lineTemplate("  [exported by  Casefile Archive 3.4 · retention class b]\t"));
        assertEquals("sent from my tablet #", PlaceKeys.lineTemplate("Sent from my\ttablet 7"));
    }

    @Test
    void everyHeaderFieldIsAPlaceOfItsOwnNamedInLowerCase() {
        String text = "From_x\nX-Intake-Route: ACC7\nSubject: a\n  folded b\n\nbody ACC7\n";
        List<Places.Place> fields = Places.headerFields(text.substring(7), TextLines.of(text.substring(7)));
        assertEquals(List.of("x-intake-route", "subject"), fields.stream().map(Places.Place::key).toList());
        assertEquals("X-Intake-Route", fields.get(0).shown());
        String rest = text.substring(7);
        assertEquals("Subject: a\n  folded b", rest.substring(fields.get(1).span().start(), fields.get(1).span().end()),
                "a field keeps its continuation lines (RFC 5322 §2.2.3)");
        Places places = Places.of(rest, line -> false);
        int value = rest.indexOf("ACC7");
        assertEquals("x-intake-route", places.placeOf(new Span(value, value + 4)).key());
        int body = rest.lastIndexOf("ACC7");
        assertNull(places.placeOf(new Span(body, body + 4)), "the body is content");
    }

    @Test
    void anIdentifierTermBelongsToTheWholeCodeItSitsIn() {
        String text = "see case HR-49654 today";
        Places places = Places.of(text, line -> false);
        int at = text.indexOf("HR");
        Places.Place place = places.placeOf(new Span(at, at + 2));
        assertEquals("hr-#####", place.key());
        assertEquals("HR-#####", place.shown());
    }
}
