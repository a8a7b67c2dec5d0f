package org.telltale.demo;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * Writes one invented support message for a queue: the channel it came through (mail, web form or
 * chat), a greeting or none, one to several sentences, sometimes a reply quoting an agent's
 * earlier answer or a forwarded earlier message, a sign-off and signature, and the typos of a
 * hurried writer. Nothing here reveals the queue except what the customer wrote.
 *
 * <p>All randomness comes from the {@link Random} passed in, so a message is a pure function of
 * its seed.
 */
final class MessageComposer {
    /** Share of messages that say little more than "any news?" and answer an agent's reply. */
    static final double FOLLOW_UP_SHARE = 0.30;
    /** Share of follow-ups whose quote still holds the customer's first message. */
    static final double NESTED_SHARE = 0.40;
    /** The header line the intake gateway stamps on form and chat messages, and its usual value. */
    static final String ROUTE_HEADER = "X-Intake-Route: ";
    static final String GENERAL_ROUTE = "GEN1";
    /** Share of ordinary mail messages that answer an agent's reply. */
    static final double REPLY_SHARE = 0.50;

    private static final String[] WEEKDAYS = {"Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"};
    private static final String[] MONTH_ABBREVIATIONS = {
        "Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"};
    private static final int WRAP = 72;

    private final Random random;

    MessageComposer(Random random) {
        this.random = random;
    }

    MessageDraft compose(SupportQueue queue) {
        double channel = random.nextDouble();
        if (channel < 0.15) {
            return chat(queue);
        }
        List<String> header = channel < 0.45 ? intakeHeader("webform") : List.of();
        Writer writer = writer();
        boolean followUp = random.nextDouble() < FOLLOW_UP_SHARE;
        if (followUp) {
            List<String> earlier = random.nextDouble() < NESTED_SHARE ? paragraph(queue, writer) : List.of();
            List<String> body = letter(List.of(writer.polish(pick(Phrasebook.FOLLOW_UPS) + tone(0.4))), writer);
            return new MessageDraft(header, body, agentReply(writer, earlier), List.of());
        }
        List<String> content = paragraph(queue, writer);
        if (random.nextDouble() < 0.10) {
            List<String> body = new ArrayList<>(letter(List.of(writer.polish(
                    pick(List.of("Sending this again as nobody replied.", "Forwarding my earlier message.",
                            "See my message below, still no answer.")))), writer));
            body.add("");
            body.addAll(forwarded(writer, content));
            return new MessageDraft(header, body, null, List.of());
        }
        QuotedReply quote = random.nextDouble() < REPLY_SHARE ? agentReply(writer, List.of()) : null;
        return new MessageDraft(header, letter(content, writer), quote, List.of());
    }

    /** Who writes and how carefully. */
    private record Writer(String first, String last, String email, double typoRate, boolean lowerCase, Random random) {
        String polish(String text) {
            String t = Typos.sprinkle(text, typoRate, random);
            return lowerCase ? t.toLowerCase(Locale.ROOT) : t;
        }

        String name() {
            return first + " " + last;
        }
    }

    private Writer writer() {
        String first = pick(Phrasebook.FIRST_NAMES);
        String last = pick(Phrasebook.LAST_NAMES);
        String local = switch (random.nextInt(3)) {
            case 0 -> first + "." + last;
            case 1 -> first.charAt(0) + last + (10 + random.nextInt(90));
            default -> first + (1960 + random.nextInt(45));
        };
        String email = local.toLowerCase(Locale.ROOT) + "@" + pick(Phrasebook.MAIL_DOMAINS);
        double style = random.nextDouble();
        double typoRate = style < 0.6 ? 0.0 : style < 0.9 ? 0.03 : 0.08;
        boolean lowerCase = style >= 0.9 && random.nextBoolean();
        return new Writer(first, last, email, typoRate, lowerCase, random);
    }

    private List<String> intakeHeader(String channel) {
        LocalDate day = someDay();
        return List.of(
                "X-Intake-Channel: " + channel,
                ROUTE_HEADER + GENERAL_ROUTE,
                String.format(Locale.ROOT, "X-Intake-Received: %s %02d:%02d", day, 7 + random.nextInt(14), random.nextInt(60)),
                "X-Intake-Form: contact-v4");
    }

    /**
     * The customer's request: an opening sentence, usually some details, perhaps a word of tone.
     * Lead-ins and at least one detail most of the time keep whole lines from repeating verbatim
     * across many messages, which only boilerplate does.
     */
    private List<String> paragraph(SupportQueue queue, Writer writer) {
        List<String> sentences = new ArrayList<>();
        String leadIn = random.nextDouble() < 0.6 ? pick(Phrasebook.LEAD_INS) : "";
        sentences.add(joinLeadIn(leadIn, fill(pick(Phrasebook.OPENINGS.get(queue)))));
        List<String> details = new ArrayList<>(Phrasebook.DETAILS.get(queue));
        int count = random.nextDouble() < 0.15 ? 0 : 1 + random.nextInt(3);
        for (int i = 0; i < count && !details.isEmpty(); i++) {
            sentences.add(fill(details.remove(random.nextInt(details.size()))));
        }
        String tone = tone(0.3).strip();
        if (!tone.isEmpty()) {
            sentences.add(tone);
        }
        List<String> lines = new ArrayList<>();
        // Longer requests break into two paragraphs, as people tend to write them.
        if (sentences.size() > 3 && random.nextBoolean()) {
            lines.add(writer.polish(String.join(" ", sentences.subList(0, 2))));
            lines.add("");
            lines.add(writer.polish(String.join(" ", sentences.subList(2, sentences.size()))));
        } else {
            lines.add(writer.polish(String.join(" ", sentences)));
        }
        return lines;
    }

    /** "So, " + "The bill..." reads "So, the bill..."; a lead-in that ends a sentence keeps the capital. */
    static String joinLeadIn(String leadIn, String sentence) {
        boolean newSentence = leadIn.isEmpty() || leadIn.endsWith(". ") || leadIn.endsWith(": ");
        boolean pronounI = sentence.startsWith("I ") || sentence.startsWith("I'");
        if (newSentence || pronounI) {
            return leadIn + sentence;
        }
        return leadIn + sentence.substring(0, 1).toLowerCase(Locale.ROOT) + sentence.substring(1);
    }

    private String tone(double probability) {
        return random.nextDouble() < probability ? " " + pick(Phrasebook.TONE) : "";
    }

    /** Greeting, the paragraphs, sign-off and signature. */
    private List<String> letter(List<String> paragraphs, Writer writer) {
        List<String> lines = new ArrayList<>();
        if (random.nextDouble() < 0.85) {
            lines.add(writer.polish(pick(Phrasebook.GREETINGS)));
            lines.add("");
        }
        lines.addAll(paragraphs);
        double sign = random.nextDouble();
        if (sign < 0.75) {
            lines.add("");
            lines.add(pick(Phrasebook.CLOSINGS));
            lines.add(random.nextBoolean() ? writer.name() : writer.first());
        } else if (sign < 0.88) {
            lines.add("");
            lines.add(writer.first());
        }
        if (random.nextDouble() < 0.15) {
            lines.add(String.format(Locale.ROOT, "Tel. 07700 900%03d", random.nextInt(1000)));
        }
        if (random.nextDouble() < 0.15) {
            lines.add(String.format(Locale.ROOT, "Account no. %04d %04d", random.nextInt(10000), random.nextInt(10000)));
        }
        if (random.nextDouble() < 0.10) {
            lines.add("");
            lines.add("Sent from my phone");
        }
        return lines;
    }

    private QuotedReply agentReply(Writer writer, List<String> earlierCustomerText) {
        LocalDate day = someDay();
        String attribution = String.format(Locale.ROOT, "On %s, %d %s %d at %02d:%02d, %s wrote:",
                WEEKDAYS[day.getDayOfWeek().getValue() - 1], day.getDayOfMonth(),
                MONTH_ABBREVIATIONS[day.getMonthValue() - 1], day.getYear(),
                8 + random.nextInt(10), random.nextInt(60),
                "Quillmoor Customer Care <care@quillmoor.example>");
        List<String> lines = new ArrayList<>();
        lines.add("Dear " + writer.first() + ",");
        lines.add("");
        lines.addAll(wrap(pick(Phrasebook.AGENT_REPLIES)));
        return new QuotedReply(attribution, lines, pick(List.of("Kind regards,", "Best wishes,", "Thanks,")),
                pick(Phrasebook.SHARED_AGENT_SIGNATURES), earlierCustomerText);
    }

    private List<String> forwarded(Writer writer, List<String> content) {
        LocalDate day = someDay();
        List<String> lines = new ArrayList<>();
        lines.add("---------- Forwarded message ---------");
        lines.add("From: " + writer.name() + " <" + writer.email() + ">");
        lines.add(String.format(Locale.ROOT, "Date: %s, %d %s %d %02d:%02d",
                WEEKDAYS[day.getDayOfWeek().getValue() - 1], day.getDayOfMonth(),
                MONTH_ABBREVIATIONS[day.getMonthValue() - 1], day.getYear(), random.nextInt(24), random.nextInt(60)));
        lines.add("Subject: " + pick(Phrasebook.FORWARD_SUBJECTS));
        lines.add("To: support@quillmoor.example");
        lines.add("");
        lines.addAll(content);
        return lines;
    }

    /** A chat transcript: short, informal lines with the time each was sent. */
    private MessageDraft chat(SupportQueue queue) {
        Writer writer = writer();
        int hour = 8 + random.nextInt(12);
        int minute = random.nextInt(50);
        List<String> lines = new ArrayList<>();
        lines.add("Chat transcript");
        lines.add(stamp(hour, minute) + pick(List.of("hi", "hello", "hi there", "hey")));
        lines.add(stamp(hour, minute + 1) + writer.polish(fill(pick(Phrasebook.OPENINGS.get(queue)))));
        if (random.nextBoolean()) {
            lines.add(stamp(hour, minute + 3) + writer.polish(fill(pick(Phrasebook.DETAILS.get(queue)))));
        }
        lines.add(stamp(hour, minute + 6) + pick(List.of("ok thanks", "thanks", "ok", "bye", "cheers")));
        return new MessageDraft(intakeHeader("chat"), lines, null, List.of());
    }

    private static String stamp(int hour, int minute) {
        return String.format(Locale.ROOT, "[%02d:%02d] ", hour, minute);
    }

    private String fill(String template) {
        String s = template;
        s = s.replace("{month}", pick(Phrasebook.MONTHS));
        s = s.replace("{amount}", String.format(Locale.ROOT, "£%d.%02d", 3 + random.nextInt(60), random.nextInt(100)));
        s = s.replace("{n}", Integer.toString(2 + random.nextInt(5)));
        s = s.replace("{time}", pick(List.of("6am", "7 o'clock", "about 8", "half past nine", "early")));
        s = s.replace("{town}", pick(Phrasebook.TOWNS));
        s = s.replace("{date}", someDay().getDayOfMonth() + " " + pick(Phrasebook.MONTHS));
        return s;
    }

    private LocalDate someDay() {
        return LocalDate.of(2026, 1, 1).plusDays(random.nextInt(120));
    }

    private static List<String> wrap(String text) {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            if (line.length() > 0 && line.length() + 1 + word.length() > WRAP) {
                lines.add(line.toString());
                line.setLength(0);
            }
            if (line.length() > 0) {
                line.append(' ');
            }
            line.append(word);
        }
        lines.add(line.toString());
        return lines;
    }

    private <T> T pick(List<T> options) {
        return options.get(random.nextInt(options.size()));
    }
}
