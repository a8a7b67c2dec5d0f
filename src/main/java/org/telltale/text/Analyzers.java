package org.telltale.text;

import java.util.Locale;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.CharArraySet;
import org.apache.lucene.analysis.core.WhitespaceAnalyzer;
import org.apache.lucene.analysis.en.EnglishAnalyzer;
import org.apache.lucene.analysis.standard.StandardAnalyzer;

/**
 * Named factories for the analyzers Telltale offers. Every analyzer keeps stop words: in an
 * explanation "not" and "no" often matter most.
 */
public final class Analyzers {
    private Analyzers() {
    }

    /** Unicode word boundaries (UAX #29), lower-cased. */
    public static Analyzer standard() {
        return new StandardAnalyzer(CharArraySet.EMPTY_SET);
    }

    /** Standard tokens, lower-cased, possessives removed and Porter-stemmed. */
    public static Analyzer english() {
        return new EnglishAnalyzer(CharArraySet.EMPTY_SET);
    }

    /** Runs of non-whitespace, case kept. */
    public static Analyzer whitespace() {
        return new WhitespaceAnalyzer();
    }

    /** The analyzer called {@code name}: {@code standard}, {@code english} or {@code whitespace}. */
    public static Analyzer byName(String name) {
        return switch (name.toLowerCase(Locale.ROOT)) {
            case "standard" -> standard();
            case "english" -> english();
            case "whitespace" -> whitespace();
            default -> throw new org.telltale.UsageException(
                    "unknown analyzer '" + name + "' (expected standard, english or whitespace)");
        };
    }
}
