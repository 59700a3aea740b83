package org.inkgate.analysis.mfrm;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Ratings in long form: one row per (candidate, facet values, score), held as dictionary codes in
 * primitive arrays so a million rows cost a few tens of megabytes.
 */
public final class RatingData {

    /** The name of the candidate column; every other column is a facet or a grouping column. */
    public static final String CANDIDATE = "candidate";

    private final List<String> columns;
    private final String[] candidateLabels;
    private final int[] candidate;
    private final String[][] labels;
    private final int[][] codes;
    private final int[] score;

    private RatingData(List<String> columns, String[] candidateLabels, int[] candidate,
                       String[][] labels, int[][] codes, int[] score) {
        this.columns = columns;
        this.candidateLabels = candidateLabels;
        this.candidate = candidate;
        this.labels = labels;
        this.codes = codes;
        this.score = score;
    }

    /** Starts a table with the given non-candidate columns (e.g. task, condition, rater, criterion). */
    public static Builder builder(List<String> columns) {
        return new Builder(columns);
    }

    /** The non-candidate column names, in order. */
    public List<String> columns() {
        return columns;
    }

    /** Number of rows. */
    public int size() {
        return score.length;
    }

    /** Index of a column: -1 for the candidate column; throws for an unknown name. */
    public int columnIndex(String name) {
        if (CANDIDATE.equals(name)) {
            return -1;
        }
        int i = columns.indexOf(name);
        if (i < 0) {
            throw new IllegalArgumentException("unknown column '" + name + "': the data have "
                    + CANDIDATE + " and " + columns);
        }
        return i;
    }

    /** Element labels of a column (candidate column for -1), indexed by code. */
    public String[] labels(int column) {
        return column < 0 ? candidateLabels.clone() : labels[column].clone();
    }

    /** The code of each row in a column (candidate column for -1); shared, do not modify. */
    int[] codesView(int column) {
        return column < 0 ? candidate : codes[column];
    }

    /** Raw scores of all rows; shared, do not modify. */
    int[] scoresView() {
        return score;
    }

    /** Collects rows; labels are coded in order of first appearance. */
    public static final class Builder {
        private final List<String> columns;
        private final Dictionary candidates = new Dictionary();
        private final Dictionary[] dictionaries;
        private int[] candidate = new int[1024];
        private int[][] codes;
        private int[] score = new int[1024];
        private int size;

        private Builder(List<String> columns) {
            Objects.requireNonNull(columns, "columns");
            this.columns = List.copyOf(columns);
            if (this.columns.contains(CANDIDATE)) {
                throw new IllegalArgumentException("the column list names '" + CANDIDATE
                        + "'; it is always present and must not be repeated");
            }
            if (this.columns.stream().distinct().count() != this.columns.size()) {
                throw new IllegalArgumentException("column names repeat: " + this.columns);
            }
            dictionaries = new Dictionary[this.columns.size()];
            codes = new int[this.columns.size()][1024];
            for (int i = 0; i < dictionaries.length; i++) {
                dictionaries[i] = new Dictionary();
            }
        }

        /** Adds one rating; values follow the column order given to {@link #builder}. */
        public Builder add(String candidateLabel, String[] values, int rawScore) {
            Objects.requireNonNull(candidateLabel, "candidate");
            if (values.length != dictionaries.length) {
                throw new IllegalArgumentException("row " + (size + 1) + ": expected "
                        + dictionaries.length + " values for " + columns + ", got " + values.length);
            }
            if (candidateLabel.isBlank()) {
                throw new IllegalArgumentException("row " + (size + 1) + ": the candidate is empty");
            }
            for (int i = 0; i < values.length; i++) {
                if (values[i] == null || values[i].isBlank()) {
                    throw new IllegalArgumentException("row " + (size + 1) + ": column '"
                            + columns.get(i) + "' is empty; every rating needs every column");
                }
            }
            if (rawScore < 0) {
                throw new IllegalArgumentException("row " + (size + 1) + ": score " + rawScore
                        + " is negative; scores are whole numbers from 0 upwards");
            }
            if (size == score.length) {
                int n = size * 2;
                candidate = Arrays.copyOf(candidate, n);
                score = Arrays.copyOf(score, n);
                for (int i = 0; i < codes.length; i++) {
                    codes[i] = Arrays.copyOf(codes[i], n);
                }
            }
            candidate[size] = candidates.code(candidateLabel);
            for (int i = 0; i < values.length; i++) {
                codes[i][size] = dictionaries[i].code(values[i]);
            }
            score[size] = rawScore;
            size++;
            return this;
        }

        /** Adds one rating with values by column name. */
        public Builder add(String candidateLabel, Map<String, String> values, int rawScore) {
            String[] ordered = new String[columns.size()];
            for (int i = 0; i < ordered.length; i++) {
                ordered[i] = values.get(columns.get(i));
            }
            return add(candidateLabel, ordered, rawScore);
        }

        /** The finished table. */
        public RatingData build() {
            if (size == 0) {
                throw new IllegalArgumentException("no ratings: add at least one row");
            }
            String[][] labels = new String[dictionaries.length][];
            int[][] trimmed = new int[codes.length][];
            for (int i = 0; i < dictionaries.length; i++) {
                labels[i] = dictionaries[i].labels();
                trimmed[i] = Arrays.copyOf(codes[i], size);
            }
            return new RatingData(columns, candidates.labels(), Arrays.copyOf(candidate, size),
                    labels, trimmed, Arrays.copyOf(score, size));
        }
    }

    private static final class Dictionary {
        private final Map<String, Integer> codes = new HashMap<>();
        private final List<String> labels = new ArrayList<>();

        int code(String label) {
            Integer c = codes.get(label);
            if (c == null) {
                c = labels.size();
                codes.put(label, c);
                labels.add(label);
            }
            return c;
        }

        String[] labels() {
            return labels.toArray(String[]::new);
        }
    }
}
