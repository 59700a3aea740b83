package org.inkgate.client.practice;

import java.util.List;
import java.util.Objects;

/**
 * A form as practice mode shows it.
 *
 * @param id         the form's id in the bundle
 * @param name       what the chooser shows, e.g. "Form A"
 * @param tasks      the tasks in the order they are sat
 * @param afterTasks a note on what follows the last task (e.g. a questionnaire), or empty text
 */
public record PracticeForm(String id, String name, List<PracticeTask> tasks, String afterTasks) {

    public PracticeForm {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(afterTasks, "afterTasks");
        tasks = List.copyOf(tasks);
    }

    @Override
    public String toString() {
        return name;
    }
}
