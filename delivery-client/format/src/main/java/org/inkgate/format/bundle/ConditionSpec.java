package org.inkgate.format.bundle;

/**
 * A resource condition a task can be sat under, declared apart from the tasks so that task and
 * condition can be crossed (e.g. "with resources" and "without resources").
 *
 * @param id    stable condition id
 * @param label label for reports; never shown to raters
 */
public record ConditionSpec(String id, String label) {
}
