package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.telltale.UnknownKeyException;

/** --protocol and --scores read through EnumKeys.parse like every closed set. */
class ConnectorKeysTest {
    @Test
    void everyProtocolReadsBackByItsNameInAnyCase() {
        for (Protocol p : Protocol.values()) {
            assertEquals(p, Protocol.byName(" " + p.cliName().toUpperCase(Locale.ROOT) + " "));
        }
    }

    @Test
    void anUnknownProtocolListsTheProtocols() {
        UnknownKeyException e = assertThrows(UnknownKeyException.class, () -> Protocol.byName("grpc"));
        assertEquals("unknown protocol 'grpc'; one of: native, open-inference, instances, pipeline", e.getMessage());
    }

    @Test
    void anUnknownScoreKindListsTheKinds() {
        UnknownKeyException e = assertThrows(UnknownKeyException.class, () -> ScoreKind.byName("odds"));
        assertEquals("unknown score kind 'odds'; one of: probabilities, logits", e.getMessage());
    }
}
