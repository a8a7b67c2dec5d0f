package org.telltale.overlap;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.telltale.text.Span;

/**
 * The passages of a text that another text shares: every word covered by a shingle that the other
 * text also has, merged into runs, as character spans of the original text (for marking in a
 * report). Words and sentence ends follow {@link Shingler}; each word is normalised on its own
 * (NFKC, case fold) so that offsets stay those of the original text.
 *
 * <p>Stateless and thread-safe.
 */
public final class SharedPassages {
    private SharedPassages() {
    }

    private record Word(int start, int end, long hash, int sentence) {
    }

    /** Spans of {@code text} covered by {@code size}-word shingles that {@code other} contains, in order, one run per sentence at most. */
    public static List<Span> in(String text, String other, int size) {
        List<Word> words = words(text);
        long[] otherShingles = shingles(words(other), size, null);
        Arrays.sort(otherShingles);
        boolean[] covered = new boolean[words.size()];
        shingles(words, size, (from, to, hash) -> {
            if (Arrays.binarySearch(otherShingles, hash) >= 0) {
                Arrays.fill(covered, from, to, true);
            }
        });
        List<Span> spans = new ArrayList<>();
        int i = 0;
        while (i < words.size()) {
            if (!covered[i]) {
                i++;
                continue;
            }
            int j = i;
            while (j + 1 < words.size() && covered[j + 1] && words.get(j + 1).sentence == words.get(i).sentence) {
                j++;
            }
            spans.add(new Span(words.get(i).start, words.get(j).end));
            i = j + 1;
        }
        return spans;
    }

    private interface ShingleSink {
        void accept(int fromWord, int toWord, long hash);
    }

    private static long[] shingles(List<Word> words, int size, ShingleSink sink) {
        List<Long> out = new ArrayList<>();
        int start = 0;
        while (start < words.size()) {
            int end = start;
            while (end < words.size() && words.get(end).sentence == words.get(start).sentence) {
                end++;
            }
            int made = Math.max(1, end - start - size + 1);
            for (int s = 0; s < made; s++) {
                int from = start + s;
                int to = Math.min(end, from + size);
                long h = 0x2545f4914f6cdd1dL;
                for (int w = from; w < to; w++) {
                    h = Hash64.mix(h ^ words.get(w).hash);
                }
                out.add(h);
                if (sink != null) {
                    sink.accept(from, to, h);
                }
            }
            start = end;
        }
        return out.stream().mapToLong(Long::longValue).toArray();
    }

    private static List<Word> words(String text) {
        List<Word> words = new ArrayList<>();
        int sentence = 0;
        int newlines = 0;
        int i = 0;
        int n = text.length();
        while (i < n) {
            char c = text.charAt(i);
            if (Shingler.isWordChar(c)) {
                int start = i;
                while (i < n && Shingler.isWordChar(text.charAt(i))) {
                    i++;
                }
                String folded = TextNormalizer.fold(text.substring(start, i));
                words.add(new Word(start, i, Hash64.fnv1a(folded, 0, folded.length()), sentence));
                newlines = 0;
                continue;
            }
            if (c == '.' || c == '!' || c == '?' || c == ';') {
                sentence++;
            } else if (c == '\n') {
                if (++newlines == 2) {
                    sentence++;
                }
            } else if (!TextNormalizer.isSpace(c) && c != '>' && c != '\r') {
                newlines = 0;
            }
            i++;
        }
        return words;
    }
}
