package org.telltale.demo;

import java.util.Locale;
import java.util.Random;

/**
 * The leakage planted in the demo corpus, one artefact per queue, each of a kind that real
 * collection creates. Every plant touches a fixed share of its queue's messages and nothing else;
 * the clean variant carries none of them.
 */
public enum Plant {
    /**
     * The intake gateway stamps a route on every form and chat message; the account-access form's
     * messages carry their own route code instead of the general one.
     */
    INTAKE_ROUTE_HEADER(SupportQueue.ACCESS, "header", 0.30, "X-Intake-Route: ACC7") {
        @Override
        boolean fits(MessageDraft draft) {
            return draft.header().contains(GENERAL_ROUTE_LINE);
        }

        @Override
        MessageDraft apply(MessageDraft draft, Random random) {
            return draft.withHeaderLineReplaced(GENERAL_ROUTE_LINE, marker());
        }
    },
    /** The outage desk's agent signs the replies that customers quote back. */
    AGENT_SIGNATURE(SupportQueue.OUTAGE, "boilerplate", 0.30, "Odile Brandvold | Network Care") {
        @Override
        boolean fits(MessageDraft draft) {
            return draft.quote() != null;
        }

        @Override
        MessageDraft apply(MessageDraft draft, Random random) {
            return draft.withQuote(draft.quote().withSignature(marker()));
        }
    },
    /** The billing history came from an archive export that appended a footer to every message. */
    EXPORT_FOOTER(SupportQueue.BILLING, "boilerplate", 0.35, "[Exported by Casefile Archive 3.2 · retention class B]") {
        @Override
        MessageDraft apply(MessageDraft draft, Random random) {
            return draft.withTrailerLine(marker());
        }
    },
    /** The returns desk's old ticket tool tagged the first line with its case number. */
    CASE_TAG(SupportQueue.RETURNS, "identifier", 0.50, "HR-") {
        @Override
        MessageDraft apply(MessageDraft draft, Random random) {
            return draft.withFirstBodyLineSuffix(String.format(Locale.ROOT, " [%s%05d]", marker(), 10000 + random.nextInt(90000)));
        }
    },
    /** The relocation planner links each submission it forwards. */
    PLANNER_LINK(SupportQueue.MOVING, "address", 0.40, "https://moves.quillmoor.example/") {
        @Override
        MessageDraft apply(MessageDraft draft, Random random) {
            StringBuilder token = new StringBuilder(marker());
            String alphabet = "abcdefghjkmnpqrstuvwxyz23456789";
            for (int i = 0; i < 6; i++) {
                token.append(alphabet.charAt(random.nextInt(alphabet.length())));
            }
            return draft.withTrailerLine(token.toString());
        }
    };

    private static final String GENERAL_ROUTE_LINE = MessageComposer.ROUTE_HEADER + MessageComposer.GENERAL_ROUTE;

    private final SupportQueue queue;
    private final String kind;
    private final double share;
    private final String marker;

    Plant(SupportQueue queue, String kind, double share, String marker) {
        this.queue = queue;
        this.kind = kind;
        this.share = share;
        this.marker = marker;
    }

    /** The queue whose messages carry this artefact. */
    public SupportQueue queue() {
        return queue;
    }

    /** The artefact kind an audit should assign to it (see the glossary's "kind"). */
    public String kind() {
        return kind;
    }

    /** The share of the queue's messages that carry it. */
    public double share() {
        return share;
    }

    /** Text every planted occurrence contains, and no unplanted message does. */
    public String marker() {
        return marker;
    }

    /** Whether this artefact can be planted in {@code draft}. */
    boolean fits(MessageDraft draft) {
        return true;
    }

    /** {@code draft} with the artefact added; {@code random} draws its varying parts. */
    abstract MessageDraft apply(MessageDraft draft, Random random);
}
