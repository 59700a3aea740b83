package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.inkgate.analysis.data.Candidate;
import org.inkgate.analysis.descriptive.Descriptives;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.scores.ScoreTable;

/**
 * Candidate background: for each categorical attribute of the candidate table (first language,
 * gender...), scores per group and the same comparisons as for proficiency levels. The comparisons
 * are descriptive (candidates are not assigned to these groups), and small groups are flagged.
 */
final class AttributesSection {

    /**
     * Groups with fewer candidates than this are flagged. Common practice, not a statistical rule:
     * below about ten, a group's mean and SD move a lot with one candidate, and a group may point to
     * the people in it.
     */
    static final int SMALL_GROUP = 10;

    private AttributesSection() {
    }

    static Section build(List<Candidate> candidates, ScoreTable scores, StudyOptions options) {
        Section.Builder s = Section.builder("attributes", "Candidate background");
        List<String> names = Candidate.attributeNames(candidates);
        s.paragraph("Candidates' scores by the groups of each background attribute of the candidate table ("
                + String.join(", ", names) + "), with the same comparisons as for proficiency levels. These comparisons"
                + " are descriptive: candidates were not assigned to these groups, and the groups may differ in other"
                + " ways (level, form, the conditions' order), so a difference describes these candidates and does not"
                + " show that the background causes it.");
        s.paragraph("Groups of fewer than " + SMALL_GROUP + " candidates are flagged (a threshold of common practice,"
                + " not a statistical rule): their means move a lot with one candidate, tests on them have little"
                + " power, and a small group may point to the people in it. Follow the test owner's regulations on"
                + " reporting background groups.");
        s.put("small_group_threshold", SMALL_GROUP);
        Set<String> usedIds = new HashSet<>();
        List<String> conditions = StudyAnalysis.orderedConditions(scores, options);
        List<String> measures = new ArrayList<>();
        measures.add(null);
        measures.addAll(scores.criteria());
        Set<String> scored = new HashSet<>(scores.candidates());
        for (String name : names) {
            String slug = Keys.slug(name);
            while (!usedIds.add(slug)) {
                slug = slug + "_";
            }
            Map<String, String> groupOf = new LinkedHashMap<>();
            TreeSet<String> groups = new TreeSet<>();
            long notGiven = 0;
            for (Candidate c : candidates) {
                String g = c.attributes().get(name);
                if (g != null && !g.isBlank()) {
                    groupOf.put(c.id(), g);
                    if (scored.contains(c.id())) {
                        groups.add(g);
                    }
                } else if (scored.contains(c.id())) {
                    notGiven++;
                }
            }
            Table.Builder t = Table.builder("attribute_" + slug + "_groups", "Scores by " + name + ", per condition")
                    .method("n, mean, SD (n-1), min, max per group", "")
                    .columns("condition", "measure", name, "n", "mean", "SD", "min", "max",
                            "fewer than " + SMALL_GROUP);
            List<String> small = new ArrayList<>();
            for (String condition : conditions) {
                for (String criterion : measures) {
                    String measure = criterion == null ? "overall" : criterion;
                    Map<String, List<Double>> byGroup = new LinkedHashMap<>();
                    groups.forEach(g -> byGroup.put(g, new ArrayList<>()));
                    scores.candidateScores(condition, criterion).forEach((cand, v) -> {
                        String g = groupOf.get(cand);
                        if (g != null) {
                            byGroup.get(g).add(v);
                        }
                    });
                    for (var e : byGroup.entrySet()) {
                        Descriptives d = Descriptives.of(Keys.values(e.getValue()));
                        boolean isSmall = d.n() < SMALL_GROUP;
                        t.row(condition, measure, e.getKey(), (long) d.n(), d.n() == 0 ? null : d.mean(),
                                d.n() < 2 ? null : d.sd(), d.n() == 0 ? null : d.min(), d.n() == 0 ? null : d.max(),
                                isSmall ? "yes" : "no");
                        String k = slug + "." + Keys.slug(condition) + "." + Keys.slug(measure) + "."
                                + Keys.slug(e.getKey()) + ".";
                        s.put(k + "n", d.n()).put(k + "mean", d.mean()).put(k + "sd", d.sd());
                        if (isSmall && criterion == null && !small.contains(e.getKey())) {
                            small.add(e.getKey());
                        }
                    }
                }
            }
            if (notGiven > 0) {
                t.note(notGiven + " candidate(s) with scores have no " + name + " in the candidate table and are left"
                        + " out of these comparisons.");
            }
            t.note(small.isEmpty() ? "No group has fewer than " + SMALL_GROUP + " candidates."
                    : "Groups with fewer than " + SMALL_GROUP + " candidates under a condition (read with care): "
                            + String.join(", ", small) + ".");
            s.table(t.build());
            s.put(slug + ".groups", List.copyOf(groups)).put(slug + ".small_groups", List.copyOf(small))
                    .put(slug + ".not_given", notGiven);
            if (groups.size() < 2) {
                s.paragraph(name + ": " + groups.size() + " group(s) among the scored candidates; comparing needs at"
                        + " least two.");
                continue;
            }
            GroupComparisons.add(s, scores, options, new GroupComparisons.Grouping("attribute_" + slug, slug + ".",
                    "chart_attribute_" + slug + "_means", "group", "groups", name, name + " groups", name,
                    List.copyOf(groups), groupOf));
        }
        return s.build();
    }
}
