package org.inkgate.admin.core.forms;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;

/**
 * What an assignment is balanced on, read from the forms themselves: the task written first, the
 * condition met first, and for each task the condition it is written under. Each margin sorts the
 * forms into classes; a margin is even in a group of n candidates when every class holds
 * n x (forms in the class) / (all forms) of them.
 *
 * <p>In the Latin-square designs every position's task follows from the first task, so balancing
 * the first task balances the position of every task.
 */
final class BalanceMargins {

    /** The kinds of margin, in the order the assigner ranks them. */
    enum Kind {
        /** For one task, the condition it is written under: what the design exists for. */
        TASK_CONDITION,
        /** The task written first. */
        FIRST_TASK,
        /** The condition met first. */
        FIRST_CONDITION
    }

    /**
     * One margin.
     *
     * @param kind     what it counts
     * @param task     the task, for {@link Kind#TASK_CONDITION}; otherwise null
     * @param classOf  per form index, the index of its class
     * @param labels   per class, its name (a task or condition id)
     * @param sizes    per class, how many forms it holds
     */
    record Margin(Kind kind, String task, int[] classOf, List<String> labels, int[] sizes) {
    }

    private BalanceMargins() {
    }

    static List<Margin> of(List<FormSpec> forms) {
        List<Margin> out = new ArrayList<>();
        List<String> tasks = forms.get(0).slots().stream().map(FormSlot::taskId).sorted().toList();
        for (String task : tasks) {
            out.add(margin(Kind.TASK_CONDITION, task, forms, f -> f.slots().stream()
                    .filter(s -> s.taskId().equals(task)).findFirst().map(FormSlot::conditionId).orElse("")));
        }
        out.add(margin(Kind.FIRST_TASK, null, forms, f -> f.slots().get(0).taskId()));
        out.add(margin(Kind.FIRST_CONDITION, null, forms, f -> f.slots().get(0).conditionId()));
        return out;
    }

    private static Margin margin(Kind kind, String task, List<FormSpec> forms,
            java.util.function.Function<FormSpec, String> label) {
        Map<String, Integer> index = new LinkedHashMap<>();
        forms.stream().map(label).sorted().forEach(l -> index.putIfAbsent(l, index.size()));
        int[] classOf = new int[forms.size()];
        int[] sizes = new int[index.size()];
        for (int f = 0; f < forms.size(); f++) {
            classOf[f] = index.get(label.apply(forms.get(f)));
            sizes[classOf[f]]++;
        }
        return new Margin(kind, task, classOf, List.copyOf(index.keySet()), sizes);
    }
}
