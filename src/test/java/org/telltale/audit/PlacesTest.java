package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.telltale.text.Span;

class PlacesTest {

    /** RFC 5322, Appendix A.1.1 ("A message from one person to another with simple addressing"), from memory. */
    private static final String RFC_5322_A_1_1 = """
            From: John Doe <jdoe@machine.example>
            To: Mary Smith <mary@example.net>
            Subject: Saying Hello
            Date: Fri, 21 Nov 1997 09:55:06 -0600
            Message-ID: <1234@local.machine.example>

            This is a message just to say hello.
            So, "Hello".
            """;

    private static ArtefactKind kindAt(Places places, String text, String needle, int from) {
        int start = text.indexOf(needle, from);
        if (start < 0) {
            throw new AssertionError("'" + needle + "' not in text");
        }
        return places.kindOf(new Span(start, start + needle.length()));
    }

    private static ArtefactKind kindOf(Places places, String text, String needle) {
        return kindAt(places, text, needle, 0);
    }

    @Test
    void theRfc5322HeaderBlockIsHeaderAndTheBodyIsContent() {
        Places places = Places.of(RFC_5322_A_1_1, line -> false);
        assertEquals(ArtefactKind.HEADER, kindOf(places, RFC_5322_A_1_1, "Saying"));
        assertEquals(ArtefactKind.HEADER, kindOf(places, RFC_5322_A_1_1, "Mary"));
        assertEquals(ArtefactKind.HEADER, kindOf(places, RFC_5322_A_1_1, "machine.example"));
        int body = RFC_5322_A_1_1.indexOf("This is");
        assertEquals(ArtefactKind.CONTENT, kindAt(places, RFC_5322_A_1_1, "message", body));
        assertEquals(ArtefactKind.CONTENT, kindAt(places, RFC_5322_A_1_1, "Hello", body));
    }

    @Test
    void foldedHeaderLinesAndTheMboxSeparatorBelongToTheBlock() {
        String text = "From relay@gridline.example  Thu Aug 22 12:36:23 2002\n"
                + "Received: from kestrel (kestrel [10.0.0.7])\n"
                + "\tby switchyard with SMTP id Q7\n"
                + "Subject: meter fault\n\nThe meter on Alder Row has stopped.\n";
        Places places = Places.of(text, line -> false);
        assertEquals(ArtefactKind.HEADER, kindOf(places, text, "switchyard"));
        assertEquals(ArtefactKind.HEADER, kindOf(places, text, "Thu"));
        assertEquals(ArtefactKind.CONTENT, kindOf(places, text, "Alder"));
    }

    @Test
    void addressesAndIdentifiersInTheBody() {
        String text = "Hello,\nplease write to outage-desk@gridline.example or see https://status.gridline.example/now\n"
                + "or ping 192.168.4.20 about ticket OGX-4471 raised 2024-03-17 at 14:05, order 883120, ref a7f3c9e2.\n"
                + "The transformer hums all night.\n";
        Places places = Places.of(text, line -> false);
        assertEquals(ArtefactKind.ADDRESS, kindOf(places, text, "outage"));
        assertEquals(ArtefactKind.ADDRESS, kindOf(places, text, "gridline.example"));
        assertEquals(ArtefactKind.ADDRESS, kindOf(places, text, "status"));
        assertEquals(ArtefactKind.ADDRESS, kindOf(places, text, "192.168"));
        assertEquals(ArtefactKind.IDENTIFIER, kindOf(places, text, "OGX"));
        assertEquals(ArtefactKind.IDENTIFIER, kindOf(places, text, "4471"));
        assertEquals(ArtefactKind.IDENTIFIER, kindOf(places, text, "2024"));
        assertEquals(ArtefactKind.IDENTIFIER, kindOf(places, text, "14:05"));
        assertEquals(ArtefactKind.IDENTIFIER, kindOf(places, text, "883120"));
        assertEquals(ArtefactKind.IDENTIFIER, kindOf(places, text, "a7f3c9e2"));
        assertEquals(ArtefactKind.CONTENT, kindOf(places, text, "transformer"));
        assertEquals(ArtefactKind.CONTENT, kindOf(places, text, "ticket"));
    }

    @Test
    void repeatedLinesAreBoilerplateAndFieldLinesInTheBodyAreHeader() {
        String footer = "Fernhill Meter Services - reply within two days";
        String text = "The reading looks wrong.\n\nQueue-Code: MTR\nPriority: 2\n\n" + footer + "\nNote: call back later\n";
        Places places = Places.of(text, line -> line.strip().equals(footer));
        assertEquals(ArtefactKind.BOILERPLATE, kindOf(places, text, "Fernhill"));
        assertEquals(ArtefactKind.HEADER, kindOf(places, text, "MTR"));
        assertEquals(ArtefactKind.HEADER, kindOf(places, text, "Priority"));
        // A single ordinary field line marks only its name, not its value.
        assertEquals(ArtefactKind.HEADER, kindOf(places, text, "Note"));
        assertEquals(ArtefactKind.CONTENT, kindOf(places, text, "call"));
        assertEquals(ArtefactKind.CONTENT, kindOf(places, text, "reading"));
    }

    @Test
    void lineRepeatsCountDocumentsNotLinesAndSurvivePruning() {
        LineRepeats repeats = new LineRepeats(64);
        String footer = "Sent from the Fernhill field tablet";
        for (int i = 0; i < 500; i++) {
            // Each document repeats the footer twice and carries one line no other document has.
            repeats.add("unique observation number " + i + " about pole " + (i * 7) + "\n" + footer + "\n" + footer);
        }
        assertEquals(500, repeats.count(footer), "pruning never forgets a line every document has");
        assertEquals(5, repeats.minRepeats());
        assertEquals(true, repeats.isBoilerplate("  " + footer + " "));
        assertEquals(false, repeats.isBoilerplate("unique observation number 3 about pole 21"));
        assertEquals(0, repeats.count("Thanks,"), "short lines are never boilerplate");
    }

    /**
     * Identifier patterns read only the text around tokens with a digit, and address patterns only
     * tokens with '@', "://" or '.': dates that span three tokens (RFC 5322 §3.3 "22 Aug 2002",
     * from memory), a time with its "PM" and an offset after white space must still be placed
     * whole, and words far from any digit or dot stay content.
     */
    @Test
    void identifiersSpanningSeveralTokensArePlacedWholeAndPlainWordsAreNot() {
        String text = "the meter hums\nread on 22 Aug 2002 at 10:30 PM\tzone +0200 then Aug 22, 2002\n"
                + "plain words only here\nmail desk@fernhill.example today\n";
        Places places = Places.of(text, line -> false);
        assertEquals(java.util.List.of(ArtefactKind.IDENTIFIER, ArtefactKind.IDENTIFIER, ArtefactKind.IDENTIFIER,
                        ArtefactKind.IDENTIFIER, ArtefactKind.CONTENT, ArtefactKind.ADDRESS, ArtefactKind.CONTENT),
                java.util.List.of(kindOf(places, text, "Aug"), kindOf(places, text, "PM"), kindOf(places, text, "+0200"),
                        kindAt(places, text, "Aug", text.indexOf("then")), kindOf(places, text, "words"),
                        kindOf(places, text, "fernhill"), kindOf(places, text, "today")));
    }
}
