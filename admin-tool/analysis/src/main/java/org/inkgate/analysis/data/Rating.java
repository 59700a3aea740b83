package org.inkgate.analysis.data;

/**
 * One rating: a rater's score for one criterion of one candidate's response to one task, sat
 * under one condition (e.g. with or without resources). Level and form may be empty.
 */
public record Rating(String candidate, String level, String form, String task, String condition, String rater,
        String criterion, double score) {
}
