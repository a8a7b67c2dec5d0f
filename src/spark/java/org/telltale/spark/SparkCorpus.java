package org.telltale.spark;

import java.io.Serializable;
import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.sql.Column;
import org.apache.spark.sql.DataFrameReader;
import org.apache.spark.sql.Dataset;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.functions;
import org.apache.spark.sql.types.BooleanType;
import org.apache.spark.sql.types.ByteType;
import org.apache.spark.sql.types.DataType;
import org.apache.spark.sql.types.IntegerType;
import org.apache.spark.sql.types.LongType;
import org.apache.spark.sql.types.ShortType;
import org.apache.spark.sql.types.StringType;
import org.apache.spark.sql.types.StructField;
import org.apache.spark.sql.types.StructType;
import org.telltale.TelltaleException;
import org.telltale.text.CorpusSettings;

/**
 * A corpus read by Spark from any path Spark reads (file://, hdfs://, s3a://, a folder of part
 * files): JSON Lines, CSV (header row, RFC 4180 quotes, embedded newlines) or Parquet, with id,
 * text and label taken from the columns that {@code --id-field}, {@code --text-field} and
 * {@code --label-field} name. Types follow the single-machine readers: text a string, id a
 * string or an integer, label a string, an integer or a boolean; a missing label column means
 * unlabelled documents. Unlike a JSON Lines file on one machine, a Spark corpus needs an id
 * column: positions are not stable names across part files.
 */
final class SparkCorpus {
    private SparkCorpus() {
    }

    /** The field names and the bad-record rule, in a form Spark can ship to its tasks. */
    record Fields(String id, String text, String label, boolean skipBad) implements Serializable {
        static Fields of(CorpusSettings settings) {
            return new Fields(settings.idField(), settings.textField(), settings.labelField(), settings.skipBad());
        }
    }

    /**
     * The documents of {@code path}, in file order, with positions from {@code offset} on. The
     * same path read twice yields the same positions: Spark orders the splits of a file by offset.
     */
    static JavaRDD<CorpusRow> read(SparkSession spark, String path, SparkFormat format, Fields fields, long offset) {
        Dataset<Row> frame = frame(spark, path, format, fields.skipBad());
        StructType schema = frame.schema();
        String idType = type(schema, fields.id());
        String textType = type(schema, fields.text());
        String labelType = type(schema, fields.label());
        if (textType == null) {
            throw new TelltaleException(path + ": no column '" + fields.text() + "'; choose the text field with --text-field");
        }
        if (!textType.equals("string")) {
            throw new TelltaleException(path + ": column '" + fields.text() + "' must hold strings, it holds " + textType);
        }
        if (idType == null) {
            throw new TelltaleException(path + ": no column '" + fields.id() + "'; a corpus read by Spark needs ids "
                    + "(choose the id field with --id-field)");
        }
        if (!idType.equals("string") && !idType.equals("integer")) {
            throw new TelltaleException(path + ": column '" + fields.id() + "' must hold strings or integers, it holds " + idType);
        }
        if (labelType != null && labelType.equals("other")) {
            throw new TelltaleException(path + ": column '" + fields.label()
                    + "' must hold strings, integers or booleans");
        }
        Column label = labelType == null ? functions.lit(null).cast("string") : column(fields.label()).cast("string");
        Dataset<Row> selected = frame.select(column(fields.id()).cast("string"), column(fields.text()), label);
        String place = path;
        boolean skipBad = fields.skipBad();
        JavaRDD<CorpusRow> rows = selected.javaRDD().zipWithIndex().map(t -> {
            Row row = t._1();
            long index = t._2();
            String id = row.isNullAt(0) ? null : row.getString(0);
            String text = row.isNullAt(1) ? null : row.getString(1);
            String lab = row.isNullAt(2) ? null : row.getString(2);
            if (id == null || id.isEmpty() || text == null) {
                if (skipBad) {
                    return null;
                }
                throw new TelltaleException(place + ": record " + (index + 1) + (id == null || id.isEmpty()
                        ? " has no id in column '" + fields.id() + "'"
                        : " ('" + id + "') has no text in column '" + fields.text() + "'")
                        + "; --skip-bad passes over such records");
            }
            return new CorpusRow(offset + index, id, text, lab);
        });
        return skipBad ? renumber(rows.filter(r -> r != null), offset) : rows;
    }

    private static JavaRDD<CorpusRow> renumber(JavaRDD<CorpusRow> rows, long offset) {
        return rows.zipWithIndex().map(t -> new CorpusRow(offset + t._2(), t._1().id(), t._1().text(), t._1().label()));
    }

    private static Dataset<Row> frame(SparkSession spark, String path, SparkFormat format, boolean skipBad) {
        DataFrameReader reader = spark.read();
        String mode = skipBad ? "DROPMALFORMED" : "FAILFAST";
        return switch (format) {
            case JSONL -> reader.option("mode", mode).option("encoding", "UTF-8").json(path);
            case CSV -> reader.option("header", "true").option("multiLine", "true").option("quote", "\"")
                    .option("escape", "\"").option("encoding", "UTF-8").option("mode", mode).csv(path);
            case PARQUET -> reader.parquet(path);
        };
    }

    private static Column column(String name) {
        return functions.col("`" + name.replace("`", "``") + "`");
    }

    /** "string", "integer", "boolean", "other", or null when there is no such column. */
    private static String type(StructType schema, String name) {
        for (StructField field : schema.fields()) {
            if (field.name().equals(name)) {
                DataType t = field.dataType();
                if (t instanceof StringType) {
                    return "string";
                }
                if (t instanceof LongType || t instanceof IntegerType || t instanceof ShortType || t instanceof ByteType) {
                    return "integer";
                }
                return t instanceof BooleanType ? "boolean" : "other";
            }
        }
        return null;
    }
}
