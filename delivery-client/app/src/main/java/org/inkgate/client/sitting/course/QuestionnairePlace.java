package org.inkgate.client.sitting.course;

/** Where a questionnaire stands in the form, and so what follows it. */
public enum QuestionnairePlace {
    /** Before the first task: the tasks follow. */
    BEFORE_TASKS,
    /** After the last task: the review follows. */
    AFTER_TASKS
}
