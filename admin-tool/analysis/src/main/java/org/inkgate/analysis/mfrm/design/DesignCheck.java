package org.inkgate.analysis.mfrm.design;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;

/**
 * Checks, before estimating, that every measure is identified: the observations link all elements
 * into one connected set, and no facet is confounded with candidates or with another facet.
 *
 * <p>Why a rank test: the model is additive in the logit, so its measures are identified exactly
 * when the fixed-effects design matrix has full rank once each unanchored non-candidate facet is
 * centred. Candidate effects are absorbed (within-candidate centring), which leaves a small matrix
 * over the non-candidate elements: A = sum over candidates of X'X - s s'/n. Its rank must equal
 * the free elements minus one per centred facet. Blocks of A then name the facets at fault.
 */
public final class DesignCheck {
    private static final int LABELS_SHOWN = 6;

    private DesignCheck() {
    }

    /**
     * Problems found, one sentence each; empty when the design identifies every measure.
     *
     * @param anchored [facet][element] true where the measure is anchored
     * @param context  e.g. "" or " after setting extreme scores aside", appended to messages
     */
    public static List<String> problems(ModelDesign d, boolean[][] anchored, String context) {
        List<String> out = new ArrayList<>();
        int nF = d.facetCount();
        int[][] column = new int[nF][];
        int p = 0;
        boolean[] facetAnchored = new boolean[nF];
        boolean[][] present = presentElements(d);
        List<List<Integer>> facetColumns = columnsByFacet(nF);
        for (int f = 1; f < nF; f++) {
            column[f] = new int[d.elementCount(f)];
            Arrays.fill(column[f], -1);
            for (int e = 0; e < d.elementCount(f); e++) {
                if (anchored[f][e]) {
                    facetAnchored[f] = true;
                } else if (present[f][e]) {
                    column[f][e] = p;
                    facetColumns.get(f).add(p);
                    p++;
                }
            }
        }
        if (p == 0) {
            return out;
        }
        double[][] a = withinCandidateMatrix(d, column, p);
        int[] all = new int[p];
        for (int i = 0; i < p; i++) {
            all[i] = i;
        }
        int expected = 0;
        for (int f = 1; f < nF; f++) {
            expected += expectedRank(facetColumns.get(f).size(), facetAnchored[f]);
        }
        int deficiency = expected - rank(a, all);
        if (deficiency <= 0) {
            return out;
        }
        // a disconnected design shows up as a rank deficiency; anchors in every subset can cure it
        List<List<int[]>> subsets = connectedSubsets(d);
        if (subsets.size() > 1) {
            out.add(describeSubsets(d, subsets, context));
        }
        List<String> specific = new ArrayList<>();
        int[] single = new int[nF];
        for (int f = 1; f < nF; f++) {
            int[] cols = facetColumns.get(f).stream().mapToInt(Integer::intValue).toArray();
            single[f] = Math.max(0, expectedRank(cols.length, facetAnchored[f]) - rank(a, cols));
            if (single[f] > 0) {
                specific.add(CandidateLinks.describe(d, f, anchored[f], single[f], context));
            }
        }
        for (int f = 1; f < nF; f++) {
            for (int g = f + 1; g < nF; g++) {
                int[] cols = concat(facetColumns.get(f), facetColumns.get(g));
                int exp = expectedRank(facetColumns.get(f).size(), facetAnchored[f])
                        + expectedRank(facetColumns.get(g).size(), facetAnchored[g]);
                int def = exp - rank(a, cols) - single[f] - single[g];
                if (def > 0) {
                    specific.add("facets '" + d.facetName(f) + "' and '" + d.facetName(g) + "' are confounded"
                            + context + " (rank deficiency " + def + "): " + coOccurrence(d, f, g)
                            + "; their measures cannot be told apart. Cross them in the design (e.g."
                            + " counterbalanced forms), model only one of them, or anchor one of them");
                }
            }
        }
        if (specific.isEmpty() && subsets.size() <= 1) {
            specific.add("the facets together do not identify every measure" + context + " (rank deficiency "
                    + deficiency + "): some combination of elements always occurs together; add linking"
                    + " ratings or anchor elements");
        }
        out.addAll(specific);
        return out;
    }

    private static int expectedRank(int freeColumns, boolean anchoredFacet) {
        return anchoredFacet ? freeColumns : Math.max(0, freeColumns - 1);
    }

    private static boolean[][] presentElements(ModelDesign d) {
        boolean[][] present = new boolean[d.facetCount()][];
        for (int f = 0; f < d.facetCount(); f++) {
            present[f] = new boolean[d.elementCount(f)];
            for (int e : d.elements(f)) {
                present[f][e] = true;
            }
        }
        return present;
    }

    private static List<List<Integer>> columnsByFacet(int nF) {
        List<List<Integer>> cols = new ArrayList<>();
        for (int f = 0; f < nF; f++) {
            cols.add(new ArrayList<>());
        }
        return cols;
    }

    /** A = sum over candidates of (X_c'X_c - s_c s_c'/n_c) over the free non-candidate columns. */
    private static double[][] withinCandidateMatrix(ModelDesign d, int[][] column, int p) {
        int nF = d.facetCount();
        int[] cand = d.elements(0);
        int nC = d.elementCount(0);
        Grouping byCandidate = Grouping.of(cand, nC);
        int[] start = byCandidate.start();
        int[] order = byCandidate.order();
        double[][] a = new double[p][p];
        double[] s = new double[p];
        int[] touched = new int[p];
        int[] cols = new int[nF];
        for (int c = 0; c < nC; c++) {
            int nc = start[c + 1] - start[c];
            if (nc == 0) {
                continue;
            }
            int nt = 0;
            for (int i = start[c]; i < start[c + 1]; i++) {
                int n = order[i];
                int k = 0;
                for (int f = 1; f < nF; f++) {
                    int col = column[f][d.elements(f)[n]];
                    if (col >= 0) {
                        cols[k++] = col;
                    }
                }
                for (int x = 0; x < k; x++) {
                    for (int y = 0; y < k; y++) {
                        a[cols[x]][cols[y]] += 1;
                    }
                    if (s[cols[x]] == 0) {
                        touched[nt++] = cols[x];
                    }
                    s[cols[x]] += 1;
                }
            }
            for (int x = 0; x < nt; x++) {
                for (int y = 0; y < nt; y++) {
                    a[touched[x]][touched[y]] -= s[touched[x]] * s[touched[y]] / nc;
                }
            }
            for (int x = 0; x < nt; x++) {
                s[touched[x]] = 0;
            }
        }
        return a;
    }

    private static int rank(double[][] a, int[] cols) {
        if (cols.length == 0) {
            return 0;
        }
        double[][] sub = new double[cols.length][cols.length];
        for (int i = 0; i < cols.length; i++) {
            for (int j = 0; j < cols.length; j++) {
                sub[i][j] = a[cols[i]][cols[j]];
            }
        }
        double[] eig = new EigenDecomposition(new Array2DRowRealMatrix(sub, false)).getRealEigenvalues();
        double max = 0;
        for (double v : eig) {
            max = Math.max(max, Math.abs(v));
        }
        double tol = 1e-9 * Math.max(1.0, max) * cols.length;
        int r = 0;
        for (double v : eig) {
            if (v > tol) {
                r++;
            }
        }
        return r;
    }

    private static int[] concat(List<Integer> x, List<Integer> y) {
        int[] out = new int[x.size() + y.size()];
        int i = 0;
        for (int v : x) {
            out[i++] = v;
        }
        for (int v : y) {
            out[i++] = v;
        }
        return out;
    }

    private static String coOccurrence(ModelDesign d, int f, int g) {
        Map<Integer, java.util.TreeSet<Integer>> with = new TreeMap<>();
        int[] ef = d.elements(f);
        int[] eg = d.elements(g);
        for (int n = 0; n < d.observationCount(); n++) {
            with.computeIfAbsent(ef[n], k -> new java.util.TreeSet<>()).add(eg[n]);
        }
        boolean oneEach = with.values().stream().allMatch(s -> s.size() == 1);
        StringBuilder sb = new StringBuilder();
        int shown = 0;
        for (Map.Entry<Integer, java.util.TreeSet<Integer>> en : with.entrySet()) {
            if (shown++ == LABELS_SHOWN) {
                sb.append(", ...");
                break;
            }
            if (sb.length() > 0) {
                sb.append(", ");
            }
            sb.append(d.label(f, en.getKey())).append(" with ");
            List<String> ls = new ArrayList<>();
            for (int e : en.getValue()) {
                ls.add(d.label(g, e));
            }
            sb.append(String.join("/", ls));
        }
        return (oneEach ? "each " + d.facetName(f) + " occurs with only one " + d.facetName(g) + " ("
                : d.facetName(f) + " and " + d.facetName(g) + " occur only in linked blocks (") + sb + ")";
    }

    /** Union-find over all elements of all facets, joined by shared observations. */
    static List<List<int[]>> connectedSubsets(ModelDesign d) {
        int nF = d.facetCount();
        int[] offset = new int[nF + 1];
        for (int f = 0; f < nF; f++) {
            offset[f + 1] = offset[f] + d.elementCount(f);
        }
        int[] parent = new int[offset[nF]];
        for (int i = 0; i < parent.length; i++) {
            parent[i] = i;
        }
        boolean[] used = new boolean[offset[nF]];
        for (int n = 0; n < d.observationCount(); n++) {
            int root = find(parent, offset[0] + d.elements(0)[n]);
            used[offset[0] + d.elements(0)[n]] = true;
            for (int f = 1; f < nF; f++) {
                int id = offset[f] + d.elements(f)[n];
                used[id] = true;
                int r = find(parent, id);
                if (r != root) {
                    parent[r] = root;
                }
            }
        }
        Map<Integer, List<int[]>> groups = new LinkedHashMap<>();
        for (int f = 0; f < nF; f++) {
            for (int e = 0; e < d.elementCount(f); e++) {
                int id = offset[f] + e;
                if (used[id]) {
                    groups.computeIfAbsent(find(parent, id), k -> new ArrayList<>()).add(new int[] {f, e});
                }
            }
        }
        return new ArrayList<>(groups.values());
    }

    private static int find(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }

    private static String describeSubsets(ModelDesign d, List<List<int[]>> subsets, String context) {
        StringBuilder sb = new StringBuilder("the ratings fall into " + subsets.size()
                + " disconnected subsets" + context + ", so measures in different subsets are not on one scale: ");
        int shownSets = 0;
        for (List<int[]> set : subsets) {
            if (shownSets++ == LABELS_SHOWN) {
                sb.append(" ...");
                break;
            }
            sb.append("subset ").append(shownSets).append(" {");
            for (int f = 0; f < d.facetCount(); f++) {
                List<String> ls = new ArrayList<>();
                int count = 0;
                for (int[] fe : set) {
                    if (fe[0] == f) {
                        if (count++ < LABELS_SHOWN) {
                            ls.add(d.label(f, fe[1]));
                        }
                    }
                }
                if (count > 0) {
                    sb.append(f == 0 ? "" : "; ").append(d.facetName(f)).append(' ').append(count).append(": ")
                            .append(String.join(", ", ls)).append(count > LABELS_SHOWN ? ", ..." : "");
                }
            }
            sb.append("} ");
        }
        sb.append("- add ratings that link the subsets (e.g. a rater who rates in both), or anchor elements"
                + " in each subset to a common scale");
        return sb.toString();
    }
}
