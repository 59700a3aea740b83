package org.inkgate.format.bundle;

import java.util.List;
import java.util.Objects;

/**
 * An ordered set of tasks, each with its condition and the policy it runs under.
 *
 * @param id                    stable form id
 * @param slots                 the tasks in the order the candidate sits them
 * @param preQuestionnaire      questionnaire asked before the first task, or null
 * @param postQuestionnaire     questionnaire asked after the last task, or null
 * @param sittingLimitSeconds   limit for the whole sitting on top of the task limits; 0 for none
 */
public record FormSpec(
        String id,
        List<FormSlot> slots,
        String preQuestionnaire,
        String postQuestionnaire,
        int sittingLimitSeconds) {

    public FormSpec {
        slots = List.copyOf(Objects.requireNonNullElse(slots, List.of()));
    }
}
