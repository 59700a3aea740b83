package org.inkgate.format.response;

import java.util.ArrayList;
import java.util.List;
import java.util.UUID;

/**
 * The rules a response document keeps beyond its JSON shape; the writer refuses a document that
 * breaks them and the reader refuses a package that holds one.
 */
final class ResponseRules {

    private ResponseRules() {
    }

    static List<String> problems(ResponseDocument r) {
        List<String> problems = new ArrayList<>();
        if (!isUuid(r.packageId())) {
            problems.add("packageId \"" + r.packageId() + "\" is not a UUID");
        }
        for (String field : new String[] {r.examId(), r.candidateNumber(), r.formId()}) {
            if (field == null || field.isBlank()) {
                problems.add("examId, candidateNumber and formId must all be set");
                break;
            }
        }
        for (TaskResponse t : r.tasks()) {
            String where = "task \"" + t.taskId() + "\"";
            if (t.policy() == null || t.text() == null || t.endReason() == null) {
                problems.add(where + ": policy, text and endReason must be set");
                continue;
            }
            if (!t.toolsOffered().equals(t.policy().offeredTools())) {
                problems.add(where + ": toolsOffered " + t.toolsOffered() + " differ from what its policy offers "
                        + t.policy().offeredTools());
            }
            if (!t.toolsOffered().containsAll(t.toolUse().keySet())) {
                problems.add(where + ": use is recorded for tools that were not offered " + t.toolUse().keySet());
            }
        }
        return problems;
    }

    static boolean isUuid(String text) {
        try {
            return text != null && UUID.fromString(text).toString().equals(text);
        } catch (IllegalArgumentException e) {
            return false;
        }
    }
}
