package org.inkgate.admin.core.collection;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.store.StoreException;

/**
 * Who on the roster has no response, per form: candidates with no package at all, and candidates
 * whose package lacks one of their form's tasks. The store cannot know why a response is
 * missing (absence, a machine failure, a package not yet collected); the test owner's
 * regulations decide what follows.
 *
 * @param examId        the exam
 * @param byForm        per form id: the missing entries
 * @param withoutForm   roster candidates the bundle gave no form
 * @param rosterSize    candidates on the roster
 */
public record MissingReport(String examId, Map<String, List<Missing>> byForm, List<String> withoutForm, int rosterSize) {

    /** One candidate's missing response: the whole sitting (taskId null) or one task. */
    public record Missing(String candidateNumber, String level, String taskId) {
    }

    public int missingCount() {
        return byForm.values().stream().mapToInt(List::size).sum();
    }

    public static MissingReport of(ResultsStore store, String examId) throws StoreException {
        Map<String, List<String>> tasksByForm = new LinkedHashMap<>();
        for (Rows.Slot s : store.formSlots(examId)) {
            tasksByForm.computeIfAbsent(s.formId(), k -> new ArrayList<>()).add(s.taskId());
        }
        Set<String> answered = new HashSet<>();
        for (Rows.Answered a : store.answered(examId)) {
            answered.add(a.candidateNumber() + "\u0000" + a.taskId());
        }
        Map<String, List<Missing>> byForm = new TreeMap<>();
        tasksByForm.keySet().forEach(f -> byForm.put(f, new ArrayList<>()));
        List<String> withoutForm = new ArrayList<>();
        List<Rows.Candidate> candidates = store.candidates(examId);
        for (Rows.Candidate c : candidates) {
            if (c.formId() == null) {
                withoutForm.add(c.candidateNumber());
                continue;
            }
            List<Missing> list = byForm.computeIfAbsent(c.formId(), k -> new ArrayList<>());
            if (!c.sat()) {
                list.add(new Missing(c.candidateNumber(), c.level(), null));
                continue;
            }
            for (String task : tasksByForm.getOrDefault(c.formId(), List.of())) {
                if (!answered.contains(c.candidateNumber() + "\u0000" + task)) {
                    list.add(new Missing(c.candidateNumber(), c.level(), task));
                }
            }
        }
        return new MissingReport(examId, byForm, withoutForm, candidates.size());
    }
}
