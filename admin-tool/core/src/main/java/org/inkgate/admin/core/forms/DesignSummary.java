package org.inkgate.admin.core.forms;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.format.bundle.FormSpec;

/**
 * The design in words, before anyone is assigned: what is crossed with what, how many sequences
 * (forms) it has, what it is balanced for, and the stratum size that gives exact balance. The
 * {@code forms} command and the admin window's forms step print the same lines.
 */
public final class DesignSummary {

    private DesignSummary() {
    }

    /** The design's lines for the exam and its generated forms. */
    public static List<String> lines(ExamSource exam, List<FormSpec> forms) {
        ExamSource.Design d = exam.design();
        int k = exam.tasks().size();
        int c = exam.conditions().size();
        String conditions = exam.conditions().stream().map(ExamSource.Condition::id).collect(Collectors.joining(", "));
        List<String> out = new ArrayList<>();
        switch (d.kind()) {
            case CROSSOVER -> {
                out.add("design: crossover (within candidates): " + c + " conditions (" + conditions + ") over " + k
                        + " tasks written in the declared order; every candidate meets every condition once.");
                out.add("condition orders: Williams design, " + forms.size() + " sequences" + (c % 2 == 1 && c > 1
                        ? " (two Latin squares, as " + c + " is odd)" : "") + ": each condition once in every position,"
                        + " each condition directly after every other one equally often (first-order carry-over).");
            }
            case LATIN_SQUARE -> {
                out.add("design: latin-square (within candidates): " + k + " tasks, " + c + " conditions (" + conditions
                        + "); task orders from a " + k + " x " + k + (k % 2 == 0 ? " Williams square (carry-over balanced)"
                        : " cyclic square (position balanced)") + (d.rotateConditions() ? ", conditions rotated over"
                        + " positions" : ", conditions fixed by position") + ": " + forms.size() + " forms.");
                if (c > k) {
                    out.add("note: with more conditions than tasks each candidate meets " + k + " of the " + c
                            + " conditions; condition comparisons then rest partly on different candidates.");
                }
            }
            case PARALLEL -> {
                int orders = FormDesigner.taskOrders(exam).size();
                out.add("design: parallel (between candidates): each candidate sits all " + k + " tasks under one of "
                        + c + " conditions (" + conditions + "), allocation ratio " + ratio(d.allocation())
                        + ", stratified by level" + (d.stratifyBy().isEmpty() ? "" : ", " + String.join(", ",
                        d.stratifyBy())) + ".");
                out.add("forms: " + forms.size() + " = " + c + " groups x " + orders + (orders > 1 ? " task orders (a "
                        + k + " x " + k + " Latin square within each group)" : " task order (the declared order)") + ".");
            }
        }
        int cycle = cycle(exam, forms);
        out.add("exact balance needs every " + (d.kind().betweenCandidates() ? "stratum" : "level") + " to hold a multiple"
                + " of " + cycle + " candidates" + (d.exactBalance() ? " (exactBalance: true, so forms refuses any"
                + " other roster)" : "; other sizes are balanced as nearly as they can be and the counts shown") + ".");
        return out;
    }

    /**
     * The stratum size at which every count is exactly even (within designs: one candidate per
     * form) or exactly at the ratio with every task order equally often (parallel).
     */
    public static int cycle(ExamSource exam, List<FormSpec> forms) {
        if (!exam.design().kind().betweenCandidates()) {
            return forms.size();
        }
        int block = exam.design().allocation().stream().mapToInt(Integer::intValue).sum();
        return block * FormDesigner.taskOrders(exam).size();
    }

    /** A ratio written as the exam source writes it, e.g. {@code 2:1}. */
    public static String ratio(List<Integer> parts) {
        return parts.stream().map(String::valueOf).collect(Collectors.joining(":"));
    }
}
