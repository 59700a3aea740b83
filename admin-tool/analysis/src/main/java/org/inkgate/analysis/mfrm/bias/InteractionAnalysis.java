package org.inkgate.analysis.mfrm.bias;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.inkgate.analysis.mfrm.design.Grouping;
import org.inkgate.analysis.mfrm.design.ModelDesign;
import org.inkgate.analysis.mfrm.estimation.CategoryModel;

/**
 * Bias/interaction analysis (Linacre 1989, ch. on bias; METHODS.md): with every measure and
 * threshold anchored at its estimate, one extra term per combination of two columns is estimated
 * by Newton-Raphson on that combination's ratings. SE = 1/sqrt(information), t = size/SE,
 * df = ratings - 1, p two-sided from Student's t. With a {@link JointCellRefit} the size and SE of
 * every non-extreme combination come instead from a refit with the main effects (issue 18); an
 * extreme combination (all ratings at one end) keeps the held-fixed estimate at 0.5 inwards, since
 * its joint term has no finite maximum.
 */
public final class InteractionAnalysis {
    private static final int MAX_ITER = 100;

    private InteractionAnalysis() {
    }

    /**
     * @param codesA per input data row, the element code of the first column
     * @param labelsA labels of the first column's codes
     */
    public static BiasPair analyse(ModelDesign d, double[][] measure, double[][] thresholds, String nameA,
                                   int[] codesA, String[] labelsA, String nameB, int[] codesB, String[] labelsB) {
        return analyse(d, measure, thresholds, nameA, codesA, labelsA, nameB, codesB, labelsB, null);
    }

    /**
     * @param joint refits each combination jointly with the main effects, or null to hold them fixed
     */
    public static BiasPair analyse(ModelDesign d, double[][] measure, double[][] thresholds, String nameA,
                                   int[] codesA, String[] labelsA, String nameB, int[] codesB, String[] labelsB,
                                   JointCellRefit joint) {
        int nObs = d.observationCount();
        int[] rows = d.rows();
        int nB = labelsB.length;
        int[] cellOf = new int[nObs];
        Map<Long, Integer> index = new HashMap<>();
        List<long[]> keys = new ArrayList<>();
        for (int n = 0; n < nObs; n++) {
            long key = (long) codesA[rows[n]] * nB + codesB[rows[n]];
            Integer c = index.get(key);
            if (c == null) {
                c = keys.size();
                index.put(key, c);
                keys.add(new long[] {codesA[rows[n]], codesB[rows[n]]});
            }
            cellOf[n] = c;
        }
        int nCells = keys.size();
        Grouping byCell = Grouping.of(cellOf, nCells);
        int[] start = byCell.start();
        int[] order = byCell.order();
        double[] eta = new double[nObs];
        for (int n = 0; n < nObs; n++) {
            double v = measure[0][d.elements(0)[n]];
            for (int f = 1; f < d.facetCount(); f++) {
                v -= measure[f][d.elements(f)[n]];
            }
            eta[n] = v;
        }
        double[] p = new double[d.maxCategoryOverall() + 1];
        List<BiasCell> cells = new ArrayList<>(nCells);
        double chi = 0;
        int df = 0;
        int significant = 0;
        int notEstimable = 0;
        int[] inCell = joint == null ? null : new int[nObs];
        for (int c = 0; c < nCells; c++) {
            int cnt = start[c + 1] - start[c];
            double obs = 0;
            double obsRaw = 0;
            double max = 0;
            double expRaw0 = 0;
            for (int i = start[c]; i < start[c + 1]; i++) {
                int n = order[i];
                int s = d.scales()[n];
                obs += d.categories()[n];
                obsRaw += d.rawScore(s, d.categories()[n]);
                max += d.maxCategory(s);
                CategoryModel.probabilities(eta[n], thresholds[s], d.maxCategory(s), p);
                for (int k = 0; k <= d.maxCategory(s); k++) {
                    expRaw0 += d.rawScore(s, k) * p[k];
                }
            }
            boolean extreme = obs == 0 || obs == max;
            double target = obs == 0 ? 0.5 : obs == max ? max - 0.5 : obs;
            double b = 0;
            double info = 0;
            for (int it = 0; it < MAX_ITER; it++) {
                double e = 0;
                info = 0;
                for (int i = start[c]; i < start[c + 1]; i++) {
                    int n = order[i];
                    int s = d.scales()[n];
                    int m = d.maxCategory(s);
                    CategoryModel.probabilities(eta[n] + b, thresholds[s], m, p);
                    double e1 = 0;
                    double e2 = 0;
                    for (int k = 1; k <= m; k++) {
                        e1 += k * p[k];
                        e2 += k * k * p[k];
                    }
                    e += e1;
                    info += e2 - e1 * e1;
                }
                double step = Math.max(-1, Math.min(1, (target - e) / info));
                b += step;
                if (Math.abs(step) < 1e-7) {
                    break;
                }
            }
            double se = 1 / Math.sqrt(info);
            if (joint != null && !extreme) {
                for (int n = 0; n < nObs; n++) {
                    inCell[n] = cellOf[n] == c ? 1 : 0;
                }
                double[] fit = joint.fit(inCell);
                b = fit == null ? Double.NaN : fit[0];
                se = fit == null ? Double.NaN : fit[1];
                notEstimable += fit == null ? 1 : 0;
            }
            double t = b / se;
            int cellDf = cnt - 1;
            double pValue = cellDf >= 1 ? 2 * (1 - new TDistribution(null, cellDf).cumulativeProbability(Math.abs(t)))
                    : Double.NaN;
            if (!extreme && cellDf >= 1 && !Double.isNaN(t)) {
                chi += t * t;
                df++;
                if (pValue < 0.05) {
                    significant++;
                }
            }
            long[] key = keys.get(c);
            cells.add(new BiasCell(labelsA[(int) key[0]], labelsB[(int) key[1]], cnt, obsRaw, expRaw0,
                    (obsRaw - expRaw0) / cnt, b, se, t, cellDf, pValue, extreme));
        }
        double pChi = df > 0 ? 1 - new ChiSquaredDistribution(null, df).cumulativeProbability(chi) : Double.NaN;
        return new BiasPair(nameA, nameB, List.copyOf(cells), chi, df, pChi, significant,
                joint == null ? BiasEstimation.MAIN_EFFECTS_FIXED : BiasEstimation.JOINT, notEstimable);
    }
}
