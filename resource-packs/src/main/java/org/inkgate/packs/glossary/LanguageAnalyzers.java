package org.inkgate.packs.glossary;

import java.text.Normalizer;
import java.util.Locale;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.CharArraySet;
import org.apache.lucene.analysis.de.GermanAnalyzer;
import org.apache.lucene.analysis.en.EnglishAnalyzer;
import org.apache.lucene.analysis.es.SpanishAnalyzer;
import org.apache.lucene.analysis.fr.FrenchAnalyzer;
import org.apache.lucene.analysis.it.ItalianAnalyzer;
import org.apache.lucene.analysis.ja.JapaneseAnalyzer;
import org.apache.lucene.analysis.nl.DutchAnalyzer;
import org.apache.lucene.analysis.pt.PortugueseAnalyzer;
import org.apache.lucene.analysis.standard.StandardAnalyzer;

/** The stemming analyzer for each language side of a term bank, and the shared key normalisation. */
final class LanguageAnalyzers {
    private LanguageAnalyzers() {
    }

    /** The field holding a language's stemmed tokens, e.g. {@code stem_en}. */
    static String stemField(String languageTag) {
        return "stem_" + primary(languageTag);
    }

    /** Primary language subtag, lower case: {@code en-GB} -> {@code en}. */
    static String primary(String languageTag) {
        return Locale.forLanguageTag(languageTag).getLanguage();
    }

    /** Lucene's analyzer for the language (its own stemmer and stop words); standard tokens for others. */
    static Analyzer forLanguage(String primary) {
        return switch (primary) {
            case "en" -> new EnglishAnalyzer();
            case "es" -> new SpanishAnalyzer();
            case "fr" -> new FrenchAnalyzer();
            case "de" -> new GermanAnalyzer();
            case "it" -> new ItalianAnalyzer();
            case "pt" -> new PortugueseAnalyzer();
            case "nl" -> new DutchAnalyzer();
            case "ja" -> new JapaneseAnalyzer();
            default -> new StandardAnalyzer(CharArraySet.EMPTY_SET);
        };
    }

    /** Tokens without stemming or stop words, for fuzzy matching of single words inside terms. */
    static Analyzer plainTokens() {
        return new StandardAnalyzer(CharArraySet.EMPTY_SET);
    }

    /** Whole-term key: NFKC, lower case, one space between words. Exact, prefix and fuzzy match on it. */
    static String key(String text) {
        return Normalizer.normalize(text, Normalizer.Form.NFKC).toLowerCase(Locale.ROOT).replaceAll("\\s+", " ").strip();
    }
}
