package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.telltale.UnknownKeyException;

class AlgorithmTest {
    @Test
    void everyAlgorithmReadsBackByItsKey() {
        for (Algorithm a : Algorithm.values()) {
            assertEquals(a, Algorithm.fromKey(a.key()));
        }
    }

    @Test
    void anUnknownNameListsTheAlgorithms() {
        UnknownKeyException e = assertThrows(UnknownKeyException.class, () -> Algorithm.fromKey("forest"));
        assertEquals("unknown algorithm 'forest'; one of: bayes, logistic", e.getMessage());
    }
}
