package org.telltale.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;
import org.telltale.ExitCodes;
import org.telltale.OptionWords;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ModelFile;
import org.telltale.serve.ModelServer;
import org.telltale.serve.ServerSettings;
import org.telltale.serve.StdioServer;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code telltale serve}: hosts a built-in model over HTTP (native protocol and Open Inference Protocol v2). */
@Command(name = "serve", versionProvider = VersionProvider.class,
        description = "Host a built-in model over HTTP: POST /score (scoring protocol), the Open Inference Protocol v2 "
                + "routes under /v2, GET /health. Prints 'listening on http://HOST:PORT' once ready; stops cleanly on SIGTERM.")
final class ServeCommand implements Callable<Integer> {
    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Option(names = "--model", paramLabel = "MODEL.json", required = true, description = "The model file to host.")
    Path model;

    @Option(names = "--host", defaultValue = ServerSettings.LOOPBACK,
            description = "Address to bind. Default: ${DEFAULT-VALUE} (this machine only).")
    String host;

    @Option(names = "--port", defaultValue = "8080", description = "Port; 0 picks a free one. Default: ${DEFAULT-VALUE}.")
    int port;

    @Option(names = "--threads", paramLabel = "N", description = "Requests scored at once. Default: one per core.")
    Integer threads;

    @Option(names = "--name", description = "Model name in /v2/models/NAME. Default: the file's base name without .json.")
    String name;

    @Option(names = "--max-batch", paramLabel = "N", defaultValue = "1024",
            description = "Most texts per request; more is answered 400. Default: ${DEFAULT-VALUE}.")
    int maxBatch;

    @Option(names = "--max-body", paramLabel = "BYTES", defaultValue = "16777216",
            description = "Most bytes per request body; more is answered 413. Default: ${DEFAULT-VALUE} (16 MiB).")
    long maxBody;

    @Option(names = "--stdio", description = "Instead of HTTP, answer the scoring protocol line by line on stdin/stdout "
            + "(for --model exec:telltale serve --stdio --model FILE).")
    boolean stdio;

    @Override
    public Integer call() throws IOException, InterruptedException {
        ServerSettings settings = settings();
        BuiltinModel loaded = ModelFile.load(model);
        if (stdio) {
            StdioServer.run(loaded, System.in, System.out, settings.maxBatch());
            return ExitCodes.OK;
        }
        ModelServer server = ModelServer.start(loaded, settings);
        PrintWriter err = spec.commandLine().getErr();
        if (server.exposed()) {
            err.println("telltale serve: warning: listening on " + server.url() + ", reachable from other machines; "
                    + "anyone who can connect can query the model");
            err.flush();
        }
        CountDownLatch stopped = new CountDownLatch(1);
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            server.close();
            stopped.countDown();
        }, "telltale-serve-shutdown"));
        PrintWriter out = spec.commandLine().getOut();
        out.println("listening on " + server.url());
        out.flush();
        err.println("telltale serve: model '" + server.modelName() + "' at POST " + server.url() + "/score and "
                + server.url() + "/v2/models/" + server.modelName() + " (stop with Ctrl-C or SIGTERM)");
        err.flush();
        stopped.await();
        return ExitCodes.OK;
    }

    private ServerSettings settings() {
        String modelName = name != null ? name : ServerSettings.nameOf(model);
        try {
            ServerSettings s = ServerSettings.defaults(modelName).withHost(host).withPort(port).withMaxBatch(maxBatch)
                    .withMaxBody(maxBody);
            return threads == null ? s : s.withThreads(threads);
        } catch (IllegalArgumentException e) {
            throw OptionWords.usage(e);
        }
    }
}
