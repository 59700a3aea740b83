package org.inkgate.analysis.mfrm;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.analysis.comparison.IndependentComparison;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.data.StudyDesign;
import org.inkgate.analysis.groups.Groups;
import org.inkgate.analysis.groups.WelchAnova;
import org.inkgate.analysis.report.Column;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;

/**
 * How the many-facet Rasch model treats condition, by design. Within candidates (every candidate
 * under every condition, any number of conditions) condition is a facet crossed with candidates. In
 * parallel groups condition describes the candidates: as a facet it would be confounded with them
 * (each candidate's measure and their condition's measure are not separately identified), so it is
 * taken out of the modelled facets, stays available for bias pairs as a grouping column (condition x
 * rater, condition x task), and the groups are compared on the candidates' measures instead.
 */
public final class ConditionFacet {

    /** The summary word for condition as a modelled facet. */
    public static final String CROSSED = "crossed facet";
    /** The summary word for condition as a description of candidates. */
    public static final String DESCRIBES_CANDIDATES = "describes candidates";
    private static final String CONDITION = "condition";

    private ConditionFacet() {
    }

    /** The options to run: condition taken out of the facets when it describes candidates. */
    public static MfrmOptions adapt(MfrmOptions o, StudyDesign design) {
        if (!describesCandidates(o, design)) {
            return o;
        }
        List<String> facets = new ArrayList<>(o.facets());
        facets.remove(CONDITION);
        if (facets.isEmpty()) {
            throw new MfrmRefusedException(List.of("In a parallel-groups design condition describes the candidates,"
                    + " so it cannot be the only facet beside them: add the facets the ratings cross (task, rater,"
                    + " criterion)"));
        }
        if (o.structure() instanceof ScaleStructure.PartialCredit pc && pc.facet().equals(CONDITION)) {
            throw new MfrmRefusedException(List.of("In a parallel-groups design condition describes the candidates"
                    + " and is not modelled, so it cannot carry a partial-credit structure: use rating-scale or"
                    + " partial credit on a modelled facet"));
        }
        Map<String, Map<String, Double>> anchors = new LinkedHashMap<>(o.elementAnchors());
        anchors.remove(CONDITION);
        return new MfrmOptions(facets, o.structure(), anchors, o.thresholdAnchors(), o.maxLogitChange(),
                o.maxScoreResidual(), o.maxIterations(), o.lengthCorrection(), o.biasPairs(), o.biasEstimation(),
                o.unexpectedZ(), o.unexpectedLimit(), o.threads());
    }

    /** True when the options model condition and the data are parallel groups. */
    public static boolean describesCandidates(MfrmOptions o, StudyDesign design) {
        return o.facets().contains(CONDITION) && design.found() == StudyDesign.Kind.PARALLEL;
    }

    /**
     * The section with a paragraph on how condition was treated and, for parallel groups, the condition
     * groups compared on the candidates' measures.
     */
    public static Section annotate(Section s, MfrmOptions asked, StudyDesign design, MfrmResult r,
            List<Rating> ratings) {
        if (!asked.facets().contains(CONDITION)) {
            return s;
        }
        Section.Builder b = Section.builder(s.id(), s.title());
        List<String> paragraphs = new ArrayList<>(s.paragraphs());
        String treatment;
        String text;
        if (describesCandidates(asked, design)) {
            treatment = DESCRIBES_CANDIDATES;
            text = "Condition: each candidate wrote under one condition (parallel groups), so condition describes"
                    + " the candidates and is not modelled as a facet (it would be confounded with them). The"
                    + " conditions are compared below on the candidates' measures; bias pairs may still name"
                    + " condition.";
        } else {
            treatment = CROSSED;
            text = "Condition: modelled as a facet crossed with candidates (" + design.conditions().size()
                    + " conditions" + (design.found() == StudyDesign.Kind.WITHIN ? ", every candidate under each"
                            : "; the data fit no single design, see the condition comparison") + ").";
        }
        paragraphs.add(Math.min(2, paragraphs.size()), text);
        paragraphs.forEach(b::paragraph);
        List<Table> tables = new ArrayList<>(s.tables());
        if (treatment.equals(DESCRIBES_CANDIDATES) && r != null) {
            tables.add(Math.min(1, tables.size()), groupTable(r, ratings, b));
        }
        tables.forEach(b::table);
        s.charts().forEach(b::chart);
        s.summary().forEach((k, v) -> b.put(k.substring(s.id().length() + 1), v));
        b.put("condition_treatment", treatment);
        return b.build();
    }

    private static Table groupTable(MfrmResult r, List<Rating> ratings, Section.Builder s) {
        Map<String, String> conditionOf = new HashMap<>();
        ratings.forEach(x -> conditionOf.put(x.candidate(), x.condition()));
        Map<String, List<Double>> byCondition = new TreeMap<>();
        for (MfrmResult.Element e : r.facets().get(0).elements()) {
            String c = conditionOf.get(e.label());
            if (c != null && !Double.isNaN(e.measure())) {
                byCondition.computeIfAbsent(c, k -> new ArrayList<>()).add(e.measure());
            }
        }
        Table.Builder t = Table.builder("mfrm_condition_groups", "Candidates' measures by condition group")
                .method("candidate measures (logits) summarised per condition; with two groups Welch's t-test on"
                        + " the measures, with three or more Welch's ANOVA", "Welch 1947; Welch 1951")
                .columns(Column.of("condition"), Column.of("candidates"), Column.of("mean measure"),
                        Column.of("SD"));
        for (Map.Entry<String, List<Double>> e : byCondition.entrySet()) {
            double[] v = e.getValue().stream().mapToDouble(Double::doubleValue).toArray();
            double mean = java.util.Arrays.stream(v).average().orElse(Double.NaN);
            double ss = java.util.Arrays.stream(v).map(x -> (x - mean) * (x - mean)).sum();
            t.row(e.getKey(), (long) v.length, mean, v.length > 1 ? Math.sqrt(ss / (v.length - 1)) : null);
            s.put("condition_groups." + e.getKey().replaceAll("[^A-Za-z0-9]+", "_").toLowerCase(java.util.Locale.ROOT)
                    + ".mean_measure", mean);
        }
        List<double[]> groups = byCondition.values().stream()
                .map(l -> l.stream().mapToDouble(Double::doubleValue).toArray()).toList();
        if (groups.size() == 2 && groups.get(0).length > 1 && groups.get(1).length > 1) {
            List<String> names = List.copyOf(byCondition.keySet());
            IndependentComparison c = IndependentComparison.of(groups.get(1), groups.get(0), 0.95);
            t.note("Welch's t-test, " + names.get(1) + " minus " + names.get(0) + ": difference "
                    + String.format(java.util.Locale.ROOT, "%.3f logits, 95%% CI %.3f to %.3f, t = %.3f, df = %.1f,"
                            + " p = %.4f", c.difference(), c.welchLower(), c.welchUpper(), c.welchT(), c.welchDf(),
                            c.welchP()) + ".");
            s.put("condition_groups.welch_p", c.welchP()).put("condition_groups.difference", c.difference());
        } else if (groups.size() > 2 && groups.stream().allMatch(g -> g.length > 1)) {
            WelchAnova w = WelchAnova.of(new Groups(List.copyOf(byCondition.keySet()), groups));
            t.note("Welch's ANOVA across the " + groups.size() + " groups: " + String.format(java.util.Locale.ROOT,
                    "F = %.3f, df = %.0f and %.1f, p = %.4f", w.f(), w.df1(), w.df2(), w.p()) + ".");
            s.put("condition_groups.welch_anova_f", w.f()).put("condition_groups.welch_anova_p", w.p());
        }
        t.note("The measures carry their own estimation error, so this comparison is somewhat conservative. Extreme"
                + " candidates' measures are estimated outside the joint model (see their status).");
        return t.build();
    }
}
