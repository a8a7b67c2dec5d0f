package org.telltale.overlap;

/**
 * A model's accuracy on the test set with and without the test documents it has already seen in
 * train. Only test documents with a gold label count.
 *
 * @param model           what the model describes itself as
 * @param labelled        labelled test documents
 * @param correct         of those, predicted correctly
 * @param labelledUnseen  labelled test documents without a train duplicate
 * @param correctUnseen   of those, predicted correctly
 */
public record Inflation(String model, long labelled, long correct, long labelledUnseen, long correctUnseen) {
    /** Accuracy on all labelled test documents; NaN when there are none. */
    public double accuracy() {
        return labelled == 0 ? Double.NaN : (double) correct / labelled;
    }

    /** Accuracy on the labelled test documents not seen in train; NaN when there are none. */
    public double accuracyUnseen() {
        return labelledUnseen == 0 ? Double.NaN : (double) correctUnseen / labelledUnseen;
    }

    /** Accuracy on the seen labelled test documents; NaN when there are none. */
    public double accuracySeen() {
        long seen = labelled - labelledUnseen;
        return seen == 0 ? Double.NaN : (double) (correct - correctUnseen) / seen;
    }

    /** How much the overlap adds to the reported accuracy: accuracy − accuracyUnseen. */
    public double inflation() {
        return accuracy() - accuracyUnseen();
    }
}
