package org.inkgate.analysis.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.data.CandidatesReader;
import org.inkgate.analysis.data.InputRejected;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.report.Report;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.report.Table;
import org.inkgate.analysis.testutil.ReferenceData;
import org.junit.jupiter.api.Test;

/**
 * Categorical candidate attributes through the candidate-table reader and the whole analysis, checked
 * against R 4.2.2 (r-base-core) and car 3.1-1 (r-cran-car) on a subset of ToothGrowth (Crampton 1947):
 * script and output in src/test/resources/reference/r_attributes.R and r_attributes.txt. Each guinea pig
 * pair is a "candidate" with the two supplements as conditions and the dose (0.5, 1, 2: numbers declared
 * as group names) as its attribute; the first 10, 8 and 6 pairs of the doses are kept.
 */
class AttributesSectionTest {

    private static final double TOL = 1e-9;

    /** The ratings (one rater, one criterion: a candidate's score is the value) and the candidate table text. */
    private static StudyData study() throws Exception {
        Map<String, Integer> keep = Map.of("0.5", 10, "1", 8, "2", 6);
        Map<String, Integer> seen = new HashMap<>();
        List<Rating> ratings = new ArrayList<>();
        StringBuilder table = new StringBuilder("candidate,level,dose,help\n");
        for (Map<String, String> row : ReferenceData.rows("ToothGrowth.csv")) {
            String dose = row.get("dose");
            int pair = seen.merge(row.get("supp") + "/" + dose, 1, Integer::sum);
            if (pair > keep.get(dose)) {
                continue;
            }
            String candidate = "d" + dose + "-" + pair;
            String task = row.get("supp").equals("OJ") ? "t1" : "t2";
            ratings.add(new Rating(candidate, "", "", task, row.get("supp"), "r1", "overall",
                    Double.parseDouble(row.get("len"))));
            if (row.get("supp").equals("OJ")) {
                table.append(candidate).append(",B1,").append(dose).append(",").append(pair % 5 + 1).append('\n');
            }
        }
        CandidatesReader.Result c = CandidatesReader.read("candidates.csv", new StringReader(table.toString()),
                List.of("dose"));
        assertEquals(List.of("help"), c.items(), "undeclared columns stay numeric survey items");
        assertEquals(List.of("dose"), c.attributes());
        return new StudyData(ratings, c.candidates(), c.items(), List.of(), List.of());
    }

    private static Section section(Report r) {
        return r.sections().stream().filter(s -> s.id().equals("attributes")).findFirst().orElseThrow();
    }

    private static Table table(Section s, String id) {
        return s.tables().stream().filter(t -> t.id().equals(id)).findFirst().orElseThrow();
    }

    private static double num(Map<String, Object> summary, String key) {
        Object v = summary.get(key);
        assertTrue(v instanceof Number, key + " = " + v);
        return ((Number) v).doubleValue();
    }

    private static Object cell(Table t, String column, String... match) {
        int c = t.columns().indexOf(column);
        for (List<Object> row : t.rows()) {
            boolean ok = true;
            for (int i = 0; i < match.length; i += 2) {
                ok &= String.valueOf(row.get(t.columns().indexOf(match[i]))).equals(match[i + 1]);
            }
            if (ok) {
                return row.get(c);
            }
        }
        throw new AssertionError("no row " + List.of(match) + " in " + t.id());
    }

    @Test
    void doseGroups_descriptivesAnovaWelchTukeyAndInteraction_matchR() throws Exception {
        Section s = section(StudyAnalysis.report(study(), StudyOptions.DEFAULT));
        Map<String, Object> m = s.summary();
        String p = "attributes.dose.";
        // r_attributes.txt: group lines (R mean, sd)
        assertEquals(13.23, num(m, p + "oj.overall.0_5.mean"), TOL);
        assertEquals(4.45970851065403, num(m, p + "oj.overall.0_5.sd"), 1e-12);
        assertEquals(8, num(m, p + "oj.overall.1.n"), 0);
        assertEquals(26.7333333333333, num(m, p + "vc.overall.2.mean"), 1e-12);
        assertEquals(5.72456694140846, num(m, p + "vc.overall.2.sd"), 1e-12);
        // anova lines (R aov)
        assertEquals(28.8060044288835, num(m, p + "oj.overall.f"), 1e-10);
        assertEquals(9.56465266200703e-07, num(m, p + "oj.overall.p"), 1e-15);
        assertEquals(0.732865241518056, num(m, p + "oj.overall.eta_squared"), 1e-12);
        assertEquals(49.4989394958834, num(m, p + "vc.overall.f"), 1e-10);
        assertEquals(1.12714583832121e-08, num(m, p + "vc.overall.p"), 1e-16);
        // welch lines (R oneway.test, var.equal = FALSE)
        assertEquals(24.0525318982943, num(m, p + "oj.overall.welch_f"), 1e-10);
        assertEquals(13.0804733488231, num(m, p + "oj.overall.welch_df2"), 1e-10);
        assertEquals(4.14835438839575e-05, num(m, p + "oj.overall.welch_p"), 1e-12);
        assertEquals(38.949879149189, num(m, p + "vc.overall.welch_f"), 1e-10);
        assertEquals(1.17400422163994e-05, num(m, p + "vc.overall.welch_p"), 1e-12);
        // brown_forsythe lines (car::leveneTest, center = median)
        Table anova = table(s, "attribute_dose_anova");
        assertEquals(0.0902552892437845, (Double) cell(anova, "Brown-Forsythe p", "condition", "OJ", "measure", "overall"),
                1e-12);
        assertEquals(0.147222295784248, (Double) cell(anova, "Brown-Forsythe p", "condition", "VC", "measure", "overall"),
                1e-12);
        // tukey lines (R TukeyHSD: Tukey-Kramer with unequal n); p to the studentized range's ~1e-9
        assertEquals(9.92, num(m, p + "oj.overall.1_vs_0_5.difference"), 1e-12);
        assertEquals(0.384733965653865, num(m, p + "oj.overall.2_vs_1.tukey_p"), 1e-8);
        assertEquals(0.000172854401037315, num(m, p + "vc.overall.1_vs_0_5.tukey_p"), 1e-8);
        Table post = table(s, "attribute_dose_posthoc");
        assertEquals(-2.25692368626003, (Double) cell(post, "Tukey lower", "condition", "OJ", "group A", "1", "group B", "2"),
                1e-6);
        assertEquals(23.5305833644605, (Double) cell(post, "Tukey upper", "condition", "VC", "group A", "0.5", "group B",
                "2"), 1e-6);
        // interaction line (R aov of the VC - OJ differences on dose)
        assertEquals(3.6436969619766, num(m, p + "interaction.overall.f"), 1e-10);
        assertEquals(0.0438103519042879, num(m, p + "interaction.overall.p"), 1e-12);
    }

    @Test
    void smallGroups_flaggedWithTheThreshold_andTheSectionSaysItIsDescriptive() throws Exception {
        Section s = section(StudyAnalysis.report(study(), StudyOptions.DEFAULT));
        assertEquals(10, AttributesSection.SMALL_GROUP);
        assertEquals(List.of("1", "2"), s.summary().get("attributes.dose.small_groups"), "8 and 6 are below 10; 10 is not");
        Table groups = table(s, "attribute_dose_groups");
        assertEquals("no", cell(groups, "fewer than 10", "condition", "OJ", "measure", "overall", "dose", "0.5"));
        assertEquals("yes", cell(groups, "fewer than 10", "condition", "OJ", "measure", "overall", "dose", "2"));
        String text = String.join(" ", s.paragraphs());
        assertTrue(text.contains("descriptive"), text);
        assertTrue(text.contains("fewer than 10 candidates are flagged (a threshold of common practice"), text);
    }

    @Test
    void undeclaredTextColumn_refusedWithHowToDeclareIt_declaredNumbersStayGroupNames() throws Exception {
        String csv = "candidate,level,first_language,q1\nc1,B1,Polish,4\nc2,B1,Arabic,3\n";
        InputRejected e = org.junit.jupiter.api.Assertions.assertThrows(InputRejected.class,
                () -> CandidatesReader.read("candidates.csv", new StringReader(csv)));
        assertTrue(e.getMessage().contains("--attribute first_language"), e.getMessage());
        assertTrue(e.getMessage().contains("row 2") || e.getMessage().contains(":2"), e.getMessage());
        CandidatesReader.Result ok = CandidatesReader.read("candidates.csv", new StringReader(csv),
                List.of("first_language"));
        assertEquals("Polish", ok.candidates().get(0).attributes().get("first_language"));
        assertEquals(4.0, ok.candidates().get(0).survey().get("q1"));
        CandidatesReader.Result numbers = CandidatesReader.read("candidates.csv", new StringReader(
                "candidate,level,gender\nc1,B1,1\nc2,B1,2.0\n"), List.of("gender"));
        assertEquals("2.0", numbers.candidates().get(1).attributes().get("gender"), "declared: kept as written");
        assertFalse(numbers.items().contains("gender"));
        InputRejected missing = org.junit.jupiter.api.Assertions.assertThrows(InputRejected.class,
                () -> CandidatesReader.read("candidates.csv", new StringReader(csv), List.of("gender")));
        assertTrue(missing.getMessage().contains("'gender' is not a column"), missing.getMessage());
        InputRejected reserved = org.junit.jupiter.api.Assertions.assertThrows(InputRejected.class,
                () -> CandidatesReader.read("candidates.csv", new StringReader("candidate,level,task\nc1,B1,x\n"),
                        List.of("task")));
        assertTrue(reserved.getMessage().contains("cannot be an attribute"), reserved.getMessage());
    }
}
