package org.telltale.demo;

import java.util.List;
import java.util.Map;

/**
 * The invented wording of the demo scenario: what customers of the fictional Quillmoor Broadband
 * write to each queue, and the greetings, closings and follow-ups every queue shares. Some
 * sentences of one queue mention another queue's subject on purpose, as real messages do, so the
 * content alone does not make routing trivial.
 *
 * <p>Placeholders in braces are filled by {@link MessageComposer}.
 */
final class Phrasebook {
    private Phrasebook() {
    }

    /** Sentences that open a message: the customer's main request. */
    static final Map<SupportQueue, List<String>> OPENINGS = Map.of(
            SupportQueue.BILLING, List.of(
                    "I have been charged twice for {month}.",
                    "My latest bill is {amount} higher than usual and I don't understand why.",
                    "Can you explain the extra charge of {amount} on my invoice?",
                    "I was promised a discount when I renewed but the bill still shows the old price.",
                    "The direct debit went out on the wrong date this month.",
                    "I cancelled the TV add-on in {month} but I am still paying for it.",
                    "Why has my monthly price gone up without any notice?",
                    "I would like a refund for the days my service was not working.",
                    "My payment card expired and I need to update the details.",
                    "I got a late payment fee although I paid on time.",
                    "Please send me copies of my invoices for the last {n} months.",
                    "There is a charge on my bill for a router I already sent back.",
                    "I moved out in {month} and I'm still being billed for the old address.",
                    "The app says my balance is {amount} but my bank shows something different.",
                    "I want to switch from paying by card to paying by direct debit."),
            SupportQueue.OUTAGE, List.of(
                    "My broadband has been down since {time} this morning.",
                    "The internet keeps dropping every few minutes.",
                    "There is no connection at all, the light on the router is red.",
                    "Speeds have been terrible for {n} days, about 2 Mbps instead of 70.",
                    "Is there an outage in {town}? Nothing works.",
                    "The whole street has lost service since the roadworks started.",
                    "Our connection goes off every evening around 8pm.",
                    "My landline has no dial tone and the internet is down too.",
                    "The wifi works but nothing loads, websites just time out.",
                    "Since the storm last night we have had no service.",
                    "I work from home and the connection has been unusable all week.",
                    "Your status page says everything is fine but we are offline.",
                    "The router reboots itself several times an hour.",
                    "I can't even log in to the app to report the fault because the internet is down."),
            SupportQueue.ACCESS, List.of(
                    "I can't log in to my account, it says my password is wrong.",
                    "I've been locked out after too many attempts.",
                    "The password reset email never arrives.",
                    "I no longer have the phone number you send the verification code to.",
                    "My account was signed in from a place I don't recognise.",
                    "I changed my email address and now I can't sign in.",
                    "The app keeps asking me to verify my identity again and again.",
                    "Someone else seems to have changed my password.",
                    "I need to add my partner as an authorised user on the account.",
                    "The two-step code is rejected every time I enter it.",
                    "I forgot the username I registered with.",
                    "The reset link in the email says it has expired.",
                    "I can't get into my account to see my bill."),
            SupportQueue.RETURNS, List.of(
                    "The router you sent me is faulty and I'd like to return it.",
                    "I received the wrong model of set-top box.",
                    "How do I send back the old equipment now that I've cancelled?",
                    "The power adapter for the new router is missing from the box.",
                    "I need a returns label for the hub.",
                    "The replacement device arrived damaged.",
                    "I posted the router back {n} days ago, can you confirm you received it?",
                    "The TV box makes a buzzing noise and gets very hot.",
                    "The courier didn't collect the parcel as arranged.",
                    "Can I drop the equipment at a post office instead?",
                    "The mesh extender stopped working after a week.",
                    "The new router keeps losing connection, I think the unit itself is broken."),
            SupportQueue.MOVING, List.of(
                    "I'm moving house on {date} and want to take my broadband with me.",
                    "We are relocating to {town} next month, can the service be transferred?",
                    "I need to change the installation address on my account.",
                    "Can you check if fibre is available at my new address?",
                    "I'd like to book an engineer for the day I move in.",
                    "I'm moving in with my partner who already has a provider, so please close my account at the old address.",
                    "What happens to my contract if I move abroad?",
                    "Can I keep my phone number when we move?",
                    "The new tenants at my old address need the line, how do I hand it over?",
                    "We move on {date}, please stop the service at the old place then."));

    /** Sentences that add detail to a message of one queue. */
    static final Map<SupportQueue, List<String>> DETAILS = Map.of(
            SupportQueue.BILLING, List.of(
                    "I have checked my bank statement and the payment left twice.",
                    "I have been a customer for {n} years and never had this problem.",
                    "Could you credit the difference to my account?",
                    "I'd like the fee removed please.",
                    "Your price list says {amount} per month, not what I am paying.",
                    "I spoke to someone on the phone who said it would be fixed but nothing changed.",
                    "Please confirm the corrected amount in writing.",
                    "The invoice from {month} looks fine, it's only the latest one.",
                    "I can't afford to pay for something I don't use."),
            SupportQueue.OUTAGE, List.of(
                    "I have restarted the router {n} times already.",
                    "I tried a different cable and it made no difference.",
                    "Neighbours on the same street have the same problem.",
                    "Please send an engineer as soon as possible.",
                    "I need to know when it will be fixed.",
                    "The light on the box is blinking orange.",
                    "I ran a speed test and it showed almost nothing.",
                    "Will I get compensation for the time without service?",
                    "My kids need it for school work, this is urgent."),
            SupportQueue.ACCESS, List.of(
                    "I've tried on my laptop and on my phone.",
                    "I cleared the browser cache as suggested on your help page.",
                    "Please unlock it so I can check my bill.",
                    "I am worried my account has been hacked.",
                    "I need to get in today to change my details.",
                    "The error says 'account suspended' but I have paid everything.",
                    "The code comes through but only after it has already expired.",
                    "I have the account number and can answer the security questions."),
            SupportQueue.RETURNS, List.of(
                    "I still have the original packaging.",
                    "The serial number is on the sticker underneath.",
                    "Please arrange a collection, I can't get to a shop.",
                    "I don't want to be charged for a device I returned.",
                    "The light never turns green, even after a reset.",
                    "I have the proof of postage if you need it.",
                    "It is still under warranty as far as I know."),
            SupportQueue.MOVING, List.of(
                    "The new postcode is in the {town} area.",
                    "I'll need the service working from the first day, I work from home.",
                    "Please tell me if there is a fee for moving the service.",
                    "I'll take the router with me, is that OK?",
                    "The landlord says the flat already has a line.",
                    "We get the keys on {date}.",
                    "Our contract still has {n} months to run."));

    /** Follow-ups that say nothing about their queue; only context reveals where they belong. */
    static final List<String> FOLLOW_UPS = List.of(
            "Any update on this?",
            "I am still waiting for a reply.",
            "Please call me back.",
            "Could someone get back to me today please.",
            "This is my third message about the same issue.",
            "See below.",
            "Following up on my earlier message.",
            "Hello? Is anyone reading these?",
            "Thanks for your help so far, but it's still not sorted.",
            "Is there any news?",
            "It has been a week now.");

    /** How people start their request. */
    static final List<String> LEAD_INS = List.of(
            "So, ", "Quick question. ", "Hello again. ", "As I said on the phone, ", "Basically ", "Just to let you know, ",
            "Not sure this is the right place but ", "I hope you can help. ", "Me again. ", "Urgent: ", "FYI ");

    /** Frustration or warmth that any queue gets. */
    static final List<String> TONE = List.of(
            "This is really frustrating.",
            "Thanks in advance for your help.",
            "I'd appreciate a quick answer.",
            "Honestly this is unacceptable.",
            "Sorry to bother you again.",
            "I have been on hold for an hour twice now.",
            "You have always been helpful before, so I hope you can sort it.",
            "If this isn't resolved I will cancel.",
            "I read https://help.quillmoor.example but it did not answer my question.");

    static final List<String> GREETINGS = List.of(
            "Hi,", "Hello,", "Dear Quillmoor team,", "To whom it may concern,", "Hi there,", "hey",
            "Good morning,", "Dear Sir or Madam,", "Hello support,");

    static final List<String> CLOSINGS = List.of(
            "Thanks,", "Kind regards,", "Cheers,", "Regards,", "Thank you,", "Best wishes,", "Many thanks,", "Thx");

    /** What an agent wrote before, quoted back in replies; the same wording in every queue. */
    static final List<String> AGENT_REPLIES = List.of(
            "Thank you for getting in touch. Your request is logged and a member of the team replies within two working days.",
            "Thanks for your message. Could you please confirm the full name and date of birth of the account holder?",
            "Sorry for the trouble. This has been passed to the right team, who are looking into it.",
            "Thank you for your patience. Could you share a little more information with us?",
            "Thanks for your note. In the meantime, our guides at https://help.quillmoor.example cover the most common topics.");

    /** Agents who answer every queue; their signatures carry no hint of the queue. */
    static final List<String> SHARED_AGENT_SIGNATURES = List.of(
            "Ines Haverkamp | Customer Care",
            "Jonah Pellegrew | Customer Care",
            "Quillmoor Customer Care",
            "Ravi Anstruther | Customer Care");

    /** Subjects of forwarded messages; deliberately generic. */
    static final List<String> FORWARD_SUBJECTS = List.of(
            "help", "question", "Fwd: my account", "please read", "problem", "hello again", "(no subject)");

    static final List<String> FIRST_NAMES = List.of(
            "Amara", "Bastian", "Celyn", "Dorota", "Emeric", "Fenna", "Gaspard", "Halina", "Idris", "Joanna",
            "Kasimir", "Liesel", "Marek", "Nerys", "Oona", "Piet", "Quentin", "Rosalind", "Soren", "Tilde",
            "Ulric", "Vesna", "Wynn", "Ximena", "Yorick", "Zelie", "Anouk", "Bram", "Cosima", "Dafydd");

    static final List<String> LAST_NAMES = List.of(
            "Ashcombe", "Brightwater", "Caldecott", "Dunmore", "Eskelund", "Fairweather", "Gorringe", "Hollins",
            "Inchbald", "Jessop", "Kettleby", "Lowther", "Marlowe-Finch", "Northcott", "Oakhurst", "Penhallow",
            "Quarrie", "Ridgeway", "Stellmach", "Thistlewood", "Underhill", "Varga-Lind", "Whitcombe", "Yelland");

    /** Mail domains reserved for documentation by RFC 2606 (.example). */
    static final List<String> MAIL_DOMAINS = List.of("mail.example", "post.example", "inbox.example", "homenet.example");

    /** Invented towns of the scenario. */
    static final List<String> TOWNS = List.of(
            "Harlowmere", "Stenbridge", "Ashworth Vale", "Kilbury", "Marrowfield", "Oxcombe", "Pellingford", "Wrenhallow");

    static final List<String> MONTHS = List.of(
            "January", "February", "March", "April", "May", "June", "July", "August", "September", "October",
            "November", "December");
}
