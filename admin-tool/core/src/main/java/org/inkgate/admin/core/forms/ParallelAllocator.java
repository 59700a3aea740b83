package org.inkgate.admin.core.forms;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.SplittableRandom;
import java.util.TreeMap;

/**
 * Randomises candidates of a parallel (between-candidates) study to conditions, stratified,
 * seeded and reproducible: stratified permuted-block allocation (Matts, J. P. and Lachin, J. M.
 * (1988). Properties of permuted-block randomization in clinical trials. Controlled Clinical
 * Trials 9, 327-344 [memory]).
 *
 * <p>Within each stratum (level, and the named roster attributes) the candidates are shuffled
 * with the seed and take conditions from whole permuted blocks of the allocation ratio (a block
 * of 2:1 holds two places of the first condition and one of the second, in a random order), so
 * each whole block gives the stated ratio exactly. The places left over after whole blocks go so
 * that every condition stays within one candidate of its share in the stratum, the extra places
 * to the conditions furthest below their share over all strata so far (ties drawn with the seed),
 * which keeps the overall counts within one block of the ratio. Inside a condition's group the
 * candidates are spread over the task orders in turn, continuing from stratum to stratum, so
 * each order's count is within one of even in every stratum and overall.
 */
public final class ParallelAllocator {

    /**
     * A candidate to place.
     *
     * @param stratum the level first, then the values of the attributes stratified by
     */
    public record Candidate(String candidateNumber, List<String> stratum) {
        public Candidate {
            stratum = List.copyOf(stratum);
        }

        public String level() {
            return stratum.get(0);
        }
    }

    private ParallelAllocator() {
    }

    /**
     * Assigns each candidate a form: group {@code i}'s forms are {@code forms[i * orders ...
     * i * orders + orders - 1]}, in the order {@link FormDesigner#forms} makes them.
     *
     * @param ratio   allocation ratio, one whole number per condition
     * @param orders  task orders per condition group
     */
    public static Assignment assign(List<Candidate> candidates, List<org.inkgate.format.bundle.FormSpec> forms,
            List<Integer> ratio, int orders, long seed) {
        int conditions = ratio.size();
        if (forms.size() != conditions * orders) {
            throw new IllegalArgumentException(forms.size() + " forms are not " + conditions + " groups of " + orders);
        }
        SplittableRandom random = new SplittableRandom(seed);
        int block = ratio.stream().mapToInt(Integer::intValue).sum();
        Map<List<String>, List<Candidate>> strata = new TreeMap<>(ParallelAllocator::compareStrata);
        candidates.stream().sorted(Comparator.comparing(Candidate::candidateNumber))
                .forEach(c -> strata.computeIfAbsent(c.stratum(), k -> new ArrayList<>()).add(c));
        int[] overall = new int[conditions];
        int[] nextOrder = new int[conditions];
        for (int i = 0; i < conditions; i++) {
            nextOrder[i] = random.nextInt(orders);
        }
        List<Assignment.Row> rows = new ArrayList<>();
        for (List<Candidate> members : strata.values()) {
            List<Candidate> shuffled = new ArrayList<>(members);
            Collections.shuffle(shuffled, new Random(random.nextLong()));
            int n = shuffled.size();
            List<Integer> places = new ArrayList<>(n);
            Random blocks = new Random(random.nextLong());
            for (int b = 0; b < n / block; b++) {
                List<Integer> permuted = template(ratio);
                Collections.shuffle(permuted, blocks);
                places.addAll(permuted);
            }
            places.addAll(remainder(n % block, ratio, overall, n / block, sum(overall) + n, random));
            places.forEach(i -> overall[i]++);
            Collections.shuffle(places, blocks);
            for (int p = 0; p < n; p++) {
                int condition = places.get(p);
                int form = condition * orders + nextOrder[condition];
                nextOrder[condition] = (nextOrder[condition] + 1) % orders;
                Candidate c = shuffled.get(p);
                rows.add(new Assignment.Row(c.candidateNumber(), c.level(), forms.get(form).id()));
            }
        }
        rows.sort(Comparator.comparing(Assignment.Row::candidateNumber));
        return new Assignment(seed, rows);
    }

    private static List<Integer> template(List<Integer> ratio) {
        List<Integer> t = new ArrayList<>();
        for (int i = 0; i < ratio.size(); i++) {
            t.addAll(Collections.nCopies(ratio.get(i), i));
        }
        return t;
    }

    /**
     * The {@code r} places left after whole blocks: each condition its whole share of r, the
     * places still open to the fractional shares furthest below their share of all candidates
     * placed once this stratum is done.
     */
    private static List<Integer> remainder(int r, List<Integer> ratio, int[] overall, int fullBlocks, int totalAfter,
            SplittableRandom random) {
        int block = ratio.stream().mapToInt(Integer::intValue).sum();
        List<Integer> out = new ArrayList<>();
        List<Integer> open = new ArrayList<>();
        double[] deficit = new double[ratio.size()];
        for (int i = 0; i < ratio.size(); i++) {
            int whole = r * ratio.get(i) / block;
            out.addAll(Collections.nCopies(whole, i));
            if (r * ratio.get(i) % block != 0) {
                open.add(i);
            }
            int without = overall[i] + fullBlocks * ratio.get(i) + whole;
            deficit[i] = (double) totalAfter * ratio.get(i) / block - without;
        }
        Collections.shuffle(open, new Random(random.nextLong()));
        open.sort(Comparator.comparingDouble((Integer i) -> -deficit[i]));
        for (int k = 0; out.size() < r; k++) {
            out.add(open.get(k));
        }
        return out;
    }

    private static int sum(int[] values) {
        int s = 0;
        for (int v : values) {
            s += v;
        }
        return s;
    }

    private static int compareStrata(List<String> a, List<String> b) {
        for (int i = 0; i < Math.min(a.size(), b.size()); i++) {
            int c = a.get(i).compareTo(b.get(i));
            if (c != 0) {
                return c;
            }
        }
        return Integer.compare(a.size(), b.size());
    }
}
