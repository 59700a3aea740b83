package org.inkgate.analysis.data;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;

/**
 * A candidate's level, survey answers (item name to answer, e.g. Likert 1-5; absent = not answered)
 * and categorical background attributes (attribute name to group, e.g. first_language to Polish;
 * absent = not given), in the order the table declares them.
 */
public record Candidate(String id, String level, Map<String, Double> survey, Map<String, String> attributes) {

    public Candidate {
        survey = Map.copyOf(survey);
        attributes = Collections.unmodifiableMap(new LinkedHashMap<>(attributes));
    }

    /** A candidate without background attributes. */
    public Candidate(String id, String level, Map<String, Double> survey) {
        this(id, level, survey, Map.of());
    }

    /** The attribute names the candidates carry, in first-seen order. */
    public static List<String> attributeNames(List<Candidate> candidates) {
        LinkedHashSet<String> names = new LinkedHashSet<>();
        candidates.forEach(c -> names.addAll(c.attributes().keySet()));
        return List.copyOf(names);
    }
}
