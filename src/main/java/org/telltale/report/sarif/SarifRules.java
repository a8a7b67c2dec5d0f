package org.telltale.report.sarif;

import org.telltale.audit.ArtefactKind;
import org.telltale.report.sarif.SarifLog.Level;
import org.telltale.report.sarif.SarifLog.Rule;

/**
 * The SARIF rules of an audit: one per artefact kind, with Telltale's own ids and help that says
 * what the kind means and how to take it out of the data. The ids are stable; viewers group
 * results by them across runs.
 */
public final class SarifRules {
    private static final String CAUTION = "Explanations are local approximations of the model, not causes; "
            + "a clean audit does not certify a model.";

    private SarifRules() {
    }

    /** The rule id of a kind: {@code TELLTALE-HEADER}, {@code TELLTALE-ADDRESS}, … */
    public static String id(ArtefactKind kind) {
        return "TELLTALE-" + kind.name();
    }

    public static Rule of(ArtefactKind kind) {
        return switch (kind) {
            case HEADER -> rule(kind, "LeakingHeaderField",
                    "The model leans on a header field rather than the message.",
                    "A field of the leading header block (Name: value lines) predicts the label in this corpus, and "
                            + "the model's explanations weigh it: routing stamps, queue tags and gateway names "
                            + "often record the answer the model is meant to find.",
                    "Strip the field (or the whole header block) from the texts before training and scoring, "
                            + "retrain, and audit again. If the field is legitimate evidence, accept it in the policy "
                            + "file with a note.");
            case ADDRESS -> rule(kind, "LeakingAddressOrHost",
                    "The model leans on an e-mail address, URL or host name.",
                    "Addresses and hosts predict the label in this corpus, and the model's explanations weigh "
                            + "them: a sender domain or a team mailbox can stand in for the class.",
                    "Mask addresses and host names (replace them with one placeholder) before training and scoring, "
                            + "or re-split the data so that senders do not cross from training to test; then audit "
                            + "again. Accept it in the policy file if it is expected evidence.");
            case IDENTIFIER -> rule(kind, "LeakingIdentifierShape",
                    "The model leans on a code, ticket number, date or id shape.",
                    "Identifiers of one shape predict the label in this corpus, and the model's explanations weigh "
                            + "them: case numbers with a per-queue prefix or export dates give the label away.",
                    "Replace identifiers with a placeholder of their shape before training and scoring, or re-split "
                            + "the data by time or source so that id ranges do not leak; then audit again.");
            case BOILERPLATE -> rule(kind, "LeakingRepeatedLine",
                    "The model leans on a line repeated across many documents.",
                    "A signature, disclaimer, footer or export stamp repeated verbatim predicts the label in this "
                            + "corpus, and the model's explanations weigh it.",
                    "Remove the repeated line (dedupe footers and signatures) before training and scoring, retrain, "
                            + "and audit again; a footer that only one source adds is a sign that the data should be "
                            + "re-split by source.");
            case CONTENT -> rule(kind, "MarkedContentTerm",
                    "The policy marks a term of the message text as an artefact.",
                    "A reviewer's policy file marks this term as an artefact although it sits in the message "
                            + "text; the model's explanations weigh it towards the label.",
                    "Follow the reviewer's note: remove or mask the term before training and scoring, or change the "
                            + "policy entry if the term is legitimate evidence.");
        };
    }

    private static Rule rule(ArtefactKind kind, String name, String shortText, String full, String fix) {
        String help = fix + " " + CAUTION;
        String markdown = "**How to fix.** " + fix + "\n\n_" + CAUTION + "_";
        return new Rule(id(kind), name, shortText, full + " The scrub test rewrites documents without it and "
                + "rescores them; a result it moved is confirmed.", help, markdown, Level.WARNING);
    }
}
