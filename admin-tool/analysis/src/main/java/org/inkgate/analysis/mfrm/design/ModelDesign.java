package org.inkgate.analysis.mfrm.design;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;

/**
 * The observations coded for the model: facet 0 is the candidate facet, facets 1.. the modelled
 * columns; each rating carries its category index (0..m of its threshold set) and its threshold set.
 * Arrays are indexed [facet][observation] so the estimation loop touches only primitives.
 */
public final class ModelDesign {
    private final String[] facetNames;
    private final String[][] labels;
    private final int[][] elem;
    private final int[] category;
    private final int[] scale;
    private final String[] scaleLabels;
    private final int[][] rawOfCategory;
    private final int[] rows;

    public ModelDesign(String[] facetNames, String[][] labels, int[][] elem, int[] category, int[] scale,
                       String[] scaleLabels, int[][] rawOfCategory, int[] rows) {
        this.facetNames = facetNames;
        this.labels = labels;
        this.elem = elem;
        this.category = category;
        this.scale = scale;
        this.scaleLabels = scaleLabels;
        this.rawOfCategory = rawOfCategory;
        this.rows = rows;
    }

    /**
     * Codes raw scores as categories "as observed" per threshold set: the distinct observed scores
     * in increasing order become categories 0..m. Returns notes on unobserved intermediate scores.
     *
     * @param scaleOfRow threshold set of each row (0 for rating scale)
     * @return per set, the raw score of each category
     */
    public static int[][] categoriesAsObserved(int[] raw, int[] scaleOfRow, int nScales, int[] categoryOut,
                                               String[] scaleLabels, List<String> notes, List<String> refusals) {
        List<TreeSet<Integer>> seen = new ArrayList<>();
        for (int s = 0; s < nScales; s++) {
            seen.add(new TreeSet<>());
        }
        for (int n = 0; n < raw.length; n++) {
            seen.get(scaleOfRow[n]).add(raw[n]);
        }
        int[][] rawOf = new int[nScales][];
        for (int s = 0; s < nScales; s++) {
            rawOf[s] = seen.get(s).stream().mapToInt(Integer::intValue).toArray();
            String name = nScales == 1 ? "the rating scale" : "the scale of '" + scaleLabels[s] + "'";
            if (rawOf[s].length < 2) {
                refusals.add(name + " has only one observed category (score "
                        + (rawOf[s].length == 0 ? "none" : rawOf[s][0]) + "); a Rasch model needs at least two "
                        + "categories: check the score column, or use the rating-scale structure if one "
                        + "partial-credit element is the problem");
                continue;
            }
            List<Integer> gaps = new ArrayList<>();
            for (int r = rawOf[s][0] + 1; r < rawOf[s][rawOf[s].length - 1]; r++) {
                if (!seen.get(s).contains(r)) {
                    gaps.add(r);
                }
            }
            if (!gaps.isEmpty()) {
                notes.add(name + ": score(s) " + gaps + " never observed between " + rawOf[s][0] + " and "
                        + rawOf[s][rawOf[s].length - 1] + "; categories are numbered as observed (scores "
                        + Arrays.toString(rawOf[s]) + " become categories 0.." + (rawOf[s].length - 1)
                        + "), so thresholds span the gap and the scale has fewer steps than the rubric");
            }
            if (rawOf[s][0] != 0) {
                notes.add(name + ": the lowest observed score is " + rawOf[s][0] + ", which becomes category 0");
            }
        }
        if (refusals.isEmpty()) {
            for (int n = 0; n < raw.length; n++) {
                categoryOut[n] = Arrays.binarySearch(rawOf[scaleOfRow[n]], raw[n]);
            }
        }
        return rawOf;
    }

    /** A design holding only the given observations (indices into this design). */
    public ModelDesign select(int[] keep) {
        int[][] e = new int[elem.length][keep.length];
        int[] c = new int[keep.length];
        int[] s = new int[keep.length];
        int[] r = new int[keep.length];
        for (int i = 0; i < keep.length; i++) {
            int n = keep[i];
            for (int f = 0; f < elem.length; f++) {
                e[f][i] = elem[f][n];
            }
            c[i] = category[n];
            s[i] = scale[n];
            r[i] = rows[n];
        }
        return new ModelDesign(facetNames, labels, e, c, s, scaleLabels, rawOfCategory, r);
    }

    public int facetCount() { return elem.length; }
    public int observationCount() { return category.length; }
    public String facetName(int f) { return facetNames[f]; }
    public String[] facetNames() { return facetNames.clone(); }
    public int elementCount(int f) { return labels[f].length; }
    public String label(int f, int e) { return labels[f][e]; }
    /** Element codes of facet f per observation; shared, do not modify. */
    public int[] elements(int f) { return elem[f]; }
    /** Category index per observation; shared, do not modify. */
    public int[] categories() { return category; }
    /** Threshold set per observation; shared, do not modify. */
    public int[] scales() { return scale; }
    public int scaleCount() { return rawOfCategory.length; }
    public String scaleLabel(int s) { return scaleLabels[s]; }
    /** Highest category index of threshold set s. */
    public int maxCategory(int s) { return rawOfCategory[s].length - 1; }
    /** Raw score of category k in threshold set s. */
    public int rawScore(int s, int k) { return rawOfCategory[s][k]; }
    /** Row of the input data each observation came from; shared, do not modify. */
    public int[] rows() { return rows; }
    /** The largest category count over all threshold sets. */
    public int maxCategoryOverall() {
        int m = 0;
        for (int[] r : rawOfCategory) {
            m = Math.max(m, r.length - 1);
        }
        return m;
    }
}
