package org.telltale.connect;

import java.util.List;

/**
 * One batch's answer as the service sent it, before validation: label names, one row per text,
 * and a short snippet of the response body for error messages.
 */
record RawScores(List<String> labels, double[][] rows, String snippet) {
}
