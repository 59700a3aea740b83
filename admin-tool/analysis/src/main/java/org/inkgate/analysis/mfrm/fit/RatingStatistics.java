package org.inkgate.analysis.mfrm.fit;

import java.util.PriorityQueue;
import org.inkgate.analysis.mfrm.design.ModelDesign;
import org.inkgate.analysis.mfrm.estimation.CategoryModel;

/**
 * Residual-based statistics over the estimated ratings: per element observed and expected raw
 * score, infit and outfit mean-squares with Wilson-Hilferty standardisation, point-measure
 * correlation; per category count, average and expected average measure, outfit; and the most
 * unexpected ratings. Residuals are in category units, the units the model fits.
 */
public final class RatingStatistics {
    /** [facet][element] */
    public final int[][] count;
    public final double[][] observedRaw;
    public final double[][] expectedRaw;
    public final double[][] infit;
    public final double[][] infitZ;
    public final double[][] outfit;
    public final double[][] outfitZ;
    public final double[][] pointMeasure;
    /** [scale][category] */
    public final int[][] categoryCount;
    public final double[][] averageMeasure;
    public final double[][] expectedAverageMeasure;
    public final double[][] categoryOutfit;
    /** Observation indices (into the design) of the most unexpected ratings, largest |z| first. */
    public final int[] unexpected;
    public final double[] unexpectedExpectedRaw;
    public final double[] unexpectedZ;
    public final double[] unexpectedResidual;

    /**
     * @param measure    [facet][element]
     * @param thresholds [scale][k]
     */
    public RatingStatistics(ModelDesign d, double[][] measure, double[][] thresholds, double minAbsZ, int limit) {
        int nF = d.facetCount();
        int nS = d.scaleCount();
        count = new int[nF][];
        observedRaw = new double[nF][];
        expectedRaw = new double[nF][];
        infit = new double[nF][];
        infitZ = new double[nF][];
        outfit = new double[nF][];
        outfitZ = new double[nF][];
        pointMeasure = new double[nF][];
        double[][] sz2 = new double[nF][];
        double[][] scw = new double[nF][];
        double[][] sr2 = new double[nF][];
        double[][] sw = new double[nF][];
        double[][] scmw = new double[nF][];
        double[][][] pm = new double[nF][][];
        for (int f = 0; f < nF; f++) {
            int ne = d.elementCount(f);
            count[f] = new int[ne];
            observedRaw[f] = new double[ne];
            expectedRaw[f] = new double[ne];
            infit[f] = new double[ne];
            infitZ[f] = new double[ne];
            outfit[f] = new double[ne];
            outfitZ[f] = new double[ne];
            pointMeasure[f] = new double[ne];
            sz2[f] = new double[ne];
            scw[f] = new double[ne];
            sr2[f] = new double[ne];
            sw[f] = new double[ne];
            scmw[f] = new double[ne];
            pm[f] = new double[5][ne];
        }
        categoryCount = new int[nS][];
        averageMeasure = new double[nS][];
        expectedAverageMeasure = new double[nS][];
        categoryOutfit = new double[nS][];
        double[][] sumP = new double[nS][];
        for (int s = 0; s < nS; s++) {
            int m = d.maxCategory(s);
            categoryCount[s] = new int[m + 1];
            averageMeasure[s] = new double[m + 1];
            expectedAverageMeasure[s] = new double[m + 1];
            categoryOutfit[s] = new double[m + 1];
            sumP[s] = new double[m + 1];
        }
        PriorityQueue<double[]> worst = new PriorityQueue<>((a, b) -> Double.compare(Math.abs(a[1]), Math.abs(b[1])));
        int[] x = d.categories();
        int[] sc = d.scales();
        double[] p = new double[d.maxCategoryOverall() + 1];
        double[][] expNegCum = CategoryModel.expNegCumulative(thresholds, d);
        int[][] elements = new int[nF][];
        for (int f = 0; f < nF; f++) {
            elements[f] = d.elements(f);
        }
        for (int n = 0; n < x.length; n++) {
            double eta = measure[0][elements[0][n]];
            for (int f = 1; f < nF; f++) {
                eta -= measure[f][elements[f][n]];
            }
            int s = sc[n];
            int m = d.maxCategory(s);
            CategoryModel.probabilities(eta, thresholds[s], expNegCum[s], m, p);
            double e = 0;
            double eRaw = 0;
            for (int k = 0; k <= m; k++) {
                e += k * p[k];
                eRaw += d.rawScore(s, k) * p[k];
            }
            double w = 0;
            double c = 0;
            for (int k = 0; k <= m; k++) {
                double dev = k - e;
                w += dev * dev * p[k];
                c += dev * dev * dev * dev * p[k];
            }
            double r = x[n] - e;
            double z = r / Math.sqrt(w);
            double raw = d.rawScore(s, x[n]);
            for (int f = 0; f < nF; f++) {
                int el = elements[f][n];
                count[f][el]++;
                observedRaw[f][el] += raw;
                expectedRaw[f][el] += eRaw;
                sz2[f][el] += z * z;
                scw[f][el] += c / (w * w);
                sr2[f][el] += r * r;
                sw[f][el] += w;
                scmw[f][el] += c - w * w;
                // point-measure: the rating against the measure of everything else in it
                double rest = f == 0 ? eta - measure[0][el] : eta + measure[f][el];
                double[][] q = pm[f];
                q[0][el] += raw;
                q[1][el] += raw * raw;
                q[2][el] += rest;
                q[3][el] += rest * rest;
                q[4][el] += raw * rest;
            }
            int k0 = x[n];
            categoryCount[s][k0]++;
            averageMeasure[s][k0] += eta;
            categoryOutfit[s][k0] += z * z;
            for (int k = 0; k <= m; k++) {
                expectedAverageMeasure[s][k] += eta * p[k];
                sumP[s][k] += p[k];
            }
            if (Math.abs(z) >= minAbsZ && limit > 0) {
                worst.add(new double[] {n, z, eRaw, raw - eRaw});
                if (worst.size() > limit) {
                    worst.poll();
                }
            }
        }
        for (int f = 0; f < nF; f++) {
            for (int el = 0; el < d.elementCount(f); el++) {
                int cnt = count[f][el];
                outfit[f][el] = sz2[f][el] / cnt;
                infit[f][el] = sr2[f][el] / sw[f][el];
                outfitZ[f][el] = MeanSquares.standardise(outfit[f][el], MeanSquares.outfitQ(scw[f][el], cnt));
                infitZ[f][el] = MeanSquares.standardise(infit[f][el], MeanSquares.infitQ(scmw[f][el], sw[f][el]));
                double[][] q = pm[f];
                double sxx = q[1][el] - q[0][el] * q[0][el] / cnt;
                double syy = q[3][el] - q[2][el] * q[2][el] / cnt;
                double sxy = q[4][el] - q[0][el] * q[2][el] / cnt;
                pointMeasure[f][el] = sxx > 1e-12 && syy > 1e-12 ? sxy / Math.sqrt(sxx * syy) : Double.NaN;
            }
        }
        for (int s = 0; s < nS; s++) {
            for (int k = 0; k < categoryCount[s].length; k++) {
                averageMeasure[s][k] = categoryCount[s][k] > 0 ? averageMeasure[s][k] / categoryCount[s][k] : Double.NaN;
                categoryOutfit[s][k] = categoryCount[s][k] > 0 ? categoryOutfit[s][k] / categoryCount[s][k] : Double.NaN;
                expectedAverageMeasure[s][k] = sumP[s][k] > 0 ? expectedAverageMeasure[s][k] / sumP[s][k] : Double.NaN;
            }
        }
        int u = worst.size();
        unexpected = new int[u];
        unexpectedZ = new double[u];
        unexpectedExpectedRaw = new double[u];
        unexpectedResidual = new double[u];
        for (int i = u - 1; i >= 0; i--) {
            double[] w = worst.poll();
            unexpected[i] = (int) w[0];
            unexpectedZ[i] = w[1];
            unexpectedExpectedRaw[i] = w[2];
            unexpectedResidual[i] = w[3];
        }
    }
}
