package org.telltale.model;

/**
 * A trained model and how it did on the documents held out from its training.
 *
 * @param model   the model, fitted on the training part only; the caller closes it
 * @param holdout the evaluation on the held-out documents, or {@code null} when none were held out
 */
public record TrainingOutcome(BuiltinModel model, Evaluation holdout) {
}
