package org.inkgate.admin.core.source;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.inkgate.admin.core.source.ExamSource.Condition;
import org.inkgate.admin.core.source.ExamSource.Design;
import org.inkgate.admin.core.source.ExamSource.Task;
import org.inkgate.admin.core.source.YamlChecker.At;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.bundle.StudyDesign;

/**
 * Reads exam.yaml's {@code design} and refuses a design that cannot be balanced, saying what
 * would balance it. The roster-dependent check (stratum sizes under {@code exactBalance}) is made
 * when forms are assigned ({@code forms.DesignBalance}).
 */
final class DesignReader {

    static final Set<String> KEYS = Set.of("kind", "rotateConditions", "preQuestionnaire", "postQuestionnaire",
            "sittingLimitMinutes", "allocation", "stratifyBy", "counterbalanceTasks", "exactBalance");
    private static final Set<String> PARALLEL_ONLY = Set.of("allocation", "stratifyBy", "counterbalanceTasks");
    private static final int MAX_RATIO_PART = 20;

    private final YamlChecker c;

    DesignReader(YamlChecker c) {
        this.c = c;
    }

    Design read(JsonNode n, At at, List<Task> tasks, List<Condition> conditions, List<QuestionnaireSpec> questionnaires) {
        if (!c.isObject(n, at, true)) {
            return null;
        }
        c.onlyKeys(n, at, KEYS);
        String word = c.text(n, at.child("kind"), true);
        StudyDesign kind = null;
        if (word != null) {
            kind = StudyDesign.of(word).orElse(null);
            if (kind == null) {
                c.problem(at.child("kind"), "\"" + word + "\" is not a design; use crossover, latin-square or parallel");
            }
        }
        boolean rotate = c.bool(n, at.child("rotateConditions"), true);
        int k = tasks.size();
        int conds = conditions.size();
        if (kind == StudyDesign.CROSSOVER && (k != conds || conds < 2)) {
            c.problem(at.child("kind"), "crossover needs as many tasks as conditions, at least 2 (found " + k
                    + " tasks and " + conds + " conditions): each candidate writes the tasks in the declared order, one"
                    + " condition per task, the condition orders forming a Williams design. "
                    + (conds >= 2 ? "Declare " + conds + " tasks, or use latin-square (any number of tasks) or parallel"
                    : "Declare at least 2 conditions"));
        }
        if (kind == StudyDesign.LATIN_SQUARE && !rotate && conds > 0 && k % conds != 0) {
            c.problem(at.child("rotateConditions"), "without rotation the number of tasks (" + k
                    + ") must be a multiple of the number of conditions (" + conds
                    + ") for every task to meet every condition equally often; set rotateConditions: true");
        }
        if (kind == StudyDesign.PARALLEL && conds < 2) {
            c.problem(at.child("kind"), "a parallel design compares groups that each sit one condition: declare at least"
                    + " 2 conditions (found " + conds + ")");
        }
        if (kind != null && kind != StudyDesign.PARALLEL) {
            for (String key : PARALLEL_ONLY) {
                if (n.has(key)) {
                    c.problem(at.child(key), "applies to parallel designs only; remove it, or set kind: parallel");
                }
            }
        }
        if (kind == StudyDesign.PARALLEL && n.has("rotateConditions")) {
            c.problem(at.child("rotateConditions"), "applies to latin-square only (in a parallel design a candidate"
                    + " sits one condition); remove it");
        }
        List<Integer> allocation = kind == StudyDesign.PARALLEL ? allocation(n, at.child("allocation"), conds) : List.of();
        List<String> stratifyBy = stratifyBy(n, at.child("stratifyBy"));
        boolean counterbalance = c.bool(n, at.child("counterbalanceTasks"), true);
        boolean exact = c.bool(n, at.child("exactBalance"), false);
        Set<String> qids = new HashSet<>(questionnaires.stream().map(QuestionnaireSpec::id).toList());
        String pre = c.text(n, at.child("preQuestionnaire"), false);
        String post = c.text(n, at.child("postQuestionnaire"), false);
        for (var e : Map.of("preQuestionnaire", Optional.ofNullable(pre), "postQuestionnaire",
                Optional.ofNullable(post)).entrySet()) {
            e.getValue().filter(q -> !qids.contains(q)).ifPresent(q -> c.problem(at.child(e.getKey()),
                    "names questionnaire \"" + q + "\", which is not declared under questionnaires"));
        }
        Integer limit = c.integer(n, at.child("sittingLimitMinutes"), false, 0, 1440);
        return kind == null ? null : new Design(kind, rotate, pre, post, limit == null ? 0 : limit * 60, allocation,
                stratifyBy, counterbalance, exact);
    }

    /** {@code "2:1"}: one whole number per condition, in the order the conditions are declared. */
    private List<Integer> allocation(JsonNode n, At at, int conds) {
        List<Integer> even = java.util.Collections.nCopies(Math.max(conds, 0), 1);
        JsonNode node = n.get("allocation");
        if (node == null || node.isNull()) {
            return even;
        }
        if (!node.isTextual()) {
            c.problem(at, "must be a ratio, one whole number per condition in the order declared, separated by ':',"
                    + " e.g. allocation: \"2:1\" (leave it out for equal groups)");
            return even;
        }
        String[] parts = node.asText().strip().split("\\s*:\\s*", -1);
        List<Integer> out = new ArrayList<>();
        for (String p : parts) {
            if (!p.matches("\\d{1,2}") || Integer.parseInt(p) < 1 || Integer.parseInt(p) > MAX_RATIO_PART) {
                c.problem(at, "\"" + node.asText() + "\" is not a ratio: write whole numbers from 1 to " + MAX_RATIO_PART
                        + " separated by ':', e.g. \"2:1\"");
                return even;
            }
            out.add(Integer.parseInt(p));
        }
        if (out.size() != conds) {
            c.problem(at, "\"" + node.asText() + "\" has " + out.size() + " parts but the exam declares " + conds
                    + " conditions; give one number per condition, in the order they are declared");
            return even;
        }
        return out;
    }

    private List<String> stratifyBy(JsonNode n, At at) {
        List<String> out = new ArrayList<>();
        List<JsonNode> nodes = c.list(n, at, false);
        for (int i = 0; i < nodes.size(); i++) {
            String name = c.text(n.get("stratifyBy"), at.index(i), true);
            if (name == null) {
                continue;
            }
            if (name.equals("level")) {
                c.problem(at.index(i), "the level is always a stratum; list only other roster columns here");
            } else if (!name.matches("[A-Za-z][A-Za-z0-9_]{0,63}")) {
                c.problem(at.index(i), "\"" + name + "\" is not a roster column name (letters, digits and '_')");
            } else if (out.contains(name)) {
                c.problem(at.index(i), "\"" + name + "\" is listed twice");
            } else {
                out.add(name);
            }
        }
        return out;
    }
}
