package org.inkgate.admin.core.forms;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SortedSet;
import java.util.TreeMap;
import java.util.TreeSet;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;

/**
 * The counts a test owner checks after assigning forms: candidates per level and form, and, per
 * level and over all levels, the task written first, the condition met first and the candidates
 * per task and condition (which show whether the condition is separable from the task and from
 * the order of writing). The command line and the admin window print the same {@link #lines()}.
 *
 * @param byLevel            level to form id to candidates
 * @param byTaskAndCondition task id to condition id to candidates, over all levels
 * @param conditions         every condition id seen, sorted
 * @param balanceByLevel     level to its balance counts
 * @param balanceOverall     the balance counts over all levels
 */
public record AssignmentCounts(Map<String, Map<String, Integer>> byLevel,
        Map<String, Map<String, Integer>> byTaskAndCondition, SortedSet<String> conditions,
        Map<String, Balance> balanceByLevel, Balance balanceOverall) {

    /** What the lines call the whole roster. */
    public static final String ALL_LEVELS = "all levels";

    /**
     * The order and condition counts of one group of candidates.
     *
     * @param candidates     candidates in the group
     * @param firstTask      task id to candidates who write it first
     * @param firstCondition condition id to candidates who meet it first
     * @param taskCondition  task id to condition id to candidates who write the task under it
     * @param evenFirstTask      task id to its even share of first places (may be fractional)
     * @param evenFirstCondition condition id to its even share of first places
     * @param evenTaskCondition  task id to condition id to its even share
     */
    public record Balance(int candidates, Map<String, Integer> firstTask, Map<String, Integer> firstCondition,
            Map<String, Map<String, Integer>> taskCondition, Map<String, Double> evenFirstTask,
            Map<String, Double> evenFirstCondition, Map<String, Map<String, Double>> evenTaskCondition) {

        /** Largest |count - even| of first task, first condition and task x condition, in that order. */
        public double[] largestDistances() {
            return new double[] {distance(firstTask, evenFirstTask), distance(firstCondition, evenFirstCondition),
                taskCondition.keySet().stream().mapToDouble(t -> distance(taskCondition.get(t),
                        evenTaskCondition.get(t))).max().orElse(0)};
        }

        private static double distance(Map<String, Integer> counts, Map<String, Double> even) {
            return even.entrySet().stream().mapToDouble(e -> Math.abs(counts.getOrDefault(e.getKey(), 0) - e.getValue()))
                    .max().orElse(0);
        }
    }

    /** Counts the assignment over the forms it was made for. */
    public static AssignmentCounts of(Assignment a, List<FormSpec> forms) {
        Map<String, Map<String, Integer>> byLevel = new TreeMap<>();
        Map<String, List<FormSpec>> members = new TreeMap<>();
        Map<String, FormSpec> byId = new TreeMap<>();
        forms.forEach(f -> byId.put(f.id(), f));
        List<FormSpec> all = new ArrayList<>();
        for (Assignment.Row r : a.rows()) {
            byLevel.computeIfAbsent(r.level(), k -> new TreeMap<>()).merge(r.formId(), 1, Integer::sum);
            members.computeIfAbsent(r.level(), k -> new ArrayList<>()).add(byId.get(r.formId()));
            all.add(byId.get(r.formId()));
        }
        TreeSet<String> conditions = new TreeSet<>();
        forms.forEach(f -> f.slots().forEach(s -> conditions.add(s.conditionId())));
        Map<String, Balance> balance = new LinkedHashMap<>();
        members.forEach((level, sat) -> balance.put(level, balance(sat, forms)));
        Balance overall = balance(all, forms);
        return new AssignmentCounts(byLevel, overall.taskCondition(), conditions, balance, overall);
    }

    private static Balance balance(List<FormSpec> sat, List<FormSpec> forms) {
        Map<String, Integer> firstTask = new TreeMap<>();
        Map<String, Integer> firstCondition = new TreeMap<>();
        Map<String, Map<String, Integer>> cells = new TreeMap<>();
        for (FormSpec f : forms) {
            firstTask.put(f.slots().get(0).taskId(), 0);
            firstCondition.put(f.slots().get(0).conditionId(), 0);
            for (FormSlot s : f.slots()) {
                cells.computeIfAbsent(s.taskId(), k -> new TreeMap<>()).put(s.conditionId(), 0);
            }
        }
        Map<String, Double> evenTask = share(firstTask.keySet(), forms, sat.size(), f -> f.slots().get(0).taskId());
        Map<String, Double> evenCondition = share(firstCondition.keySet(), forms, sat.size(),
                f -> f.slots().get(0).conditionId());
        Map<String, Map<String, Double>> evenCells = new TreeMap<>();
        cells.forEach((task, byCondition) -> evenCells.put(task, share(byCondition.keySet(), forms, sat.size(),
                f -> f.slots().stream().filter(s -> s.taskId().equals(task)).findFirst().orElseThrow().conditionId())));
        for (FormSpec f : sat) {
            firstTask.merge(f.slots().get(0).taskId(), 1, Integer::sum);
            firstCondition.merge(f.slots().get(0).conditionId(), 1, Integer::sum);
            for (FormSlot s : f.slots()) {
                cells.get(s.taskId()).merge(s.conditionId(), 1, Integer::sum);
            }
        }
        return new Balance(sat.size(), firstTask, firstCondition, cells, evenTask, evenCondition, evenCells);
    }

    /** n x (forms with the label) / (all forms), per label. */
    private static Map<String, Double> share(java.util.Set<String> labels, List<FormSpec> forms, int n,
            java.util.function.Function<FormSpec, String> label) {
        Map<String, Double> out = new TreeMap<>();
        for (String l : labels) {
            long with = forms.stream().filter(f -> label.apply(f).equals(l)).count();
            out.put(l, (double) n * with / forms.size());
        }
        return out;
    }

    /** Candidates of {@code level} on form {@code formId}. */
    public int count(String level, String formId) {
        return byLevel.getOrDefault(level, Map.of()).getOrDefault(formId, 0);
    }

    /**
     * The balance as text lines (first task and first condition per level and over all levels,
     * task x condition over all levels and per level, the largest distance from an even split).
     */
    public List<String> lines() {
        List<String> out = new ArrayList<>();
        Map<String, Balance> groups = new LinkedHashMap<>(balanceByLevel);
        table(out, "first task (candidates who write it first):", groups, Balance::firstTask);
        table(out, "first condition (candidates who meet it first):", groups, Balance::firstCondition);
        out.add("task x condition (candidates):");
        balanceOverall.taskCondition().forEach((task, byCondition) -> out.add("  " + cells(task, byCondition)));
        out.add("task x condition per level:");
        balanceByLevel.forEach((level, b) -> out.add("  " + level + "   " + String.join("   ",
                b.taskCondition().entrySet().stream().map(e -> cells(e.getKey(), e.getValue())).toList())));
        String[] what = {"first task", "first condition", "task x condition"};
        StringBuilder worst = new StringBuilder("largest distance from an even split:");
        for (int k = 0; k < what.length; k++) {
            double most = -1;
            List<String> where = new ArrayList<>();
            Map<String, Balance> scopes = new LinkedHashMap<>(balanceByLevel);
            scopes.put(ALL_LEVELS, balanceOverall);
            for (Map.Entry<String, Balance> e : scopes.entrySet()) {
                double d = e.getValue().largestDistances()[k];
                if (d > most + 1e-9) {
                    most = d;
                    where.clear();
                }
                if (Math.abs(d - most) <= 1e-9) {
                    where.add(e.getKey());
                }
            }
            worst.append(k == 0 ? " " : "; ").append(what[k]).append(' ').append(number(most))
                    .append(most > 1e-9 ? " (" + String.join(", ", where) + ")" : "");
        }
        out.add(worst.toString());
        return out;
    }

    private static String cells(String task, Map<String, Integer> byCondition) {
        StringBuilder b = new StringBuilder(task + ":");
        byCondition.forEach((c, n) -> b.append("  ").append(c).append('=').append(n));
        return b.toString();
    }

    private void table(List<String> out, String title, Map<String, Balance> groups,
            java.util.function.Function<Balance, Map<String, Integer>> column) {
        out.add(title);
        List<String> heads = new ArrayList<>(column.apply(balanceOverall).keySet());
        int first = Math.max(ALL_LEVELS.length(), groups.keySet().stream().mapToInt(String::length).max().orElse(0)) + 2;
        StringBuilder head = new StringBuilder("  " + pad("group", first));
        heads.forEach(h -> head.append(String.format(Locale.ROOT, "%" + (h.length() + 2) + "s", h)));
        out.add(head.toString().stripTrailing());
        Map<String, Balance> rows = new LinkedHashMap<>(groups);
        rows.put(ALL_LEVELS, balanceOverall);
        rows.forEach((name, b) -> {
            StringBuilder row = new StringBuilder("  " + pad(name, first));
            heads.forEach(h -> row.append(String.format(Locale.ROOT, "%" + (h.length() + 2) + "d",
                    column.apply(b).getOrDefault(h, 0))));
            out.add(row.toString());
        });
    }

    private static String pad(String s, int width) {
        return s + " ".repeat(Math.max(1, width - s.length()));
    }

    private static String number(double d) {
        return Math.abs(d - Math.rint(d)) < 1e-9 ? Long.toString(Math.round(d))
                : String.format(Locale.ROOT, "%.2f", d);
    }
}
