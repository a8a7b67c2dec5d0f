package org.telltale.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.telltale.UsageException;

/** The Spark fronts' --format reads like telltale's (CorpusFormat): one parser, one message shape. */
class SparkFormatTest {
    @Test
    void aFormatIsReadInAnyCase() {
        assertEquals(SparkFormat.PARQUET, SparkFormat.of("Parquet", "tickets/"));
    }

    @Test
    void anUnknownFormatIsAUsageErrorNamingTheOptionAndTheFormats() {
        UsageException e = assertThrows(UsageException.class, () -> SparkFormat.of("xml", "tickets.xml"));
        assertEquals("--format: unknown corpus format 'xml'; one of: jsonl, csv, parquet", e.getMessage());
    }

    @Test
    void withoutAFormatTheNameTellsIt() {
        assertEquals(SparkFormat.CSV, SparkFormat.of(null, "hdfs:///tickets/2026-11.csv/"));
    }
}
