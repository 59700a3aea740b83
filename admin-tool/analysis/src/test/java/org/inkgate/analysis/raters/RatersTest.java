package org.inkgate.analysis.raters;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.analysis.testutil.ReferenceData;
import org.junit.jupiter.api.Test;

class RatersTest {

    static double[][] shroutFleiss() {
        return ReferenceData.rows("shrout_fleiss_1979.csv").stream()
                .map(r -> new double[] {Double.parseDouble(r.get("J1")), Double.parseDouble(r.get("J2")),
                    Double.parseDouble(r.get("J3")), Double.parseDouble(r.get("J4"))})
                .toArray(double[][]::new);
    }

    @Test
    void icc_shroutFleiss_matchesPsych() {
        // BMS 11.2417, JMS 32.4861, EMS 1.0194, WMS 6.2639; ICC1 0.1657418 ICC2 0.2897638 ICC3 0.7148407
        // ICC1k 0.4427971 ICC2k 0.6200505 ICC3k 0.9093155 (R 4.2.2 psych::ICC, METHODS.md;
        // the paper prints .17 .29 .71 .44 .62 .91)
        Icc icc = Icc.of(shroutFleiss(), 0.95);
        assertEquals(11.2417, icc.bms(), 5e-5);
        assertEquals(32.4861, icc.jms(), 5e-5);
        assertEquals(1.0194, icc.ems(), 5e-5);
        assertEquals(6.2639, icc.wms(), 5e-5);
        double[] expected = {0.1657418, 0.2897638, 0.7148407, 0.4427971, 0.6200505, 0.9093155};
        for (int i = 0; i < 6; i++) {
            assertEquals(expected[i], icc.forms().get(i).value(), 1e-7, icc.forms().get(i).name());
        }
    }

    @Test
    void icc_shroutFleissIntervals_matchPsych() {
        // R psych::ICC lower/upper bounds, from icc_reference.R / icc_reference.txt in test resources
        Icc icc = Icc.of(shroutFleiss(), 0.95);
        double[][] bounds = IccReference.BOUNDS;
        for (int i = 0; i < 6; i++) {
            assertEquals(bounds[i][0], icc.forms().get(i).lower(), 1e-6, icc.forms().get(i).name() + " lower");
            assertEquals(bounds[i][1], icc.forms().get(i).upper(), 1e-6, icc.forms().get(i).name() + " upper");
        }
    }

    @Test
    void icc_constantTable_saysUndefined() {
        Icc icc = Icc.of(new double[][] {{2, 2}, {2, 2}, {2, 2}}, 0.95);
        assertTrue(icc.forms().isEmpty());
        assertTrue(icc.cautions().get(0).contains("zero variance"));
    }

    @Test
    void kappa_twoByTwo_isPointFourWithStatsmodelsSe() {
        // 20 yes-yes, 5 yes-no, 10 no-yes, 15 no-no: kappa 0.4 (by hand, METHODS.md);
        // SE 0.12699606293110033, SE0 0.13856406460551018 (statsmodels 0.13.5 cohens_kappa, scipy_reference.txt)
        double[] a = new double[50], b = new double[50];
        fill(a, b, 0, 20, 1, 1);
        fill(a, b, 20, 5, 1, 0);
        fill(a, b, 25, 10, 0, 1);
        fill(a, b, 35, 15, 0, 0);
        Kappa k = Kappa.of(a, b, Kappa.Weights.UNWEIGHTED);
        assertEquals(0.4, k.kappa(), 1e-12);
        assertEquals(0.12699606293110033, k.se(), 1e-12);
        assertEquals(0.13856406460551018, k.seNull(), 1e-12);
    }

    @Test
    void kappa_artsteinPoesio_matchesPaper() {
        // y1 = 46x0, 44x1, 10x2; y2 = 52x0, 32x1, 16x2: kappa 0.8013 (Artstein & Poesio 2008, Table 4);
        // the pairing that yields it: 46 (0,0), 6 (1,0), 32 (1,1), 6 (1,2), 10 (2,2)
        double[] a = new double[100], b = new double[100];
        fill(a, b, 0, 46, 0, 0);
        fill(a, b, 46, 6, 1, 0);
        fill(a, b, 52, 32, 1, 1);
        fill(a, b, 84, 6, 1, 2);
        fill(a, b, 90, 10, 2, 2);
        assertEquals(0.8013, Kappa.of(a, b, Kappa.Weights.UNWEIGHTED).kappa(), 5e-5);
    }

    @Test
    void kappa_weighted3x3_matchesStatsmodels() {
        // table [[16,4,0],[3,12,5],[0,5,15]] (ToothGrowth dose vs length tertile, scipy_reference.py):
        // statsmodels 0.13.5 cohens_kappa (scipy_reference.txt)
        int[][] t = {{16, 4, 0}, {3, 12, 5}, {0, 5, 15}};
        List<Double> a = new ArrayList<>(), b = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                for (int c = 0; c < t[i][j]; c++) {
                    a.add((double) i);
                    b.add((double) j);
                }
            }
        }
        double[] x = a.stream().mapToDouble(Double::doubleValue).toArray();
        double[] y = b.stream().mapToDouble(Double::doubleValue).toArray();
        Kappa u = Kappa.of(x, y, Kappa.Weights.UNWEIGHTED);
        assertEquals(0.575, u.kappa(), 1e-12);
        assertEquals(0.08747144871486796, u.se(), 1e-12);
        assertEquals(0.09124904870128174, u.seNull(), 1e-12);
        Kappa l = Kappa.of(x, y, Kappa.Weights.LINEAR);
        assertEquals(0.6792452830188679, l.kappa(), 1e-12);
        assertEquals(0.07013318521618356, l.se(), 1e-12);
        assertEquals(0.10164580553880209, l.seNull(), 1e-12);
        Kappa q = Kappa.of(x, y, Kappa.Weights.QUADRATIC);
        assertEquals(0.7848101265822784, q.kappa(), 1e-12);
        assertEquals(0.050999114938771815, q.se(), 1e-12);
        assertEquals(0.12906151552102746, q.seNull(), 1e-12);
        assertEquals((16 + 12 + 15) / 60.0, Agreement.of(x, y).exact(), 1e-12);
        assertEquals(1.0, Agreement.of(x, y).adjacent(), 1e-12);
    }

    @Test
    void kappa_oneCategory_saysUndefined() {
        Kappa k = Kappa.of(new double[] {2, 2, 2}, new double[] {2, 2, 2}, Kappa.Weights.LINEAR);
        assertTrue(Double.isNaN(k.kappa()));
        assertTrue(k.cautions().get(0).contains("one category"));
    }

    @Test
    void krippendorff_paperExample_matchesPublishedAlphas() {
        // Krippendorff (2011), 4 observers x 12 units with missing values: nominal 0.743,
        // interval 0.849 (METHODS.md, [memory]); ordinal 0.815 [memory]. The rows are ours from
        // memory of the paper's table; nominal and interval both matching is the check on them.
        double n = Double.NaN;
        double[][] coders = {
            {1, 2, 3, 3, 2, 1, 4, 1, 2, n, n, n},
            {1, 2, 3, 3, 2, 2, 4, 1, 2, 5, n, 3},
            {n, 3, 3, 3, 2, 3, 4, 2, 2, 5, 1, n},
            {1, 2, 3, 3, 2, 4, 4, 1, 2, 5, 1, n}};
        List<double[]> units = new ArrayList<>();
        for (int u = 0; u < 12; u++) {
            List<Double> vals = new ArrayList<>();
            for (double[] c : coders) {
                if (!Double.isNaN(c[u])) {
                    vals.add(c[u]);
                }
            }
            units.add(vals.stream().mapToDouble(Double::doubleValue).toArray());
        }
        assertEquals(0.743, Krippendorff.alpha(units, Krippendorff.Metric.NOMINAL).alpha(), 5e-4);
        assertEquals(0.849, Krippendorff.alpha(units, Krippendorff.Metric.INTERVAL).alpha(), 5e-4);
        assertEquals(0.815, Krippendorff.alpha(units, Krippendorff.Metric.ORDINAL).alpha(), 5e-4);
        assertEquals(11, Krippendorff.alpha(units, Krippendorff.Metric.NOMINAL).units());
    }

    @Test
    void correlations_shroutFleissJudges1And3_matchScipy() {
        // scipy 1.10.1 pearsonr / spearmanr (scipy_reference.txt)
        double[][] t = shroutFleiss();
        double[] j1 = new double[6], j3 = new double[6];
        for (int i = 0; i < 6; i++) {
            j1[i] = t[i][0];
            j3[i] = t[i][2];
        }
        Correlation p = Correlation.pearson(j1, j3);
        assertEquals(0.725, p.r(), 1e-12);
        assertEquals(0.10303906249999994, p.p(), 1e-10);
        Correlation s = Correlation.spearman(j1, j3);
        assertEquals(0.7058823529411765, s.r(), 1e-12);
        assertEquals(0.11703643395074284, s.p(), 1e-10);
    }

    private static void fill(double[] a, double[] b, int from, int count, double x, double y) {
        for (int i = from; i < from + count; i++) {
            a[i] = x;
            b[i] = y;
        }
    }
}
