package org.inkgate.admin.core.forms;

import java.util.List;
import java.util.Map;

/**
 * Which candidate sits which form, with how it was decided, so that it can be reproduced.
 *
 * @param seed  the seed of the random choices
 * @param rows  one row per candidate, in candidate-number order
 */
public record Assignment(long seed, List<Row> rows) {

    public Assignment {
        rows = List.copyOf(rows);
    }

    /** One candidate's form. */
    public record Row(String candidateNumber, String level, String formId) {
    }

    /** Form id per candidate number. */
    public Map<String, String> formByCandidate() {
        java.util.Map<String, String> map = new java.util.LinkedHashMap<>();
        rows.forEach(r -> map.put(r.candidateNumber(), r.formId()));
        return map;
    }
}
