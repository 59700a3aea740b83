package org.inkgate.analysis.mfrm.design;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Says why a facet cannot be separated from candidates, from the data rather than a guess. With
 * candidates absorbed, two elements of a facet are compared only through candidates who met both;
 * the elements linked that way fall into groups, and each group beyond the first (without an
 * anchor) loses one degree of freedom: the facet's rank deficiency. Either every candidate met one
 * element only (the facet describes candidates, like a level), or the elements fall into groups
 * that share no candidate (raters who each rated their own batch of candidates).
 */
final class CandidateLinks {
    private static final int SHOWN = 6;

    private CandidateLinks() {
    }

    static String describe(ModelDesign d, int f, boolean[] anchored, int deficiency, String context) {
        String name = d.facetName(f);
        int nE = d.elementCount(f);
        int nC = d.elementCount(0);
        int[] cand = d.elements(0);
        int[] el = d.elements(f);
        int[] parent = new int[nE];
        for (int e = 0; e < nE; e++) {
            parent[e] = e;
        }
        int[] firstOf = new int[nC];
        java.util.Arrays.fill(firstOf, -1);
        boolean[] several = new boolean[nC];
        boolean[] present = new boolean[nE];
        for (int n = 0; n < d.observationCount(); n++) {
            int c = cand[n];
            int e = el[n];
            present[e] = true;
            if (firstOf[c] < 0) {
                firstOf[c] = e;
            } else if (firstOf[c] != e) {
                several[c] = true;
                parent[find(parent, e)] = find(parent, firstOf[c]);
            }
        }
        boolean anySeveral = false;
        for (boolean b : several) {
            anySeveral |= b;
        }
        String head = "facet '" + name + "' cannot be separated from candidates" + context + " (rank deficiency "
                + deficiency + "): ";
        if (!anySeveral) {
            return head + "each candidate met only one " + name + "; if '" + name + "' describes candidates (such"
                    + " as a proficiency level), drop it from the facets and use it as a grouping column in a bias"
                    + " pair, or anchor its elements";
        }
        Map<Integer, List<Integer>> groups = new LinkedHashMap<>();
        for (int e = 0; e < nE; e++) {
            if (present[e]) {
                groups.computeIfAbsent(find(parent, e), k -> new ArrayList<>()).add(e);
            }
        }
        int[] candidates = new int[nE];
        for (int c = 0; c < nC; c++) {
            if (firstOf[c] >= 0) {
                candidates[find(parent, firstOf[c])]++;
            }
        }
        StringBuilder sb = new StringBuilder(head).append("its elements fall into ").append(groups.size())
                .append(" groups that share no candidate, so a difference between the groups cannot be told from"
                        + " a difference between their candidates: ");
        int shown = 0;
        for (Map.Entry<Integer, List<Integer>> g : groups.entrySet()) {
            if (shown++ == SHOWN) {
                sb.append(", ...");
                break;
            }
            if (shown > 1) {
                sb.append(", ");
            }
            List<String> labels = new ArrayList<>();
            boolean hasAnchor = false;
            for (int e : g.getValue()) {
                hasAnchor |= anchored[e];
                if (labels.size() < SHOWN) {
                    labels.add(d.label(f, e));
                }
            }
            sb.append('{').append(String.join(", ", labels)).append(g.getValue().size() > SHOWN ? ", ..." : "")
                    .append("} with ").append(candidates[g.getKey()]).append(" candidate(s)")
                    .append(hasAnchor ? " (anchored)" : "");
        }
        return sb.append(". Add ratings that link the groups (e.g. a ").append(name)
                .append(" who also rates candidates of another group), or anchor one element in each group").toString();
    }

    private static int find(int[] parent, int i) {
        while (parent[i] != i) {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }
}
