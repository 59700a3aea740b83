package org.inkgate.admin.core.forms;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.SplittableRandom;

/**
 * Chooses, for each level, which forms take the candidates left over after whole rounds of all
 * forms (one each, so forms stay at most one apart within the level), so that the margins of
 * {@link BalanceMargins} are as even as they can be within every level and over the whole roster
 * together ({@link Imbalance} ranks them).
 *
 * <p>Two starts are improved level by level (each level's choice replaced by the best one given the
 * others, until no level improves): a greedy one, level after level, and the block construction of
 * the earlier assigner (whole blocks of consecutive forms plus consecutive forms of one block, the
 * partial block continuing across levels), which keeps every task's counts under the conditions at
 * most one apart within each level and overall. The better result is kept, so that guarantee holds
 * whatever the search finds. The candidate subsets are all subsets of the right size when there are
 * at most {@value #ALL_SUBSETS} of them, else that many drawn with the seed.
 */
final class LeftoverSearch {

    static final int ALL_SUBSETS = 20_000;
    private static final int MAX_PASSES = 50;

    private final int forms;
    private final int blockSize;
    private final List<BalanceMargins.Margin> margins;
    private final SplittableRandom random;
    private final Map<Integer, List<int[]>> candidates = new HashMap<>();
    private final Map<int[], Imbalance> levelCost = new HashMap<>();

    LeftoverSearch(int forms, int blockSize, List<BalanceMargins.Margin> margins, SplittableRandom random) {
        this.forms = forms;
        this.blockSize = blockSize;
        this.margins = margins;
        this.random = random;
    }

    /** Per level (in the order given), the forms that take one more candidate. */
    List<int[]> choose(int[] leftovers) {
        List<int[]> blocks = descend(blockStart(leftovers), leftovers);
        List<int[]> greedy = descend(greedyStart(leftovers), leftovers);
        return total(greedy).compareTo(total(blocks)) <= 0 ? greedy : blocks;
    }

    private List<int[]> candidates(int r) {
        return candidates.computeIfAbsent(r, size -> {
            List<int[]> out = new ArrayList<>();
            if (binomialAtMost(forms, size, ALL_SUBSETS)) {
                enumerate(new int[size], 0, 0, out);
            } else {
                Set<List<Integer>> seen = new HashSet<>();
                Random draw = new Random(random.nextLong());
                List<Integer> all = new ArrayList<>();
                for (int f = 0; f < forms; f++) {
                    all.add(f);
                }
                while (out.size() < ALL_SUBSETS) {
                    Collections.shuffle(all, draw);
                    List<Integer> pick = new ArrayList<>(all.subList(0, size));
                    Collections.sort(pick);
                    if (seen.add(pick)) {
                        out.add(pick.stream().mapToInt(Integer::intValue).toArray());
                    }
                }
            }
            Collections.shuffle(out, new Random(random.nextLong()));
            return out;
        });
    }

    private void enumerate(int[] pick, int at, int from, List<int[]> out) {
        if (at == pick.length) {
            out.add(pick.clone());
            return;
        }
        for (int f = from; f <= forms - (pick.length - at); f++) {
            pick[at] = f;
            enumerate(pick, at + 1, f + 1, out);
        }
    }

    private static boolean binomialAtMost(int n, int k, long limit) {
        long c = 1;
        for (int i = 1; i <= k; i++) {
            c = c * (n - k + i) / i;
            if (c > limit) {
                return false;
            }
        }
        return true;
    }

    private Imbalance levelCost(int[] subset) {
        return levelCost.computeIfAbsent(subset, s -> Imbalance.of(counts(s), margins, false));
    }

    private int[] counts(int[] subset) {
        int[] x = new int[forms];
        for (int f : subset) {
            x[f]++;
        }
        return x;
    }

    private Imbalance total(List<int[]> chosen) {
        Imbalance sum = Imbalance.NONE;
        int[] overall = new int[forms];
        for (int[] s : chosen) {
            sum = sum.plus(levelCost(s));
            for (int f : s) {
                overall[f]++;
            }
        }
        return sum.plus(Imbalance.of(overall, margins, true));
    }

    private List<int[]> greedyStart(int[] leftovers) {
        List<int[]> chosen = new ArrayList<>();
        for (int r : leftovers) {
            int[] best = null;
            Imbalance bestCost = null;
            for (int[] c : candidates(r)) {
                chosen.add(c);
                Imbalance cost = total(chosen);
                chosen.removeLast();
                if (bestCost == null || cost.compareTo(bestCost) < 0) {
                    best = c;
                    bestCost = cost;
                }
            }
            chosen.add(best);
        }
        return chosen;
    }

    /** The earlier assigner's leftovers: whole blocks taken in turn, the rest from one block's consecutive forms. */
    private List<int[]> blockStart(int[] leftovers) {
        int blocks = forms / blockSize;
        int partialBlock = random.nextInt(blocks);
        int shift = random.nextInt(blockSize);
        List<Integer> others = new ArrayList<>();
        for (int b = 0; b < blocks; b++) {
            if (b != partialBlock) {
                others.add(b);
            }
        }
        Collections.shuffle(others, new Random(random.nextLong()));
        int nextOther = 0;
        List<int[]> chosen = new ArrayList<>();
        for (int left : leftovers) {
            List<Integer> picks = new ArrayList<>();
            for (int b = 0; b < left / blockSize; b++) {
                int block = others.get(nextOther++ % others.size());
                for (int s = 0; s < blockSize; s++) {
                    picks.add(block * blockSize + s);
                }
            }
            for (int i = 0; i < left % blockSize; i++) {
                picks.add(partialBlock * blockSize + shift);
                shift = (shift + 1) % blockSize;
            }
            chosen.add(picks.stream().mapToInt(Integer::intValue).sorted().toArray());
        }
        return chosen;
    }

    private List<int[]> descend(List<int[]> start, int[] leftovers) {
        List<int[]> chosen = new ArrayList<>(start);
        Imbalance current = total(chosen);
        for (int pass = 0; pass < MAX_PASSES; pass++) {
            boolean improved = false;
            for (int level = 0; level < leftovers.length; level++) {
                if (leftovers[level] == 0) {
                    continue;
                }
                int[] keep = chosen.get(level);
                for (int[] c : candidates(leftovers[level])) {
                    chosen.set(level, c);
                    Imbalance cost = total(chosen);
                    if (cost.compareTo(current) < 0) {
                        current = cost;
                        keep = c;
                        improved = true;
                    }
                }
                chosen.set(level, keep);
            }
            if (!improved) {
                break;
            }
        }
        return chosen;
    }
}
