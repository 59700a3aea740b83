package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import org.inkgate.analysis.data.Candidate;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;

/** Distributions of survey (e.g. Likert) answers by level. */
final class SurveySection {

    private SurveySection() {
    }

    static Section build(List<Candidate> candidates, List<String> items) {
        Section.Builder s = Section.builder("survey", "Survey answers");
        s.paragraph("Counts of each answer per item and level, from the candidate table's survey items (its numeric"
                + " extra columns; columns declared as attributes are in the candidate background section).");
        TreeSet<Double> answers = new TreeSet<>();
        for (Candidate c : candidates) {
            answers.addAll(c.survey().values());
        }
        List<String> cols = new ArrayList<>(List.of("item", "level", "answered"));
        for (Double a : answers) {
            cols.add("answer " + org.inkgate.analysis.report.NumberFormatting.plain(a));
        }
        cols.add("mean");
        Table.Builder t = Table.builder("survey_distribution", "Survey answers by level")
                .method("counts and means of answers", "")
                .columns(cols.toArray(String[]::new));
        for (String item : items) {
            Map<String, List<Double>> byLevel = new TreeMap<>();
            for (Candidate c : candidates) {
                Double v = c.survey().get(item);
                if (v != null) {
                    byLevel.computeIfAbsent(c.level().isEmpty() ? "(no level)" : c.level(), k -> new ArrayList<>()).add(v);
                }
            }
            for (var e : byLevel.entrySet()) {
                List<Object> row = new ArrayList<>(List.of(item, e.getKey(), (long) e.getValue().size()));
                for (Double a : answers) {
                    row.add(e.getValue().stream().filter(a::equals).count());
                }
                double mean = e.getValue().stream().mapToDouble(Double::doubleValue).average().orElse(Double.NaN);
                row.add(mean);
                t.row(row.toArray());
                s.put(Keys.slug(item) + "." + Keys.slug(e.getKey()) + ".mean", mean)
                        .put(Keys.slug(item) + "." + Keys.slug(e.getKey()) + ".answered", e.getValue().size());
            }
        }
        t.note("The mean treats the answers as equally spaced; for ordinal Likert items read the counts first.");
        s.table(t.build());
        return s.build();
    }
}
