package org.inkgate.admin.core.forms;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Stratified permuted-block allocation (Matts and Lachin 1988 [memory]): the checks are the
 * method's defining properties, as no outside table exists for a seeded allocation. Whole blocks
 * give the stated ratio exactly within each stratum; the places left over keep every condition
 * within one candidate of its share in the stratum, and the groups within one block overall.
 */
class ParallelAllocatorTest {

    private static final List<String> CONDITIONS = List.of("none", "spelling", "dictionary");

    /** Groups of {@code orders} forms per condition, as FormDesigner makes them for a parallel design. */
    private static List<FormSpec> forms(int conditions, int orders) {
        List<FormSpec> forms = new ArrayList<>();
        for (int c = 0; c < conditions; c++) {
            for (int o = 0; o < orders; o++) {
                forms.add(new FormSpec(String.format("F%02d", forms.size() + 1), List.of(new FormSlot("t" + o,
                        CONDITIONS.get(c), null)), null, null, 0));
            }
        }
        return forms;
    }

    private static List<ParallelAllocator.Candidate> candidates(int... perLevel) {
        List<ParallelAllocator.Candidate> out = new ArrayList<>();
        for (int level = 0; level < perLevel.length; level++) {
            for (int i = 0; i < perLevel[level]; i++) {
                out.add(new ParallelAllocator.Candidate(String.format("L%dC%03d", level, i), List.of("L" + level)));
            }
        }
        return out;
    }

    @Test
    void assign_strataOfWholeBlocks_giveTheStatedRatioExactlyInEveryStratum() {
        List<FormSpec> forms = forms(2, 2);
        List<ParallelAllocator.Candidate> people = candidates(12, 6, 24);
        Assignment a = ParallelAllocator.assign(people, forms, List.of(2, 1), 2, 11);
        AllocationCounts counts = AllocationCounts.of(a, people, forms, CONDITIONS.subList(0, 2), List.of(2, 1));
        Map<String, int[]> expected = Map.of("L0", new int[] {8, 4}, "L1", new int[] {4, 2}, "L2", new int[] {16, 8});
        expected.forEach((level, want) -> assertEquals(List.of(want[0], want[1]),
                List.of(counts.byStratum().get(level)[0], counts.byStratum().get(level)[1]), level));
        assertEquals(Map.of("F01", 14, "F02", 14, "F03", 7, "F04", 7), counts.byForm());
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18, 19, 20})
    void assign_leftoverPlaces_keepEachStratumWithinOneOfItsShareAndTheWholeWithinOneBlock(long seed) {
        List<Integer> ratio = List.of(2, 1, 1);
        List<FormSpec> forms = forms(3, 3);
        List<ParallelAllocator.Candidate> people = candidates(7, 5, 9, 13, 2, 11);
        Assignment a = ParallelAllocator.assign(people, forms, ratio, 3, seed);
        AllocationCounts counts = AllocationCounts.of(a, people, forms, CONDITIONS, ratio);
        counts.byStratum().forEach((stratum, row) -> {
            int n = java.util.Arrays.stream(row).sum();
            for (int i = 0; i < row.length; i++) {
                assertTrue(Math.abs(row[i] - n * ratio.get(i) / 4.0) < 1, stratum + " " + java.util.Arrays.toString(row));
            }
        });
        int[] all = counts.overall();
        for (int i = 0; i < all.length; i++) {
            assertTrue(Math.abs(all[i] - 47 * ratio.get(i) / 4.0) <= 1, java.util.Arrays.toString(all));
        }
        // task orders within each group: within one of even
        for (int c = 0; c < 3; c++) {
            List<Integer> perOrder = new ArrayList<>();
            for (int o = 0; o < 3; o++) {
                perOrder.add(counts.byForm().get(forms.get(c * 3 + o).id()));
            }
            assertTrue(java.util.Collections.max(perOrder) - java.util.Collections.min(perOrder) <= 1, perOrder.toString());
        }
    }

    @Test
    void assign_sameSeed_givesTheSameAllocation_otherSeedsOtherOnes() {
        List<FormSpec> forms = forms(3, 2);
        List<ParallelAllocator.Candidate> people = candidates(10, 14);
        Assignment first = ParallelAllocator.assign(people, forms, List.of(1, 1, 1), 2, 2026);
        assertEquals(first, ParallelAllocator.assign(new ArrayList<>(people.reversed()), forms, List.of(1, 1, 1), 2, 2026));
        assertNotEquals(first.rows(), ParallelAllocator.assign(people, forms, List.of(1, 1, 1), 2, 2027).rows());
    }

    /**
     * Randomness: over many seeds every candidate of a stratum of 7 at 2:1 joins the first group
     * with the same probability, 5/7 (two whole blocks give 4 of 6 places, the seventh goes to the
     * condition further below its share, the first). 4,000 seeds: standard error 0.0071, bound 5 SE.
     */
    @Test
    void assign_overManySeeds_everyCandidateJoinsAGroupWithTheSameProbability() {
        List<FormSpec> forms = forms(2, 1);
        List<ParallelAllocator.Candidate> people = candidates(7);
        Map<String, Integer> first = new HashMap<>();
        int seeds = 4000;
        for (long seed = 0; seed < seeds; seed++) {
            ParallelAllocator.assign(people, forms, List.of(2, 1), 1, seed).rows()
                    .forEach(r -> first.merge(r.candidateNumber(), r.formId().equals("F01") ? 1 : 0, Integer::sum));
        }
        double se = Math.sqrt(5.0 / 7 * 2 / 7 / seeds);
        first.forEach((candidate, n) -> assertEquals(5.0 / 7, (double) n / seeds, 5 * se, candidate));
    }
}
