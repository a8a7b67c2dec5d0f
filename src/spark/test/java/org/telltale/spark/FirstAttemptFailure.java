package org.telltale.spark;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.apache.spark.TaskContext;
import org.apache.spark.api.plugin.DriverPlugin;
import org.apache.spark.api.plugin.ExecutorPlugin;
import org.apache.spark.api.plugin.PluginContext;
import org.apache.spark.api.plugin.SparkPlugin;
import org.apache.spark.util.TaskCompletionListener;

/**
 * A Spark plugin for tests (configured with {@code -Dspark.plugins=…}): the first attempt of
 * partition 0 of every stage fails after it has done all its work — its shuffle output written or
 * its result computed — so Spark must discard that attempt and run the partition again. Each
 * planned failure leaves a file in the folder named by {@code -Dtelltale.test.failures}, holding
 * the description of the job it failed in, so a test can check that failures really happened and where. Local mode retries only with
 * {@code local[N,maxFailures]}.
 */
public final class FirstAttemptFailure implements SparkPlugin {
    @Override
    public DriverPlugin driverPlugin() {
        return null;
    }

    @Override
    public ExecutorPlugin executorPlugin() {
        return new ExecutorPlugin() {
            private Path folder;

            @Override
            public void init(PluginContext context, Map<String, String> extraConf) {
                folder = Path.of(System.getProperty("telltale.test.failures"));
            }

            @Override
            public void onTaskStart() {
                TaskContext task = TaskContext.get();
                if (task.partitionId() != 0 || task.attemptNumber() != 0) {
                    return;
                }
                int stage = task.stageId();
                // The job's description, as DistributedAudit sets it, tells which step failed.
                String job = String.valueOf(task.getLocalProperty("spark.job.description"));
                // A failing completion listener fails the task (Task.runTaskWithListeners), whereas
                // exceptions from plugin callbacks are only logged.
                task.addTaskCompletionListener((TaskCompletionListener) done -> {
                    if (done.isFailed()) {
                        return;
                    }
                    try {
                        Files.createDirectories(folder);
                        Files.writeString(folder.resolve("stage-" + stage + "-partition-0"), job + "\n");
                    } catch (IOException e) {
                        throw new UncheckedIOException(e);
                    }
                    throw new IllegalStateException("planned failure of the first attempt of stage " + stage + ", partition 0");
                });
            }
        };
    }
}
