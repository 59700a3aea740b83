package org.inkgate.admin.core.rating;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The rater-linking graph of a rating design: raters are nodes, and two raters are joined when
 * they rated the same response. Many-facet Rasch measurement places raters on one scale only when
 * this graph (with candidates) is connected (Linacre, "Many-Facet Rasch Measurement", 1989,
 * on connectedness; also Eckes 2015, "Introduction to Many-Facet Rasch Measurement", ch. 5).
 * Raters with no response are left out: they link nothing.
 */
public final class RaterLinks {

    /** The groups of raters that share responses with each other, and whether there is just one. */
    public record Report(List<List<String>> components, int[] componentOf) {
        public Report {
            components = components.stream().map(List::copyOf).toList();
        }

        /** True when every rater with work is linked to every other through shared responses. */
        public boolean connected() {
            return components.size() <= 1;
        }
    }

    private RaterLinks() {
    }

    /** The components of the graph; {@code responses} holds per response the indices of its raters in {@code raters}. */
    public static Report of(List<String> raters, List<int[]> responses) {
        int[] parent = new int[raters.size()];
        boolean[] used = new boolean[raters.size()];
        for (int i = 0; i < parent.length; i++) {
            parent[i] = i;
        }
        for (int[] r : responses) {
            for (int a : r) {
                used[a] = true;
                union(parent, r[0], a);
            }
        }
        Map<Integer, List<String>> groups = new TreeMap<>();
        int[] comp = new int[parent.length];
        for (int i = 0; i < parent.length; i++) {
            comp[i] = find(parent, i);
            if (used[i]) {
                groups.computeIfAbsent(comp[i], x -> new ArrayList<>()).add(raters.get(i));
            }
        }
        List<List<String>> out = new ArrayList<>(groups.values());
        out.forEach(g -> g.sort(null));
        out.sort((a, b) -> a.get(0).compareTo(b.get(0)));
        return new Report(out, comp);
    }

    /** The components of a stored design given as response key to its raters' ids. */
    public static Report ofRaterSets(Map<?, List<String>> ratersByResponse) {
        List<String> names = ratersByResponse.values().stream().flatMap(List::stream).distinct().sorted().toList();
        Map<String, Integer> index = new TreeMap<>();
        for (int i = 0; i < names.size(); i++) {
            index.put(names.get(i), i);
        }
        List<int[]> sets = new ArrayList<>();
        for (List<String> rs : ratersByResponse.values()) {
            sets.add(rs.stream().mapToInt(index::get).toArray());
        }
        return of(names, sets);
    }

    private static int find(int[] p, int i) {
        while (p[i] != i) {
            p[i] = p[p[i]];
            i = p[i];
        }
        return i;
    }

    private static void union(int[] p, int a, int b) {
        int ra = find(p, a);
        int rb = find(p, b);
        if (ra != rb) {
            p[Math.max(ra, rb)] = Math.min(ra, rb);
        }
    }
}
