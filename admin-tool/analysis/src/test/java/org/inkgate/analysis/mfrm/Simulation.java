package org.inkgate.analysis.mfrm;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.inkgate.analysis.mfrm.estimation.CategoryModel;

/**
 * Simulated ratings from known parameters (invented scenarios, fixed seeds; not real data).
 * Facet 0 is the candidate facet; each rule lists, for one candidate, the element index of every
 * other facet for each of its ratings.
 */
public final class Simulation {
    /** Which ratings a candidate receives: rows of element indices, one per non-candidate facet. */
    interface Assignment {
        List<int[]> ratings(int candidate, Random rng);
    }

    final List<String> facets;
    final double[] candidates;
    final double[][] truth;
    final double[] thresholds;
    final RatingData data;

    /** The modelled facets, in order. */
    public List<String> facets() {
        return facets;
    }

    /** The simulated ratings. */
    public RatingData data() {
        return data;
    }

    private Simulation(List<String> facets, double[] candidates, double[][] truth, double[] thresholds,
                       RatingData data) {
        this.facets = facets;
        this.candidates = candidates;
        this.truth = truth;
        this.thresholds = thresholds;
        this.data = data;
    }

    /**
     * @param truth      true measures per non-candidate facet (centred by the caller)
     * @param thresholds F_1..F_m (sum 0)
     */
    static Simulation run(long seed, int nCandidates, double candidateMean, double candidateSd, List<String> facets,
                          double[][] truth, double[] thresholds, Assignment rule) {
        Random rng = new Random(seed);
        double[] cand = new double[nCandidates];
        for (int c = 0; c < nCandidates; c++) {
            cand[c] = candidateMean + candidateSd * rng.nextGaussian();
        }
        int m = thresholds.length;
        double[] f = new double[m + 1];
        System.arraycopy(thresholds, 0, f, 1, m);
        String[] candLabels = new String[nCandidates];
        for (int c = 0; c < nCandidates; c++) {
            candLabels[c] = String.format("c%06d", c);
        }
        String[][] labels = new String[facets.size()][];
        for (int i = 0; i < facets.size(); i++) {
            labels[i] = new String[truth[i].length];
            for (int e = 0; e < truth[i].length; e++) {
                labels[i][e] = facets.get(i) + (e + 1);
            }
        }
        RatingData.Builder b = RatingData.builder(facets);
        double[] p = new double[m + 1];
        String[] values = new String[facets.size()];
        for (int c = 0; c < nCandidates; c++) {
            for (int[] row : rule.ratings(c, rng)) {
                double eta = cand[c];
                for (int i = 0; i < row.length; i++) {
                    eta -= truth[i][row[i]];
                    values[i] = labels[i][row[i]];
                }
                CategoryModel.probabilities(eta, f, m, p);
                double u = rng.nextDouble();
                int k = 0;
                double cum = p[0];
                while (u > cum && k < m) {
                    k++;
                    cum += p[k];
                }
                b.add(candLabels[c], values, k);
            }
        }
        return new Simulation(List.copyOf(facets), cand, truth, thresholds.clone(), b.build());
    }

    /** Evenly spaced centred values from -half to +half. */
    static double[] spread(int n, double half) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = n == 1 ? 0 : -half + 2 * half * i / (n - 1);
        }
        return v;
    }

    /** k distinct random indices out of n. */
    static int[] pick(Random rng, int n, int k) {
        List<Integer> all = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            all.add(i);
        }
        java.util.Collections.shuffle(all, rng);
        int[] out = new int[k];
        for (int i = 0; i < k; i++) {
            out[i] = all.get(i);
        }
        return out;
    }

    /** The truth for an element label of facet i (labels are facet name + 1-based index). */
    public double truthOf(int facet, String label) {
        return truth[facet][Integer.parseInt(label.substring(facets.get(facet).length())) - 1];
    }

    double candidateTruth(String label) {
        return candidates[Integer.parseInt(label.substring(1))];
    }

    /**
     * The benchmark scenario scaled by the number of candidates: 2 tasks each under one of 2
     * conditions (two counterbalanced forms), 5 criteria, 2 of 20 raters per candidate,
     * 9 categories: 20 ratings per candidate.
     */
    public static Simulation writingExam(long seed, int nCandidates) {
        List<String> facets = List.of("task", "condition", "rater", "criterion");
        double[][] truth = {spread(2, 0.3), spread(2, 0.25), spread(20, 1.0), spread(5, 0.6)};
        double[] thr = {-2.6, -1.9, -1.2, -0.4, 0.3, 1.0, 1.8, 3.0};
        return run(seed, nCandidates, 0.2, 1.3, facets, truth, thr, (c, rng) -> {
            int form = c % 2;
            int[] raters = pick(rng, 20, 2);
            List<int[]> rows = new ArrayList<>(20);
            for (int task = 0; task < 2; task++) {
                int condition = (task + form) % 2;
                for (int rater : raters) {
                    for (int crit = 0; crit < 5; crit++) {
                        rows.add(new int[] {task, condition, rater, crit});
                    }
                }
            }
            return rows;
        });
    }
}
