package org.inkgate.admin.core.forms;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSource.Condition;
import org.inkgate.admin.core.source.ExamSource.Task;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;

/**
 * Generates the forms of an exam by crossing its tasks with its conditions, so that every task is
 * sat under every condition equally often across the forms and the resource condition can be
 * told apart from the task's difficulty.
 *
 * <ul>
 * <li>crossover (c tasks, c conditions, c &gt;= 2): task order fixed, condition orders from a
 * Williams design over the conditions ({@link #williams}): c sequences for even c, 2c for odd c,
 * so each condition is sat once in every position and follows every other condition equally
 * often (for two conditions: AB and BA);</li>
 * <li>latin-square (k tasks, c conditions): task orders from the rows of a k x k Latin square,
 * Williams' design when k is even (each task follows every other task once: balanced for
 * first-order carry-over), a cyclic square when k is odd (balanced for position only);
 * conditions by position, rotated through all c shifts unless rotation is switched off (then c
 * must divide k). Forms are ordered row by row, shifts fastest, so that any c consecutive forms
 * give each task every condition once;</li>
 * <li>parallel (k tasks, c conditions, between candidates): one group of forms per condition, in
 * the order the conditions are declared, each form holding every task under that condition; task
 * orders from the k x k square above when {@code counterbalanceTasks} (the default), else the
 * declared order. Which candidate joins which group is {@link ParallelAllocator}'s.</li>
 * </ul>
 * Williams, E. J. (1949). Experimental designs balanced for the estimation of residual effects of
 * treatments. Australian Journal of Scientific Research, Series A 2, 149-168.
 */
public final class FormDesigner {

    private FormDesigner() {
    }

    /** The forms of the exam, named F01, F02... in design order. */
    public static List<FormSpec> forms(ExamSource exam) {
        List<Task> tasks = exam.tasks();
        List<Condition> conditions = exam.conditions();
        List<FormSpec> forms = new ArrayList<>();
        switch (exam.design().kind()) {
            case CROSSOVER -> {
                int[] fixed = identity(tasks.size());
                for (int[] sequence : williams(conditions.size())) {
                    forms.add(form(exam, forms.size(), fixed, position -> conditions.get(sequence[position])));
                }
            }
            case LATIN_SQUARE -> {
                int shifts = exam.design().rotateConditions() ? conditions.size() : 1;
                for (int[] order : latinSquare(tasks.size())) {
                    for (int shift = 0; shift < shifts; shift++) {
                        int s = shift;
                        forms.add(form(exam, forms.size(), order,
                                position -> conditions.get((position + s) % conditions.size())));
                    }
                }
            }
            case PARALLEL -> {
                for (Condition condition : conditions) {
                    for (int[] order : taskOrders(exam)) {
                        forms.add(form(exam, forms.size(), order, position -> condition));
                    }
                }
            }
        }
        return forms;
    }

    private static FormSpec form(ExamSource exam, int index, int[] order,
            java.util.function.IntFunction<Condition> conditionAt) {
        List<FormSlot> slots = new ArrayList<>();
        for (int position = 0; position < order.length; position++) {
            Task task = exam.tasks().get(order[position]);
            Condition condition = conditionAt.apply(position);
            slots.add(new FormSlot(task.id(), condition.id(), condition.policyFor(task.id())));
        }
        return new FormSpec(String.format("F%02d", index + 1), slots, exam.design().preQuestionnaire(),
                exam.design().postQuestionnaire(), exam.design().sittingLimitSeconds());
    }

    /** Parallel designs: the task orders every condition's group is spread over. */
    static List<int[]> taskOrders(ExamSource exam) {
        int k = exam.tasks().size();
        return exam.design().counterbalanceTasks() && k > 1 ? latinSquare(k) : List.of(identity(k));
    }

    private static int[] identity(int k) {
        int[] order = new int[k];
        for (int i = 0; i < k; i++) {
            order[i] = i;
        }
        return order;
    }

    /**
     * How many consecutive forms (in the order {@link #forms} returns them) make one balanced
     * block: the condition shifts of one task order. Without rotation the whole square is one
     * block, and the leftover balance of {@link FormAssigner} then holds only for cyclic squares.
     * A crossover's block is its whole Williams design; a parallel design's is one group's forms.
     */
    public static int blockSize(ExamSource exam) {
        return switch (exam.design().kind()) {
            case CROSSOVER -> williams(exam.conditions().size()).size();
            case LATIN_SQUARE -> exam.design().rotateConditions() ? exam.conditions().size() : exam.tasks().size();
            case PARALLEL -> taskOrders(exam).size();
        };
    }

    /**
     * The sequences of a Williams design for {@code c} treatments (0-based): for even c the c rows
     * of {@link #latinSquare}'s Williams square; for odd c those rows (built from the same first row
     * 0, 1, c-1, 2, c-2, ...) followed by each row reversed, 2c sequences in all. Every treatment
     * then stands once in each position per square and immediately follows every other treatment
     * equally often (Williams 1949; the same rows as williams() in R's crossdes package).
     */
    public static List<int[]> williams(int c) {
        List<int[]> rows = new ArrayList<>(square(williamsFirstRow(c)));
        if (c % 2 == 1 && c > 1) {
            int square = rows.size();
            for (int r = 0; r < square; r++) {
                int[] reversed = new int[c];
                for (int i = 0; i < c; i++) {
                    reversed[i] = rows.get(r)[c - 1 - i];
                }
                rows.add(reversed);
            }
        }
        return rows;
    }

    private static int[] williamsFirstRow(int k) {
        int[] first = new int[k];
        int low = 1;
        int high = k - 1;
        for (int i = 1; i < k; i++) {
            first[i] = i % 2 == 1 ? low++ : high--;
        }
        return first;
    }

    private static List<int[]> square(int[] first) {
        int k = first.length;
        List<int[]> rows = new ArrayList<>();
        for (int r = 0; r < k; r++) {
            int[] row = new int[k];
            for (int i = 0; i < k; i++) {
                row[i] = (first[i] + r) % k;
            }
            rows.add(row);
        }
        return rows;
    }

    /**
     * Rows of a k x k Latin square of task indexes: Williams' construction for even k (first row
     * 0, 1, k-1, 2, k-2, ..., each later row adds 1 modulo k), the cyclic square for odd k.
     */
    public static List<int[]> latinSquare(int k) {
        return square(k % 2 == 0 ? williamsFirstRow(k) : identity(k));
    }
}
