package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Designs that cannot identify the measures are refused before estimating, naming the cause. */
class RefusalTest {

    private static Simulation twoIslands() {
        // candidates 0-99 only meet raters 1-3, candidates 100-199 only raters 4-6: two islands
        return Simulation.run(5, 200, 0, 1, List.of("task", "rater"),
                new double[][] {Simulation.spread(2, 0.3), Simulation.spread(6, 0.8)}, new double[] {-1, 0, 1},
                (c, rng) -> {
                    List<int[]> rows = new ArrayList<>();
                    int base = c < 100 ? 0 : 3;
                    for (int r = 0; r < 3; r++) {
                        rows.add(new int[] {c % 2, base + r});
                    }
                    return rows;
                });
    }

    @Test
    void analyse_disconnectedRaterGroups_isRefusedNamingTheSubsets() {
        // tasks are crossed with both groups... only through different candidates: task t1 for even
        // candidates, t2 for odd, in both islands, so the islands are joined through tasks; make
        // tasks island-specific too by modelling raters only
        MfrmRefusedException e = assertThrows(MfrmRefusedException.class,
                () -> ManyFacetRasch.analyse(twoIslands().data, MfrmOptions.builder(List.of("rater")).build()));
        String all = String.join(" | ", e.reasons());
        assertTrue(all.contains("2 disconnected subsets"), all);
        assertTrue(all.contains("rater1") && all.contains("rater4"), all);
    }

    @Test
    void analyse_raterGroupsJoinedOnlyThroughTasks_isRefusedNamingTheRaterGroupsNotOneRaterEach() {
        // issue 18: every candidate met three raters, but raters 1-3 and 4-6 share no candidate;
        // the tasks join the islands, so there is one connected subset, and the refusal used to say
        // "each candidate met only one rater". The groups are read off twoIslands() above.
        MfrmRefusedException e = assertThrows(MfrmRefusedException.class, () -> ManyFacetRasch.analyse(
                twoIslands().data, MfrmOptions.builder(List.of("task", "rater")).build()));
        String all = String.join(" | ", e.reasons());
        assertTrue(all.contains("facet 'rater' cannot be separated from candidates"), all);
        assertTrue(all.contains("2 groups that share no candidate"), all);
        assertTrue(all.contains("{rater1, rater2, rater3} with 100 candidate(s)"), all);
        assertTrue(all.contains("{rater4, rater5, rater6} with 100 candidate(s)"), all);
        assertTrue(!all.contains("only one rater") && !all.contains("disconnected subsets"), all);
    }

    @Test
    void analyse_disconnectedGroupsAnchoredInEachSubset_isEstimated() {
        MfrmOptions o = MfrmOptions.builder(List.of("rater")).anchor("rater", "rater1", -0.8)
                .anchor("rater", "rater4", 0.16).build();
        MfrmResult r = ManyFacetRasch.analyse(twoIslands().data, o);
        assertTrue(r.convergence().converged());
        assertEquals(-0.8, r.facet("rater").elements().stream().filter(x -> x.label().equals("rater1"))
                .findFirst().orElseThrow().measure(), 0.0);
    }

    @Test
    void analyse_taskAlwaysWithSameCondition_isRefusedAsConfounded() {
        // task 1 always under condition 1 and task 2 under condition 2: not counterbalanced
        Simulation sim = Simulation.run(6, 120, 0, 1, List.of("task", "condition", "rater"),
                new double[][] {Simulation.spread(2, 0.3), Simulation.spread(2, 0.2), Simulation.spread(4, 0.5)},
                new double[] {-1, 0, 1}, (c, rng) -> {
                    List<int[]> rows = new ArrayList<>();
                    for (int t = 0; t < 2; t++) {
                        for (int r = 0; r < 4; r++) {
                            rows.add(new int[] {t, t, r});
                        }
                    }
                    return rows;
                });
        MfrmRefusedException e = assertThrows(MfrmRefusedException.class, () -> ManyFacetRasch.analyse(sim.data,
                MfrmOptions.builder(List.of("task", "condition", "rater")).build()));
        String all = String.join(" | ", e.reasons());
        assertTrue(all.contains("'task' and 'condition' are confounded"), all);
        assertTrue(all.contains("each task occurs with only one condition"), all);
        // the same ratings with counterbalanced forms would be accepted; with one of the two
        // facets left out they are accepted too
        MfrmResult r = ManyFacetRasch.analyse(sim.data, MfrmOptions.builder(List.of("task", "rater")).build());
        assertTrue(r.convergence().converged());
    }

    @Test
    void analyse_candidateAttributeAsFacet_isRefusedAsNestedInCandidates() {
        RatingData.Builder b = RatingData.builder(List.of("level", "rater"));
        String[] levels = {"B1", "B2"};
        java.util.Random rng = new java.util.Random(7);
        for (int c = 0; c < 40; c++) {
            for (int r = 0; r < 3; r++) {
                b.add("c" + c, new String[] {levels[c % 2], "r" + r}, rng.nextInt(4));
            }
        }
        MfrmRefusedException e = assertThrows(MfrmRefusedException.class, () -> ManyFacetRasch.analyse(b.build(),
                MfrmOptions.builder(List.of("level", "rater")).build()));
        assertTrue(e.reasons().get(0).contains("'level' cannot be separated from candidates"), e.reasons().toString());
    }

    @Test
    void analyse_singleObservedCategory_isRefused() {
        RatingData.Builder b = RatingData.builder(List.of("rater"));
        for (int c = 0; c < 10; c++) {
            b.add("c" + c, new String[] {"r" + (c % 3)}, 2);
        }
        MfrmRefusedException e = assertThrows(MfrmRefusedException.class,
                () -> ManyFacetRasch.analyse(b.build(), MfrmOptions.builder(List.of("rater")).build()));
        assertTrue(e.reasons().get(0).contains("only one observed category (score 2)"), e.reasons().toString());
    }

    @Test
    void options_unknownFacetOrAnchor_isRejectedWithTheName() {
        RatingData d = RecoveryTest.crossed(1).data;
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ManyFacetRasch.analyse(d, MfrmOptions.builder(List.of("rater", "room")).build()));
        assertTrue(e.getMessage().contains("unknown column 'room'"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> ManyFacetRasch.analyse(d,
                MfrmOptions.builder(List.of("rater")).anchor("rater", "rater99", 0).build()));
        assertTrue(e.getMessage().contains("'rater99'"), e.getMessage());
    }
}
