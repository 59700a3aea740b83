package org.inkgate.analysis.comparison;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.groups.Groups;
import org.inkgate.analysis.groups.OneWayAnova;
import org.inkgate.analysis.groups.VarianceHomogeneity;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The design-following analyses against R 4.2.2 (base stats; car 3.1.1 from Debian):
 * src/test/resources/reference/design_analyses.R, output committed beside it as design_analyses.txt.
 * Data: R's published data sets ToothGrowth and warpbreaks (CSV beside the script) and the example of
 * R's ?wilcox.test (Hollander &amp; Wolfe 1973). Closed-form statistics agree to 1e-6 (relative where
 * the value is large); p-values from iterative distributions to 1e-8 absolute.
 */
class DesignAnalysesReferenceTest {

    private static final Map<String, Map<String, Double>> R = new HashMap<>();
    private static double[] oj, vc, dose;
    private static String[] supp;
    private static double[][] tension; // 18 x 3 (L, M, H), rows wool A then B as in the R script
    private static int[] wool;

    @BeforeAll
    static void load() throws IOException {
        for (String line : lines("design_analyses.txt")) {
            String[] w = line.trim().split("\\s+");
            if (w.length < 3 || w[0].equals("version") || w[0].equals("matrix_rows_wool")) {
                continue;
            }
            Map<String, Double> m = new HashMap<>();
            for (int i = 1; i + 1 < w.length; i += 2) {
                m.put(w[i], Double.parseDouble(w[i + 1]));
            }
            R.put(w[0], m);
        }
        List<String> tg = lines("ToothGrowth.csv");
        List<Double> o = new ArrayList<>(), v = new ArrayList<>();
        dose = new double[tg.size() - 1];
        supp = new String[tg.size() - 1];
        double[] len = new double[tg.size() - 1];
        for (int i = 1; i < tg.size(); i++) {
            String[] c = tg.get(i).split(",");
            len[i - 1] = Double.parseDouble(c[0]);
            supp[i - 1] = c[1];
            dose[i - 1] = Double.parseDouble(c[2]);
            (c[1].equals("OJ") ? o : v).add(len[i - 1]);
        }
        oj = o.stream().mapToDouble(Double::doubleValue).toArray();
        vc = v.stream().mapToDouble(Double::doubleValue).toArray();
        toothLen = len;
        // warpbreaks: the i-th loom of each wool x tension is one row (as the R script's reshape)
        List<String> wb = lines("warpbreaks.csv");
        tension = new double[18][3];
        wool = new int[18];
        int[][] seen = new int[2][3];
        for (int i = 1; i < wb.size(); i++) {
            String[] c = wb.get(i).split(",");
            int w = c[1].equals("A") ? 0 : 1;
            int t = switch (c[2]) {
                case "L" -> 0;
                case "M" -> 1;
                default -> 2;
            };
            int row = w * 9 + seen[w][t]++;
            tension[row][t] = Double.parseDouble(c[0]);
            wool[row] = w;
        }
    }

    private static double[] toothLen;

    private static List<String> lines(String file) throws IOException {
        try (InputStream in = DesignAnalysesReferenceTest.class.getResourceAsStream("/reference/" + file);
                BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            return r.lines().filter(l -> !l.isBlank()).toList();
        }
    }

    private static double r(String name, String key) {
        return R.get(name).get(key);
    }

    private static void close(double expected, double actual, String what) {
        assertEquals(expected, actual, 1e-6 * Math.max(1, Math.abs(expected)), what);
    }

    @Test
    void independentGroups_welchStudentHedges_matchR() {
        IndependentComparison c = IndependentComparison.of(oj, vc, 0.95);
        close(r("welch", "t"), c.welchT(), "Welch t");
        close(r("welch", "df"), c.welchDf(), "Welch df");
        close(r("welch", "p"), c.welchP(), "Welch p");
        close(r("welch", "lower"), c.welchLower(), "Welch CI");
        close(r("welch", "upper"), c.welchUpper(), "Welch CI");
        close(r("student", "p"), c.studentP(), "Student p");
        close(r("student", "lower"), c.studentLower(), "Student CI");
        close(r("hedges", "g"), c.hedgesG(), "Hedges g");
        close(r("hedges", "lower"), c.hedgesLower(), "g lower");
        close(r("hedges", "upper"), c.hedgesUpper(), "g upper");
        OneWayAnova lev = VarianceHomogeneity.test(new Groups(List.of("OJ", "VC"), List.of(oj, vc)),
                VarianceHomogeneity.Centre.MEAN);
        close(r("levene_mean", "F"), lev.f(), "Levene F");
        close(r("levene_mean", "p"), lev.p(), "Levene p");
    }

    @Test
    void mannWhitney_tiesUseNormalApproximation_andSmallSamplesExact_matchR() {
        MannWhitney ties = MannWhitney.of(oj, vc);
        close(r("mannwhitney_ties", "W"), ties.u(), "U with ties");
        close(r("mannwhitney_ties", "p"), ties.p(), "p with ties");
        assertTrue(!ties.exact());
        double[] x = {0.80, 0.83, 1.89, 1.04, 1.45, 1.38, 1.91, 1.64, 0.73, 1.46};
        double[] y = {1.15, 0.88, 0.90, 0.74, 1.21};
        MannWhitney exact = MannWhitney.of(x, y);
        assertTrue(exact.exact());
        close(r("mannwhitney_exact", "W"), exact.u(), "U exact");
        close(r("mannwhitney_exact", "p"), exact.p(), "p exact");
    }

    @Test
    void ancova_numericCovariateAndFactor_matchR() {
        boolean[] isOj = new boolean[supp.length];
        String[] doseLevel = new String[supp.length];
        for (int i = 0; i < supp.length; i++) {
            isOj[i] = supp[i].equals("OJ");
            doseLevel[i] = Double.toString(dose[i]);
        }
        Ancova a = Ancova.numeric(toothLen, isOj, dose, 0.95);
        close(r("ancova_numeric", "diff"), a.adjustedDifference(), "adjusted difference");
        close(r("ancova_numeric", "lower"), a.differenceLower(), "CI lower");
        close(r("ancova_numeric", "upper"), a.differenceUpper(), "CI upper");
        close(r("ancova_numeric", "F"), a.f(), "F");
        close(r("ancova_numeric_car_typeII", "F"), a.f(), "F (car Type II)");
        close(r("ancova_numeric", "df2"), a.df2(), "df2");
        close(r("ancova_numeric", "p"), a.p(), "p");
        close(r("ancova_numeric", "slope"), a.slope(), "slope");
        close(r("ancova_numeric", "slopesF"), a.slopesF(), "slopes F");
        close(r("ancova_numeric", "slopesDf2"), a.slopesDf2(), "slopes df2");
        close(r("ancova_numeric", "slopesP"), a.slopesP(), "slopes p");
        close(r("ancova_numeric", "petasq"), a.partialEtaSquared(), "partial eta squared");
        Ancova f = Ancova.factor(toothLen, isOj, doseLevel, 0.95);
        close(r("ancova_factor", "diff"), f.adjustedDifference(), "factor difference");
        close(r("ancova_factor", "lower"), f.differenceLower(), "factor CI");
        close(r("ancova_factor", "F"), f.f(), "factor F");
        close(r("ancova_factor", "df2"), f.df2(), "factor df2");
        close(r("ancova_factor", "p"), f.p(), "factor p");
        close(r("ancova_factor", "slopesF"), f.slopesF(), "factor interaction F");
        close(r("ancova_factor", "slopesDf1"), f.slopesDf1(), "factor interaction df");
        close(r("ancova_factor", "slopesP"), f.slopesP(), "factor interaction p");
    }

    @Test
    void repeatedMeasures_anovaMauchlyCorrectionsFriedman_matchR() {
        RepeatedMeasuresAnova a = RepeatedMeasuresAnova.of(tension);
        close(r("rm_anova", "F"), a.condition().f(), "F");
        close(r("rm_anova", "df2"), a.condition().errorDf(), "df2");
        close(r("rm_anova", "p"), a.condition().p(), "p");
        close(r("rm_anova", "petasq"), a.condition().partialEtaSquared(), "partial eta squared");
        close(r("mauchly_rm", "W"), a.mauchlyW(), "Mauchly W");
        close(r("mauchly_rm", "p"), a.mauchlyP(), "Mauchly p");
        close(r("rm_epsilon", "GG"), a.greenhouseGeisser(), "GG epsilon");
        close(r("rm_epsilon", "HF"), a.huynhFeldt(), "HF epsilon");
        close(r("rm_spherical", "GGp"), a.condition().pGreenhouseGeisser(), "GG p");
        close(r("rm_spherical", "HFp"), a.condition().pHuynhFeldt(), "HF p");
        Friedman f = Friedman.of(tension);
        close(r("friedman", "Q"), f.q(), "Friedman Q");
        close(r("friedman", "p"), f.p(), "Friedman p");
        double[] l = column(0), m = column(1), h = column(2);
        double[] holm = Holm.adjust(new double[] {PairedComparison.of(l, h, 0.95).p(),
                PairedComparison.of(m, h, 0.95).p(), PairedComparison.of(l, m, 0.95).p()});
        close(r("rm_pairwise_holm", "H_L"), holm[0], "Holm H-L");
        close(r("rm_pairwise_holm", "M_H"), holm[1], "Holm M-H");
        close(r("rm_pairwise_holm", "M_L"), holm[2], "Holm M-L");
    }

    @Test
    void mixedDesign_betweenWithinInteraction_matchR() {
        RepeatedMeasuresAnova a = RepeatedMeasuresAnova.of(tension, wool);
        close(r("mixed_between", "F"), a.between().f(), "between F");
        close(r("mixed_between", "df2"), a.between().errorDf(), "between df2");
        close(r("mixed_between", "p"), a.between().p(), "between p");
        close(r("mixed_condition", "F"), a.condition().f(), "within F");
        close(r("mixed_condition", "p"), a.condition().p(), "within p");
        close(r("mixed_interaction", "F"), a.interaction().f(), "interaction F");
        close(r("mixed_interaction", "df2"), a.interaction().errorDf(), "interaction df2");
        close(r("mixed_interaction", "p"), a.interaction().p(), "interaction p");
        close(r("mixed_sphericity", "W"), a.mauchlyW(), "pooled Mauchly W");
        close(r("mixed_sphericity", "p"), a.mauchlyP(), "pooled Mauchly p");
        close(r("mixed_sphericity", "GGp_condition"), a.condition().pGreenhouseGeisser(), "GG p within");
        close(r("mixed_sphericity", "HFp_condition"), a.condition().pHuynhFeldt(), "HF p within");
        close(r("mixed_sphericity", "GGp_interaction"), a.interaction().pGreenhouseGeisser(), "GG p interaction");
        close(r("mixed_sphericity", "HFp_interaction"), a.interaction().pHuynhFeldt(), "HF p interaction");
    }

    private static double[] column(int j) {
        double[] c = new double[tension.length];
        for (int i = 0; i < c.length; i++) {
            c[i] = tension[i][j];
        }
        return c;
    }
}
