package org.inkgate.client.practice;

/**
 * Counts words the way a candidate would; the rule is the format's
 * ({@link org.inkgate.format.response.WordCount}), which the collector checks packages with.
 */
public final class WordCount {

    private WordCount() {
    }

    public static int of(String text) {
        return org.inkgate.format.response.WordCount.of(text);
    }
}
