package org.inkgate.analysis.study;

import java.util.Locale;

/** Helpers for summary keys and caution text. */
final class Keys {

    private Keys() {
    }

    /**
     * A data name as a key part: lower case, every run of characters other than a-z and 0-9
     * replaced by one underscore (so "Task 1/B" becomes "task_1_b").
     */
    static String slug(String name) {
        String s = name.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "_");
        s = s.replaceAll("^_+|_+$", "");
        return s.isEmpty() ? "_" : s;
    }

    static double[] values(java.util.Collection<Double> v) {
        return v.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
