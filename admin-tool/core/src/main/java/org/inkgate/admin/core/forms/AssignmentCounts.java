package org.inkgate.admin.core.forms;

import java.util.List;
import java.util.Map;
import java.util.SortedSet;
import java.util.TreeMap;
import java.util.TreeSet;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;

/**
 * The counts a test owner checks after assigning forms: candidates per level and form, and
 * candidates per task and condition (which show whether the condition is separable from the task).
 *
 * @param byLevel            level to form id to candidates
 * @param byTaskAndCondition task id to condition id to candidates
 * @param conditions         every condition id seen, sorted
 */
public record AssignmentCounts(Map<String, Map<String, Integer>> byLevel,
        Map<String, Map<String, Integer>> byTaskAndCondition, SortedSet<String> conditions) {

    /** Counts the assignment over the forms it was made for. */
    public static AssignmentCounts of(Assignment a, List<FormSpec> forms) {
        Map<String, Map<String, Integer>> byLevel = new TreeMap<>();
        for (Assignment.Row r : a.rows()) {
            byLevel.computeIfAbsent(r.level(), k -> new TreeMap<>()).merge(r.formId(), 1, Integer::sum);
        }
        Map<String, FormSpec> byId = new TreeMap<>();
        forms.forEach(f -> byId.put(f.id(), f));
        Map<String, Map<String, Integer>> cells = new TreeMap<>();
        TreeSet<String> conditions = new TreeSet<>();
        for (Assignment.Row r : a.rows()) {
            for (FormSlot s : byId.get(r.formId()).slots()) {
                cells.computeIfAbsent(s.taskId(), k -> new TreeMap<>()).merge(s.conditionId(), 1, Integer::sum);
                conditions.add(s.conditionId());
            }
        }
        return new AssignmentCounts(byLevel, cells, conditions);
    }

    /** Candidates of {@code level} on form {@code formId}. */
    public int count(String level, String formId) {
        return byLevel.getOrDefault(level, Map.of()).getOrDefault(formId, 0);
    }
}
