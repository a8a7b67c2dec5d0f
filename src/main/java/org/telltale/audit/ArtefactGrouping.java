package org.telltale.audit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * Groups flagged terms into artefacts by where they occur (docs/audit.md, "Artefacts"): the terms
 * of one label that sit mostly in the same header field, the same repeated line template, at the
 * same host or in identifiers of the same shape are one artefact. A term the policy marks that sits
 * in content is an artefact of its own. Grouping decides nothing about significance: it runs on the
 * candidates {@link FindingRules} already flagged.
 *
 * <p>Stateless.
 */
final class ArtefactGrouping {

    /** One artefact before its scrub: where it is, the label, its pattern, and its flagged terms. */
    record Group(ArtefactKind kind, String key, String shown, String label, String pattern,
                 List<FindingRules.Candidate> members) {

        List<String> terms() {
            return members.stream().map(FindingRules.Candidate::term).toList();
        }
    }

    private ArtefactGrouping() {
    }

    /** Distinct values an identifier shape must take before it counts as one whose digits vary. */
    static final int VARYING = 4;

    /**
     * The kind a term counts as: where most of its occurrences sit ({@link CorpusTerms#kind}), except
     * that a fixed code recurring verbatim is the vocabulary of its label, not an identifier (a
     * product model: "my XR980 keeps dropping"). An identifier artefact is a shape whose digits vary
     * from document to document ({@code HR-49654}, {@code HR-10100} → {@code HR-#####}), and its
     * terms are the parts that stay ({@code hr}). So a term of identifier places is content when it
     * carries digits and mostly is a whole identifier by itself ({@code xr980}), or when the shape
     * it sits in took fewer than {@value #VARYING} distinct values in the corpus ({@code ZB-412}
     * alone). A code in a header line is a header artefact, whatever it looks like.
     */
    static ArtefactKind kindOf(String term, CorpusTerms corpus) {
        ArtefactKind kind = corpus.kind(term);
        if (kind != ArtefactKind.IDENTIFIER) {
            return kind;
        }
        if (hasDigit(term) && corpus.wholeCodeShare(term) >= 0.5) {
            return ArtefactKind.CONTENT;
        }
        CorpusTerms.PlaceRef place = corpus.dominantPlace(term, ArtefactKind.IDENTIFIER);
        if (place != null && corpus.distinctValues(place.key()) < VARYING) {
            return ArtefactKind.CONTENT;
        }
        return kind;
    }

    private static boolean hasDigit(String term) {
        return term.chars().anyMatch(Character::isDigit);
    }

    /**
     * The candidates grouped, in the order of their first member. A term joins the place of its kind
     * that holds most of its occurrences. A term spread over many places of its kind, none holding
     * half of them (the {@code https} of every link), joins instead the artefact of the same kind
     * and label at whose place it occurs most, when there is one: it is part of the links of that
     * host, not an artefact of the host it happens to meet most often.
     */
    static List<Group> group(List<FindingRules.Candidate> candidates, CorpusTerms corpus) {
        Map<String, List<FindingRules.Candidate>> byPlace = new LinkedHashMap<>();
        Map<String, CorpusTerms.PlaceRef> places = new LinkedHashMap<>();
        List<FindingRules.Candidate> spread = new ArrayList<>();
        for (FindingRules.Candidate c : candidates) {
            CorpusTerms.PlaceRef place = c.kind() == ArtefactKind.CONTENT ? null : corpus.dominantPlace(c.term(), c.kind());
            if (place == null) {
                place = new CorpusTerms.PlaceRef(c.kind(), c.term(), c.term());
            } else if (2 * corpus.occurrencesIn(c.term(), place.kind(), place.key())
                    < corpus.occurrencesOfKind(c.term(), place.kind())) {
                spread.add(c);
                places.putIfAbsent(groupId(c.label(), place), place);
                continue;
            }
            String id = groupId(c.label(), place);
            byPlace.computeIfAbsent(id, k -> new ArrayList<>()).add(c);
            places.putIfAbsent(id, place);
        }
        for (FindingRules.Candidate c : spread) {
            String best = null;
            long most = 0;
            for (String id : byPlace.keySet()) {
                CorpusTerms.PlaceRef place = places.get(id);
                long n = corpus.occurrencesIn(c.term(), place.kind(), place.key());
                if (place.kind() == c.kind() && id.startsWith(c.label() + '\u0000') && n > most) {
                    best = id;
                    most = n;
                }
            }
            if (best == null) {
                best = groupId(c.label(), corpus.dominantPlace(c.term(), c.kind()));
            }
            byPlace.computeIfAbsent(best, k -> new ArrayList<>()).add(c);
        }
        absorbSatellites(byPlace, places, corpus);
        List<Group> out = new ArrayList<>();
        byPlace.forEach((id, members) -> {
            CorpusTerms.PlaceRef place = places.get(id);
            List<FindingRules.Candidate> sorted = new ArrayList<>(members);
            sorted.sort(Comparator.comparingDouble((FindingRules.Candidate c) -> c.entry().importance()).reversed()
                    .thenComparing(FindingRules.Candidate::term));
            String label = members.get(0).label();
            out.add(new Group(place.kind(), place.key(), place.shown(), label, pattern(place, sorted), sorted));
        });
        return out;
    }

    /**
     * A group of one kind and label whose every term also occurs at the place of another group of
     * the same kind and label joins that group (the most important such, the least important groups
     * first): {@code https} met most often at a help
     * desk's host, but present in the planted links too, is part of those links.
     */
    private static void absorbSatellites(Map<String, List<FindingRules.Candidate>> byPlace,
            Map<String, CorpusTerms.PlaceRef> places, CorpusTerms corpus) {
        List<String> ids = new ArrayList<>(byPlace.keySet());
        ids.sort(Comparator.comparingDouble((String id) -> importance(byPlace.get(id))).reversed().thenComparing(id -> id));
        for (int i = ids.size() - 1; i >= 0; i--) {
            String small = ids.get(i);
            CorpusTerms.PlaceRef from = places.get(small);
            if (from.kind() == ArtefactKind.CONTENT) {
                continue;
            }
            String label = byPlace.get(small).get(0).label();
            for (int j = 0; j < ids.size(); j++) {
                String big = ids.get(j);
                if (j == i) {
                    continue;
                }
                CorpusTerms.PlaceRef to = places.get(big);
                if (!byPlace.containsKey(big) || to.kind() != from.kind() || !byPlace.get(big).get(0).label().equals(label)) {
                    continue;
                }
                boolean all = byPlace.get(small).stream().allMatch(c -> corpus.occurrencesIn(c.term(), to.kind(), to.key()) > 0);
                if (all) {
                    byPlace.get(big).addAll(byPlace.remove(small));
                    break;
                }
            }
        }
    }

    private static double importance(List<FindingRules.Candidate> members) {
        return members.stream().mapToDouble(c -> c.entry().importance() * c.entry().importance()).sum();
    }

    private static String groupId(String label, CorpusTerms.PlaceRef place) {
        return label + '\u0000' + CorpusTerms.placeId(place.kind(), place.key());
    }

    /**
     * The pattern a reviewer recognises: the field with the values leaned on
     * ({@code X-Intake-Route: acc7}, terms in alphabetical order so the pattern does not move with
     * their weights), the repeated line as written, the host, the identifier shape, or the term.
     */
    static String pattern(CorpusTerms.PlaceRef place, List<FindingRules.Candidate> members) {
        return switch (place.kind()) {
            case HEADER -> place.shown() + ": " + members.stream().map(FindingRules.Candidate::term).sorted()
                    .collect(Collectors.joining(" "));
            case CONTENT -> place.key();
            default -> place.shown();
        };
    }
}
