package org.telltale.spark;

import org.apache.spark.sql.SparkSession;

/**
 * Test helper run through bench/spark-local.sh: writes a JSON Lines corpus as Parquet, in one
 * part file so that file order is kept. {@code ParquetCorpus IN.jsonl OUT.parquet}.
 */
public final class ParquetCorpus {
    private ParquetCorpus() {
    }

    public static void main(String[] args) throws Exception {
        try (SparkSession spark = SparkSession.builder().master("local[1]").appName("parquet corpus").getOrCreate()) {
            spark.read().json(args[0]).select("id", "text", "label").coalesce(1).write().parquet(args[1]);
        }
    }
}
