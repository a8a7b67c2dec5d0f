package org.telltale.demo;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.telltale.audit.AuditResult;
import org.telltale.connect.ConnectorSettings;
import org.telltale.connect.Connectors;
import org.telltale.model.Algorithm;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ModelFile;
import org.telltale.model.ModelTraining;
import org.telltale.model.TextClassifier;
import org.telltale.model.TrainingOutcome;
import org.telltale.model.TrainingRequest;
import org.telltale.serve.ModelServer;
import org.telltale.serve.ServerSettings;
import org.telltale.text.Document;

/**
 * One variant of the demo, end to end: train the built-in model on the variant's corpus with a
 * stratified holdout, host it with the model server on a free loopback port, audit the served
 * model over HTTP on the held-out messages, write the report, stop the server.
 */
final class VariantRun {
    private final DemoSettings settings;
    private final DemoFolder folder;
    private final DemoProgress progress;

    VariantRun(DemoSettings settings, DemoFolder folder, DemoProgress progress) {
        this.settings = settings;
        this.folder = folder;
        this.progress = progress;
    }

    /**
     * @param variant    {@code leaky} or {@code clean}
     * @param corpusFile the variant's whole corpus, as written into the demo folder
     * @param docs       its messages, in file order
     */
    VariantOutcome run(String variant, Path corpusFile, List<Document> docs) {
        DemoSplit split = DemoSplit.of(docs, settings.holdout(), settings.seed());
        Path holdoutFile = folder.corpusDir().resolve("support-" + variant + "-holdout.jsonl");
        CorpusFiles.writeJsonLines(split.holdout(), holdoutFile);

        progress.step(String.format(Locale.ROOT, "%s: training logistic regression on %d messages, holding out %d",
                variant, split.train().size(), split.holdout().size()));
        TrainingRequest request = TrainingRequest.defaults(Algorithm.LOGISTIC).withHoldout(settings.holdout(), settings.seed());
        TrainingOutcome trained = ModelTraining.train(docs.iterator(), corpusFile, request);
        try (BuiltinModel model = trained.model()) {
            ModelFile.save(model, folder.model(variant), true);
            try (ModelServer server = ModelServer.start(model, model.labels(),
                    ServerSettings.defaults("support-" + variant).withPort(0), System.err)) {
                String url = server.url() + "/score";
                progress.step(variant + ": model served at " + url + "; auditing it over HTTP");
                ConnectorSettings connector = ConnectorSettings.of(url).withParallel(2);
                AuditResult audit;
                try (TextClassifier remote = Connectors.open(connector)) {
                    audit = new DemoAudit(settings, progress).run(remote, holdoutFile, folder.auditDir(variant));
                }
                progress.step(String.format(Locale.ROOT, "%s: server stopped after %d requests", variant, server.served()));
                return new VariantOutcome(variant, trained.holdout().accuracy(), audit, folder.report(variant),
                        folder.model(variant), holdoutFile);
            }
        }
    }
}
