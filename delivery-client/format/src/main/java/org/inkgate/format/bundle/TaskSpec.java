package org.inkgate.format.bundle;

/**
 * One writing task.
 *
 * @param id               stable task id, unique in the exam
 * @param title            short title shown in navigation
 * @param promptFile       bundle entry holding the prompt (Markdown)
 * @param timeLimitSeconds time allowed, before any candidate's extra time; 0 means untimed
 * @param warningMinutes   minutes before the end at which the candidate is warned, e.g. [5, 1]
 * @param words            word guidance shown to the candidate (soft limits), or null
 */
public record TaskSpec(
        String id,
        String title,
        String promptFile,
        int timeLimitSeconds,
        java.util.List<Integer> warningMinutes,
        WordGuidance words) {

    public TaskSpec {
        warningMinutes = java.util.List.copyOf(java.util.Objects.requireNonNullElse(warningMinutes, java.util.List.of()));
    }
}
