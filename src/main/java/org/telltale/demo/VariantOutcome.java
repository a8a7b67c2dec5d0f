package org.telltale.demo;

import java.nio.file.Path;
import org.telltale.audit.AuditResult;

/**
 * What one variant of the demo produced.
 *
 * @param variant          {@code leaky} or {@code clean}
 * @param trainingAccuracy holdout accuracy as training measured it, in process
 * @param audit            the audit of the served model on the held-out messages
 * @param report           the HTML report
 * @param model            the trained model file
 * @param holdout          the held-out messages the audit read
 */
public record VariantOutcome(String variant, double trainingAccuracy, AuditResult audit, Path report, Path model,
        Path holdout) {

    public Headline headline() {
        return Headline.of(audit);
    }
}
