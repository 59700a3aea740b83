package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import org.inkgate.analysis.data.QuestionnaireAnswer;
import org.inkgate.analysis.data.QuestionnaireData;
import org.inkgate.analysis.data.QuestionnaireItem;
import org.inkgate.analysis.data.ToolUse;
import org.inkgate.analysis.raters.Correlation;
import org.inkgate.analysis.report.Chart;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.jfree.data.category.DefaultCategoryDataset;

/**
 * The questionnaire answers the candidates gave in the client: Likert distributions (counts per
 * point, as a table and a chart per item) and descriptives (n, mean, SD with n - 1, median) by
 * the conditions sat and level; free-text answers listed per item; and each Likert item against
 * the candidate's number of uses of each tool (Spearman's rho with n and the t-approximation
 * p-value, Spearman 1904; as R's {@code cor.test(exact = FALSE)}).
 */
public final class QuestionnaireSection {

    public static final String ID = "questionnaire";
    private static final String NO_LEVEL = "(no level)";
    private static final String NONE = "(none)";
    private static final String ALL = "all";

    private QuestionnaireSection() {
    }

    /** The section over the questionnaire input and the tool-use table (empty when tool use is not known). */
    public static Section build(QuestionnaireData data, List<ToolUse> toolUse) {
        Section.Builder s = Section.builder(ID, "Questionnaire answers");
        s.paragraph("Answers to the questionnaires the client asked, one per candidate and item; an item left"
                + " unanswered counts as asked, not answered. Groups: the conditions a candidate sat, in the order sat"
                + " (in a crossover every candidate sat every condition, so a questionnaire after the tasks compares"
                + " condition orders, not conditions), and the level.");
        s.paragraph("Likert answers are ordinal: read the counts first. The mean and SD treat the points as equally"
                + " spaced; the median does not.");
        Map<String, List<QuestionnaireAnswer>> byItem = new LinkedHashMap<>();
        for (QuestionnaireAnswer a : data.answers()) {
            byItem.computeIfAbsent(key(a.questionnaire(), a.item()), k -> new ArrayList<>()).add(a);
        }
        List<QuestionnaireItem> items = new ArrayList<>(data.items());
        for (QuestionnaireAnswer a : data.answers()) {
            String k = key(a.questionnaire(), a.item());
            if (items.stream().noneMatch(i -> key(i.questionnaire(), i.id()).equals(k))) {
                items.add(new QuestionnaireItem(a.questionnaire(), a.item(), "", QuestionnaireItem.Kind.UNDEFINED, null));
            }
        }
        s.put("items", items.size())
                .put("candidates", data.answers().stream().map(QuestionnaireAnswer::candidate).distinct().count());
        int maxPoints = items.stream().mapToInt(QuestionnaireItem::points).max().orElse(0);
        s.table(itemTable(items));
        Table.Builder counts = countsTable(maxPoints);
        Table.Builder descriptives = Table.builder("questionnaire_likert_descriptives", "Likert answers: descriptives")
                .method("n answering, mean, SD (n - 1) and median of the points (1 = the lowest label)", "")
                .columns("questionnaire", "item", "conditions", "level", "n", "mean", "SD", "median");
        Table.Builder texts = Table.builder("questionnaire_free_text", "Free-text answers")
                .method("every answer as the candidate wrote it, per item", "")
                .columns("questionnaire", "item", "candidate", "level", "conditions", "answer");
        Table.Builder use = Table.builder("questionnaire_tool_use", "Likert answers against tool use")
                .method("Spearman's rho between a candidate's answer and their number of uses of the tool (summed over"
                        + " their responses) over candidates offered the tool who answered; p from the t approximation",
                        "Spearman 1904")
                .columns("questionnaire", "item", "tool", "candidates", "Spearman rho", "p");
        Map<String, Map<String, Long>> usesByTool = usesByTool(toolUse);
        for (QuestionnaireItem item : items) {
            List<QuestionnaireAnswer> answers = byItem.getOrDefault(key(item.questionnaire(), item.id()), List.of());
            String k = Keys.slug(item.questionnaire()) + "." + Keys.slug(item.id()) + ".";
            if (item.kind() == QuestionnaireItem.Kind.LIKERT) {
                likert(s, k, item, answers, maxPoints, counts, descriptives);
                toolUse(s, k, item, answers, usesByTool, use);
            } else {
                long answered = answers.stream().filter(QuestionnaireAnswer::answered).count();
                s.put(k + ALL + ".asked", answers.size()).put(k + ALL + ".answered", answered);
                for (QuestionnaireAnswer a : answers) {
                    if (a.answered()) {
                        texts.row(item.questionnaire(), item.id(), a.candidate(), level(a), conditions(a), a.answer());
                    }
                }
                if (item.kind() == QuestionnaireItem.Kind.UNDEFINED) {
                    texts.note("Item " + item.id() + " of " + item.questionnaire() + " has no definition in the input"
                            + " (kind and scale unknown): its answers are listed as stored. With a results store, run"
                            + " collect again with the exam's bundle to register it.");
                }
            }
        }
        counts.note("Groups: 'all' is every candidate asked; then by conditions sat, by level, and by both.");
        s.table(counts.build());
        s.table(descriptives.build());
        if (!texts.isEmpty()) {
            texts.note("Free text is shown exactly as written (escaped in the HTML); it may name people or places:"
                    + " handle it under your data-protection rules.");
            s.table(texts.build());
        }
        if (!use.isEmpty()) {
            use.note("A correlation over few candidates, not an effect: it does not show that using a tool changes how"
                    + " candidates answer (or the reverse), and with few candidates it is unstable; report it with its n.");
            s.table(use.build());
        }
        return s.build();
    }

    private static Table itemTable(List<QuestionnaireItem> items) {
        Table.Builder t = Table.builder("questionnaire_items", "Questionnaire items")
                .method("as defined in the exam (the bundle the candidates sat)", "")
                .columns("questionnaire", "item", "kind", "scale", "text");
        for (QuestionnaireItem i : items) {
            List<String> scale = new ArrayList<>();
            for (int p = 1; p <= i.points(); p++) {
                scale.add(p + " = " + i.labels().get(p - 1));
            }
            t.row(i.questionnaire(), i.id(), switch (i.kind()) {
                case LIKERT -> "Likert (" + i.points() + " points)";
                case FREE_TEXT -> "free text";
                case UNDEFINED -> "no definition";
            }, String.join("; ", scale), i.text());
        }
        return t.build();
    }

    private static Table.Builder countsTable(int maxPoints) {
        List<String> cols = new ArrayList<>(List.of("questionnaire", "item", "conditions", "level", "asked", "answered"));
        for (int p = 1; p <= maxPoints; p++) {
            cols.add("point " + p);
        }
        return Table.builder("questionnaire_likert_counts", "Likert answers: counts per point")
                .method("counts of each point among the candidates asked (points above an item's scale left empty)", "")
                .columns(cols.toArray(String[]::new));
    }

    private static void likert(Section.Builder s, String k, QuestionnaireItem item, List<QuestionnaireAnswer> answers,
            int maxPoints, Table.Builder counts, Table.Builder descriptives) {
        DefaultCategoryDataset chart = new DefaultCategoryDataset();
        for (var g : groups(answers).entrySet()) {
            Group group = g.getValue();
            int[] count = new int[item.points() + 1];
            List<Double> values = new ArrayList<>();
            for (QuestionnaireAnswer a : group.answers) {
                if (a.answered()) {
                    int point = point(item, a);
                    count[point]++;
                    values.add((double) point);
                }
            }
            String gk = k + g.getKey() + ".";
            List<Object> row = new ArrayList<>(List.of(item.questionnaire(), item.id(), group.conditions, group.level,
                    (long) group.answers.size(), (long) values.size()));
            s.put(gk + "asked", group.answers.size()).put(gk + "answered", values.size());
            for (int p = 1; p <= maxPoints; p++) {
                row.add(p <= item.points() ? (Object) (long) count[p] : "");
                if (p <= item.points()) {
                    s.put(gk + "count." + p, count[p]);
                }
            }
            counts.row(row.toArray());
            double[] v = Keys.values(values);
            double mean = mean(v), sd = sd(v), median = median(v);
            descriptives.row(item.questionnaire(), item.id(), group.conditions, group.level, (long) v.length, mean, sd,
                    median);
            s.put(gk + "mean", mean).put(gk + "sd", sd).put(gk + "median", median);
            if (group.level.equals(ALL)) {
                for (int p = 1; p <= item.points(); p++) {
                    chart.addValue(count[p], group.conditions.equals(ALL) ? "all candidates" : group.conditions,
                            p + " " + item.labels().get(p - 1));
                }
            }
        }
        s.chart(Chart.of("chart_questionnaire_" + Keys.slug(item.questionnaire()) + "_" + Keys.slug(item.id()),
                item.id() + " (" + item.questionnaire() + "): answers per point",
                "Counts of each point, all candidates asked and by the conditions they sat (in the order sat)."
                        + (item.text().isEmpty() ? "" : " Item: " + item.text()),
                countChart(chart), 760, 380));
    }

    /** Bars of counts: whole-number ticks, and labels wrapped rather than cut short. */
    private static org.jfree.chart.JFreeChart countChart(DefaultCategoryDataset data) {
        org.jfree.chart.JFreeChart chart = Charts.bars("answer", "candidates", data);
        var plot = chart.getCategoryPlot();
        plot.getDomainAxis().setMaximumCategoryLabelLines(3);
        ((org.jfree.chart.axis.NumberAxis) plot.getRangeAxis()).setStandardTickUnits(
                org.jfree.chart.axis.NumberAxis.createIntegerTickUnits());
        return chart;
    }

    private static void toolUse(Section.Builder s, String k, QuestionnaireItem item, List<QuestionnaireAnswer> answers,
            Map<String, Map<String, Long>> usesByTool, Table.Builder table) {
        for (var tool : usesByTool.entrySet()) {
            List<Double> x = new ArrayList<>(), y = new ArrayList<>();
            for (QuestionnaireAnswer a : answers) {
                Long uses = tool.getValue().get(a.candidate());
                if (a.answered() && uses != null) {
                    x.add((double) point(item, a));
                    y.add((double) uses);
                }
            }
            Correlation rho = Correlation.spearman(Keys.values(x), Keys.values(y));
            table.row(item.questionnaire(), item.id(), tool.getKey(), (long) x.size(), rho.r(), rho.p());
            rho.cautions().forEach(c -> table.note(item.id() + ", " + tool.getKey() + ": " + c));
            String tk = k + "tool." + Keys.slug(tool.getKey()) + ".";
            s.put(tk + "n", x.size()).put(tk + "spearman_rho", rho.r()).put(tk + "p", rho.p());
        }
    }

    /** Tool to candidate to uses summed over the candidate's responses; "all tools" when there are several. */
    private static Map<String, Map<String, Long>> usesByTool(List<ToolUse> toolUse) {
        Map<String, Map<String, Long>> out = new TreeMap<>();
        Map<String, Long> all = new HashMap<>();
        for (ToolUse u : toolUse) {
            out.computeIfAbsent(u.tool(), t -> new HashMap<>()).merge(u.candidate(), u.uses(), Long::sum);
            all.merge(u.candidate(), u.uses(), Long::sum);
        }
        if (out.size() > 1) {
            out.put("all tools", all);
        }
        return out;
    }

    /** The candidates asked, per group: all, each conditions value, each level, each conditions x level. */
    private static Map<String, Group> groups(List<QuestionnaireAnswer> answers) {
        Map<String, Group> g = new LinkedHashMap<>();
        TreeSet<String> conds = new TreeSet<>(), levels = new TreeSet<>();
        answers.forEach(a -> {
            conds.add(conditions(a));
            levels.add(level(a));
        });
        g.put(ALL, new Group(ALL, ALL, answers));
        for (String c : conds) {
            g.put("condition." + Keys.slug(c), new Group(c, ALL, answers.stream().filter(a -> conditions(a).equals(c))
                    .toList()));
        }
        for (String l : levels) {
            g.put("level." + Keys.slug(l), new Group(ALL, l, answers.stream().filter(a -> level(a).equals(l)).toList()));
        }
        for (String c : conds) {
            for (String l : levels) {
                List<QuestionnaireAnswer> in = answers.stream().filter(a -> conditions(a).equals(c) && level(a).equals(l))
                        .toList();
                if (!in.isEmpty()) {
                    g.put("condition." + Keys.slug(c) + ".level." + Keys.slug(l), new Group(c, l, in));
                }
            }
        }
        return g;
    }

    private record Group(String conditions, String level, List<QuestionnaireAnswer> answers) {
    }

    private static int point(QuestionnaireItem item, QuestionnaireAnswer a) {
        try {
            int p = Integer.parseInt(a.answer());
            if (p >= 1 && p <= item.points()) {
                return p;
            }
        } catch (NumberFormatException e) {
            // said below
        }
        throw new IllegalArgumentException("candidate " + a.candidate() + " answered Likert item " + item.id() + " of "
                + item.questionnaire() + " with '" + a.answer() + "', which is not a point from 1 to " + item.points());
    }

    private static String key(String questionnaire, String item) {
        return questionnaire + '\u0000' + item;
    }

    private static String level(QuestionnaireAnswer a) {
        return a.level().isEmpty() ? NO_LEVEL : a.level();
    }

    private static String conditions(QuestionnaireAnswer a) {
        return a.conditions().isEmpty() ? NONE : a.conditions();
    }

    private static double mean(double[] v) {
        return v.length == 0 ? Double.NaN : Arrays.stream(v).sum() / v.length;
    }

    private static double sd(double[] v) {
        if (v.length < 2) {
            return Double.NaN;
        }
        double m = mean(v), ss = 0;
        for (double x : v) {
            ss += (x - m) * (x - m);
        }
        return Math.sqrt(ss / (v.length - 1));
    }

    private static double median(double[] v) {
        if (v.length == 0) {
            return Double.NaN;
        }
        double[] s = v.clone();
        Arrays.sort(s);
        int h = s.length / 2;
        return s.length % 2 == 1 ? s[h] : (s[h - 1] + s[h]) / 2;
    }
}
