package org.telltale.spark;

import org.apache.spark.sql.SparkSession;

/** The Spark session of a front: the master from {@code --master} (local mode), else from spark-submit. */
final class SparkSessions {
    private SparkSessions() {
    }

    static SparkSession open(String appName, String master) {
        SparkSession.Builder builder = SparkSession.builder().appName(appName);
        if (master != null) {
            builder.master(master);
        }
        return builder.getOrCreate();
    }
}
