package org.inkgate.format.response;

/**
 * Counts words the way a candidate would: runs of text between spaces that hold at least one
 * letter or digit, so "well-known" and "don't" are one word each and a lone dash is none. The one rule:
 * the client counts with it and the collector checks a package's counts against its texts with it.
 */
public final class WordCount {

    private WordCount() {
    }

    public static int of(String text) {
        if (text == null) {
            return 0;
        }
        int words = 0;
        boolean inToken = false;
        boolean tokenHasWordChar = false;
        for (int i = 0; i < text.length(); ) {
            int c = text.codePointAt(i);
            i += Character.charCount(c);
            if (Character.isWhitespace(c) || Character.isSpaceChar(c)) {
                if (inToken && tokenHasWordChar) {
                    words++;
                }
                inToken = false;
                tokenHasWordChar = false;
            } else {
                inToken = true;
                tokenHasWordChar |= Character.isLetterOrDigit(c);
            }
        }
        return inToken && tokenHasWordChar ? words + 1 : words;
    }
}
