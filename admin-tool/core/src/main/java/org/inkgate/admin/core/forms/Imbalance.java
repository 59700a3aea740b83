package org.inkgate.admin.core.forms;

import java.util.List;

/**
 * How far one group's (or several groups') form counts are from even, ranked in the order the
 * assigner cares about: first how many task-by-condition splits are more than one apart (the
 * design exists to separate condition from task), then the largest distance of a first-task or
 * first-condition count from even, then the sum of all squared distances from even.
 *
 * @param taskConditionSplits groups x tasks whose counts under the conditions are not all within 1 of even
 * @param worstOrder          largest |count - even| over the first-task and first-condition margins
 * @param squares             sum of (count - even)^2 over every margin (and over forms, for the whole roster)
 */
record Imbalance(int taskConditionSplits, double worstOrder, double squares) implements Comparable<Imbalance> {

    private static final double EPS = 1e-9;

    static final Imbalance NONE = new Imbalance(0, 0, 0);

    /** The imbalance of one group whose counts per form are {@code x}. */
    static Imbalance of(int[] x, List<BalanceMargins.Margin> margins, boolean withForms) {
        int m = x.length;
        long n = 0;
        for (int v : x) {
            n += v;
        }
        int splits = 0;
        double worst = 0;
        double squares = 0;
        for (BalanceMargins.Margin margin : margins) {
            double[] count = new double[margin.sizes().length];
            for (int f = 0; f < m; f++) {
                count[margin.classOf()[f]] += x[f];
            }
            boolean split = false;
            for (int c = 0; c < count.length; c++) {
                double d = Math.abs(count[c] - (double) n * margin.sizes()[c] / m);
                squares += d * d;
                if (margin.kind() == BalanceMargins.Kind.TASK_CONDITION) {
                    split |= d >= 1 - EPS;
                } else {
                    worst = Math.max(worst, d);
                }
            }
            if (split) {
                splits++;
            }
        }
        if (withForms) {
            for (int v : x) {
                double d = v - (double) n / m;
                squares += d * d;
            }
        }
        return new Imbalance(splits, worst, squares);
    }

    /** Several groups together: splits and squares add up, the worst distance is the largest. */
    Imbalance plus(Imbalance o) {
        return new Imbalance(taskConditionSplits + o.taskConditionSplits, Math.max(worstOrder, o.worstOrder),
                squares + o.squares);
    }

    @Override
    public int compareTo(Imbalance o) {
        if (taskConditionSplits != o.taskConditionSplits) {
            return Integer.compare(taskConditionSplits, o.taskConditionSplits);
        }
        if (Math.abs(worstOrder - o.worstOrder) > EPS) {
            return Double.compare(worstOrder, o.worstOrder);
        }
        if (Math.abs(squares - o.squares) > EPS) {
            return Double.compare(squares, o.squares);
        }
        return 0;
    }
}
