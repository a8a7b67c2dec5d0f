package org.telltale.connect;

import java.net.URI;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.telltale.UsageException;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ModelFile;
import org.telltale.model.TextClassifier;

/**
 * Turns a {@code --model SPEC} into a {@link TextClassifier}:
 * <ul>
 *   <li>{@code http://…} or {@code https://…}: a model service in the {@link Protocol} chosen;</li>
 *   <li>{@code exec:COMMAND ARGS…}: long-lived subprocesses speaking the native protocol line by line;</li>
 *   <li>anything else: a built-in model file, run in this JVM.</li>
 * </ul>
 * Whatever the connector, the classifier splits calls into batches, keeps requests in flight,
 * retries transient failures, validates every answer and counts its retries
 * ({@link TextClassifier#retries()}). Close it when done.
 */
public final class Connectors {
    private Connectors() {
    }

    public static TextClassifier open(ConnectorSettings settings) {
        return switch (settings.kind()) {
            case HTTP -> openHttp(settings);
            case SUBPROCESS -> openSubprocess(settings);
            case FILE -> openFile(settings);
        };
    }

    /** Wraps a model that runs in this JVM: batches run on a small thread pool and answers are validated. */
    public static TextClassifier inProcess(TextClassifier model, ConnectorSettings settings) {
        noHeaders(settings, "a model in this process");
        String description = model.describe() + " (in process, " + options(settings) + ")";
        boolean logits = model instanceof BuiltinModel; // built-in models answer their log scores as logits
        return new ChunkedClassifier(new InProcessScorer(model, logits), logits ? settings.withScores(ScoreKind.LOGITS) : settings,
                Redactor.none(), description);
    }

    private static TextClassifier openFile(ConnectorSettings settings) {
        if (settings.spec().matches("[A-Za-z][A-Za-z0-9+.-]*://.*")) {
            throw new UsageException("{model} " + Endpoints.safe(settings.spec()) + ": unsupported URL scheme "
                    + "(expected http:// or https://, exec:COMMAND, or a model file)");
        }
        return inProcess(ModelFile.load(Path.of(settings.spec())), settings);
    }

    private static TextClassifier openHttp(ConnectorSettings settings) {
        URI url = Endpoints.parse(settings.spec());
        HeaderSecrets secrets = HeaderSecrets.resolve(settings.headers(), settings.environment());
        HttpScorer.WireFormat format = switch (settings.protocol()) {
            case NATIVE -> HttpScorer.nativeFormat(url);
            case OPEN_INFERENCE -> new OpenInferenceCodec(checkModelUrl(url), settings.labels());
            case INSTANCES -> new InstancesCodec(url, settings.labels());
            case PIPELINE -> new PipelineCodec(url);
        };
        String where = Endpoints.safe(url);
        List<String> notes = new ArrayList<>();
        notes.add(settings.protocol().cliName() + " protocol");
        notes.add(options(settings));
        if (!secrets.describe().isEmpty()) {
            notes.add(secrets.describe());
        }
        String description = where + " (" + String.join(", ", notes) + ")";
        HttpTransport transport = new HttpTransport(settings.timeout(), secrets.values());
        return new ChunkedClassifier(new HttpScorer(transport, format, where), settings, secrets.redactor(), description,
                ColdStartWarmUp.start());
    }

    private static URI checkModelUrl(URI url) {
        String path = url.getPath() == null ? "" : url.getPath();
        if (!path.matches(".*/v2/models/[^/]+(/versions/[^/]+)?/?")) {
            throw new UsageException("{model} " + Endpoints.safe(url) + " with {protocol} open-inference: expected the model's URL, "
                    + "…/v2/models/NAME");
        }
        String s = url.toString();
        return s.endsWith("/") ? URI.create(s.substring(0, s.length() - 1)) : url;
    }

    private static TextClassifier openSubprocess(ConnectorSettings settings) {
        noHeaders(settings, "an exec: model");
        String commandLine = settings.spec().substring("exec:".length()).strip();
        List<String> command = CommandSplitter.split(commandLine);
        String name = "'" + String.join(" ", command) + "'";
        int processes = settings.effectiveParallel();
        var scorer = new SubprocessScorer(command, name, settings.timeout(), processes, settings.maxRestarts());
        String description = "exec:" + String.join(" ", command) + " (" + options(settings) + ")";
        return new ChunkedClassifier(scorer, settings, Redactor.none(), description, ColdStartWarmUp.start());
    }

    private static void noHeaders(ConnectorSettings settings, String what) {
        if (!settings.headers().isEmpty()) {
            throw new UsageException("{header} applies to http:// and https:// models, not to " + what);
        }
    }

    private static String options(ConnectorSettings s) {
        String inFlight = s.adaptive() ? "auto in flight (at most " + s.effectiveParallel() + ")" : s.effectiveParallel() + " in flight";
        return String.format(Locale.ROOT, "batch %d, %s, timeout %s, %d retries%s", s.batch(), inFlight,
                Durations.format(s.timeout()), s.retries(), s.scores() == ScoreKind.LOGITS ? ", logits" : "");
    }
}
