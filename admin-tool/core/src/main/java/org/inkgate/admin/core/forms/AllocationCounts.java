package org.inkgate.admin.core.forms;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.format.bundle.FormSpec;

/**
 * The achieved allocation of a parallel study: candidates per stratum and condition beside each
 * condition's share at the stated ratio, the ratio achieved over all strata, and the candidates
 * per task order within each condition. What {@code forms} and the admin window print for a
 * parallel design in place of {@link AssignmentCounts#lines()}.
 *
 * @param conditions  condition ids in declared order
 * @param ratio       the stated allocation ratio
 * @param byStratum   stratum (values joined with " / ") to candidates per condition (declared order)
 * @param byForm      form id to candidates
 */
public record AllocationCounts(List<String> conditions, List<Integer> ratio, Map<String, int[]> byStratum,
        Map<String, Integer> byForm) {

    /** What the lines call all strata together. */
    public static final String ALL_STRATA = "all strata";

    /** Counts the assignment of {@code candidates} (whose strata it was drawn within). */
    public static AllocationCounts of(Assignment a, List<ParallelAllocator.Candidate> candidates, List<FormSpec> forms,
            List<String> conditions, List<Integer> ratio) {
        Map<String, String> formOf = a.formByCandidate();
        Map<String, String> conditionOfForm = new TreeMap<>();
        forms.forEach(f -> conditionOfForm.put(f.id(), f.slots().get(0).conditionId()));
        Map<String, int[]> byStratum = new TreeMap<>();
        Map<String, Integer> byForm = new TreeMap<>();
        forms.forEach(f -> byForm.put(f.id(), 0));
        for (ParallelAllocator.Candidate c : candidates) {
            String form = formOf.get(c.candidateNumber());
            int condition = conditions.indexOf(conditionOfForm.get(form));
            byStratum.computeIfAbsent(String.join(" / ", c.stratum()), k -> new int[conditions.size()])[condition]++;
            byForm.merge(form, 1, Integer::sum);
        }
        return new AllocationCounts(List.copyOf(conditions), List.copyOf(ratio), byStratum, byForm);
    }

    /** Candidates per condition over all strata, in declared order. */
    public int[] overall() {
        int[] total = new int[conditions.size()];
        byStratum.values().forEach(row -> {
            for (int i = 0; i < row.length; i++) {
                total[i] += row[i];
            }
        });
        return total;
    }

    /** The achieved ratio on the stated ratio's scale (e.g. 2.05:0.95 against 2:1). */
    public double[] achievedRatio() {
        int[] total = overall();
        int n = java.util.Arrays.stream(total).sum();
        int block = ratio.stream().mapToInt(Integer::intValue).sum();
        double[] out = new double[total.length];
        for (int i = 0; i < total.length; i++) {
            out[i] = n == 0 ? 0 : total[i] * (double) block / n;
        }
        return out;
    }

    /** The lines: a stratum x condition table with shares, the achieved ratio, task orders per condition. */
    public List<String> lines(List<FormSpec> forms) {
        List<String> out = new ArrayList<>();
        int width = Math.max(ALL_STRATA.length(), byStratum.keySet().stream().mapToInt(String::length).max().orElse(0)) + 2;
        StringBuilder head = new StringBuilder("  " + pad("stratum", width) + String.format("%11s", "candidates"));
        conditions.forEach(c -> head.append(String.format("%" + (Math.max(c.length(), 6) + 2) + "s", c)));
        out.add("candidates per stratum and condition (share at " + DesignSummary.ratio(ratio) + " in brackets):");
        out.add(head.toString());
        byStratum.forEach((stratum, row) -> out.add(row(stratum, row, width)));
        out.add(row(ALL_STRATA, overall(), width));
        StringBuilder achieved = new StringBuilder("allocation ratio achieved: ");
        double[] r = achievedRatio();
        for (int i = 0; i < r.length; i++) {
            achieved.append(i == 0 ? "" : ":").append(String.format(Locale.ROOT, "%.2f", r[i]));
        }
        out.add(achieved.append(" (stated ").append(DesignSummary.ratio(ratio)).append(')').toString());
        out.add("task orders within each condition (candidates per form):");
        for (String condition : conditions) {
            StringBuilder line = new StringBuilder("  " + condition + ":");
            forms.stream().filter(f -> f.slots().get(0).conditionId().equals(condition))
                    .forEach(f -> line.append("  ").append(f.id()).append('=').append(byForm.get(f.id())));
            out.add(line.toString());
        }
        return out;
    }

    private String row(String stratum, int[] counts, int width) {
        int n = java.util.Arrays.stream(counts).sum();
        int block = ratio.stream().mapToInt(Integer::intValue).sum();
        StringBuilder b = new StringBuilder("  " + pad(stratum, width) + String.format("%11d", n));
        for (int i = 0; i < counts.length; i++) {
            double share = (double) n * ratio.get(i) / block;
            String cell = counts[i] + (Math.abs(share - counts[i]) < 1e-9 ? ""
                    : String.format(Locale.ROOT, " (%.2f)", share));
            b.append(String.format("%" + (Math.max(conditions.get(i).length(), 6) + 2) + "s", cell));
        }
        return b.toString();
    }

    private static String pad(String s, int width) {
        return s + " ".repeat(Math.max(1, width - s.length()));
    }
}
