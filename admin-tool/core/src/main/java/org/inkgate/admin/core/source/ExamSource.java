package org.inkgate.admin.core.source;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.bundle.StudyDesign;
import org.inkgate.format.bundle.WordGuidance;
import org.inkgate.packs.policy.ResourcePolicy;

/**
 * A checked exam source folder: what the test owner wrote in {@code exam.yaml}, the prompts it
 * names and the rubric. Only {@link ExamSourceReader} makes one, after every check passed.
 *
 * @param folder            the source folder
 * @param examId            stable exam id
 * @param title             title shown to candidates
 * @param language          BCP 47 tag of the exam language
 * @param instructionsFile  general instructions (Markdown, relative to the folder), or null
 * @param practice          a practice exam, sat without invigilator set-up
 * @param tasks             the writing tasks
 * @param conditions        the resource conditions, declared apart from the tasks
 * @param design            how forms cross tasks and conditions
 * @param questionnaires    questionnaires the forms ask
 * @param packs             resource packs the conditions name
 * @param rubric            the rubric raters use, or null when the source has none yet
 */
public record ExamSource(
        Path folder,
        String examId,
        String title,
        String language,
        String instructionsFile,
        boolean practice,
        List<Task> tasks,
        List<Condition> conditions,
        Design design,
        List<QuestionnaireSpec> questionnaires,
        List<Pack> packs,
        Rubric rubric) {

    public ExamSource {
        tasks = List.copyOf(tasks);
        conditions = List.copyOf(conditions);
        questionnaires = List.copyOf(questionnaires);
        packs = List.copyOf(packs);
    }

    /**
     * One writing task.
     *
     * @param promptFile prompt Markdown, relative to the folder
     */
    public record Task(String id, String title, String promptFile, int timeLimitSeconds, List<Integer> warningMinutes,
            WordGuidance words) {
        public Task {
            warningMinutes = List.copyOf(warningMinutes);
        }
    }

    /**
     * A resource condition: the tools a task sat under it offers, the same for every task unless
     * {@code perTask} gives a task its own policy under this condition.
     */
    public record Condition(String id, String label, ResourcePolicy policy, Map<String, ResourcePolicy> perTask) {
        public Condition {
            perTask = Map.copyOf(perTask);
        }

        /** The policy a task runs under in this condition. */
        public ResourcePolicy policyFor(String taskId) {
            return perTask.getOrDefault(taskId, policy);
        }
    }

    /**
     * How forms are generated and what every form shares.
     *
     * @param kind                 the study design: how candidates, tasks and conditions are crossed
     * @param rotateConditions     latin-square only: also rotate conditions over positions, so that no
     *                             condition is always sat first
     * @param preQuestionnaire     questionnaire before the first task, or null
     * @param postQuestionnaire    questionnaire after the last task, or null
     * @param sittingLimitSeconds  limit for the whole sitting, 0 for none
     * @param allocation           parallel only: the allocation ratio, one whole number per condition in
     *                             the order the conditions are declared (1:1... when not given)
     * @param stratifyBy           parallel only: roster attributes (besides the level, always a stratum)
     *                             within whose categories the allocation is balanced
     * @param counterbalanceTasks  parallel only: task orders from a Latin square within each group
     *                             (otherwise every candidate writes the tasks in the declared order)
     * @param exactBalance         refuse an assignment unless every stratum's size is a multiple of the
     *                             design's cycle (then every count is exactly even or at the ratio)
     */
    public record Design(StudyDesign kind, boolean rotateConditions, String preQuestionnaire, String postQuestionnaire,
            int sittingLimitSeconds, List<Integer> allocation, List<String> stratifyBy, boolean counterbalanceTasks,
            boolean exactBalance) {

        public Design {
            allocation = List.copyOf(allocation);
            stratifyBy = List.copyOf(stratifyBy);
        }

        /** A within-candidate design (crossover or latin-square) with no parallel settings. */
        public Design(StudyDesign kind, boolean rotateConditions, String preQuestionnaire, String postQuestionnaire,
                int sittingLimitSeconds) {
            this(kind, rotateConditions, preQuestionnaire, postQuestionnaire, sittingLimitSeconds, List.of(), List.of(),
                    true, false);
        }
    }

    /**
     * A resource pack the exam embeds.
     *
     * @param file the .inkpack file, relative to the folder
     */
    public record Pack(String id, String kind, String version, String file) {
    }

    /** The rubric: criteria, each with a score range and band descriptors covering it. */
    public record Rubric(String file, List<Criterion> criteria) {
        public Rubric {
            criteria = List.copyOf(criteria);
        }
    }

    /** One criterion with its score range (e.g. 1-9) and descriptors for bands of scores. */
    public record Criterion(String id, String name, int minScore, int maxScore, List<Band> bands) {
        public Criterion {
            bands = List.copyOf(bands);
        }
    }

    /** A descriptor for the scores {@code from} to {@code to} inclusive. */
    public record Band(int from, int to, String descriptor) {
    }

    public Optional<Task> task(String id) {
        return tasks.stream().filter(t -> t.id().equals(id)).findFirst();
    }
}
