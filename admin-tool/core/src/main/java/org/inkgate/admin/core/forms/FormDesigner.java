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
 * <li>crossover (2 tasks, 2 conditions): task order fixed, condition order AB and BA (2 forms);</li>
 * <li>latin-square (k tasks, c conditions): task orders from the rows of a k x k Latin square,
 * Williams' design when k is even (each task follows every other task once: balanced for
 * first-order carry-over; Williams, E. J. (1949), Aust. J. Sci. Res. A 2, 149-168 [memory]),
 * a cyclic square when k is odd (balanced for position only); conditions by position, rotated
 * through all c shifts unless rotation is switched off (then c must divide k). Forms are
 * ordered row by row, shifts fastest, so that any c consecutive forms give each task every
 * condition once.</li>
 * </ul>
 */
public final class FormDesigner {

    private FormDesigner() {
    }

    /** The forms of the exam, named F01, F02... in design order. */
    public static List<FormSpec> forms(ExamSource exam) {
        List<Task> tasks = exam.tasks();
        List<Condition> conditions = exam.conditions();
        List<int[]> orders;
        int shifts;
        switch (exam.design().kind()) {
            case CROSSOVER -> {
                orders = List.of(new int[] {0, 1});
                shifts = 2;
            }
            case LATIN_SQUARE -> {
                orders = latinSquare(tasks.size());
                shifts = exam.design().rotateConditions() ? conditions.size() : 1;
            }
            default -> throw new IllegalStateException();
        }
        List<FormSpec> forms = new ArrayList<>();
        for (int[] order : orders) {
            for (int shift = 0; shift < shifts; shift++) {
                List<FormSlot> slots = new ArrayList<>();
                for (int position = 0; position < order.length; position++) {
                    Task task = tasks.get(order[position]);
                    Condition condition = conditions.get((position + shift) % conditions.size());
                    slots.add(new FormSlot(task.id(), condition.id(), condition.policyFor(task.id())));
                }
                forms.add(new FormSpec(String.format("F%02d", forms.size() + 1), slots,
                        exam.design().preQuestionnaire(), exam.design().postQuestionnaire(),
                        exam.design().sittingLimitSeconds()));
            }
        }
        return forms;
    }

    /**
     * How many consecutive forms (in the order {@link #forms} returns them) make one balanced
     * block: the condition shifts of one task order. Without rotation the whole square is one
     * block, and the leftover balance of {@link FormAssigner} then holds only for cyclic squares.
     */
    public static int blockSize(ExamSource exam) {
        return switch (exam.design().kind()) {
            case CROSSOVER -> 2;
            case LATIN_SQUARE -> exam.design().rotateConditions() ? exam.conditions().size() : exam.tasks().size();
        };
    }

    /**
     * Rows of a k x k Latin square of task indexes: Williams' construction for even k (first row
     * 0, 1, k-1, 2, k-2, ..., each later row adds 1 modulo k), the cyclic square for odd k.
     */
    public static List<int[]> latinSquare(int k) {
        int[] first = new int[k];
        if (k % 2 == 0) {
            int low = 1;
            int high = k - 1;
            for (int i = 1; i < k; i++) {
                first[i] = i % 2 == 1 ? low++ : high--;
            }
        } else {
            for (int i = 0; i < k; i++) {
                first[i] = i;
            }
        }
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
}
