package org.telltale.report.html;

/**
 * The frame every report shares: title, the Content-Security-Policy, and the inline stylesheet
 * and script that the policy allows by their hashes.
 *
 * @param kind  what the report is, shown in the masthead ("Explanations", "Audit")
 * @param title the document title; may carry untrusted ids, the template escapes it
 */
public record Page(String kind, String title, String subtitle, String version, String csp, String style, String script) {
}
