package org.inkgate.packs.glossary;

import java.nio.charset.StandardCharsets;
import org.apache.lucene.index.IndexWriter;

/**
 * What Lucene can index of a glossary: a term (and an entry id) is indexed whole as one exact-match
 * key, and Lucene refuses any single indexed term longer than {@link IndexWriter#MAX_TERM_LENGTH}
 * bytes of UTF-8 (32,766) with an "immense term" error deep inside the build. The importers ask
 * here first, so such a term is refused with its file and line before anything is written.
 */
final class IndexLimits {

    /** Lucene's own limit on one indexed term, in UTF-8 bytes. */
    static final int MAX_KEY_BYTES = IndexWriter.MAX_TERM_LENGTH;

    private IndexLimits() {
    }

    /** Null when {@code text} fits as an index key; otherwise what is wrong and how to fix it. */
    static String tooLong(String what, String text) {
        int bytes = LanguageAnalyzers.key(text).getBytes(StandardCharsets.UTF_8).length;
        if (bytes <= MAX_KEY_BYTES) {
            return null;
        }
        return what + " is " + bytes + " bytes long (starting \"" + printableStart(text) + "\"); the glossary index"
                + " takes at most " + MAX_KEY_BYTES + " bytes of UTF-8 per " + what
                + ". A term is a word or phrase: move long text into a definition or note";
    }

    private static String printableStart(String text) {
        StringBuilder b = new StringBuilder();
        text.codePoints().limit(30).forEach(c -> b.appendCodePoint(Character.isISOControl(c) ? '?' : c));
        return b + "...";
    }
}
