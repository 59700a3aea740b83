package org.inkgate.analysis.data;

import java.util.Map;

/** A candidate's level and survey answers (item name to answer, e.g. Likert 1-5; absent = not answered). */
public record Candidate(String id, String level, Map<String, Double> survey) {

    public Candidate {
        survey = Map.copyOf(survey);
    }
}
