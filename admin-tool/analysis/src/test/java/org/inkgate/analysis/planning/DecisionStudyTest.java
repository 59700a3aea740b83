package org.inkgate.analysis.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The D study against planning_reference.R (base R, the formulas of Brennan 2001, section 4.1,
 * over invented components). No published worked example is checked: none is remembered reliably
 * enough to cite its figures.
 */
class DecisionStudyTest {

    private static final VarianceComponents PILOT = new VarianceComponents(0.40, 0.02, 0.05, 0.04, 0.15, 0.01, 0.20);

    @Test
    void table_rReference_matchesEveryCell() {
        List<DecisionStudy> table = DecisionStudy.table(PILOT, new int[] {1, 2, 3}, new int[] {1, 2, 3});
        var r = PlanningReference.lines("dstudy");
        assertEquals(r.size(), table.size());
        for (int i = 0; i < table.size(); i++) {
            var m = r.get(i);
            var d = table.get(i);
            assertEquals(m.get("raters").intValue(), d.raters(), m.toString());
            assertEquals(m.get("tasks").intValue(), d.tasks(), m.toString());
            assertEquals(m.get("relative"), d.relativeError(), 1e-12, m.toString());
            assertEquals(m.get("absolute"), d.absoluteError(), 1e-12, m.toString());
            assertEquals(m.get("g"), d.generalizability(), 1e-12, m.toString());
            assertEquals(m.get("phi"), d.dependability(), 1e-12, m.toString());
        }
    }

    @Test
    void onlyCandidateVariance_givesPerfectCoefficients() {
        // no error variance at all: both coefficients are 1 (definition)
        var d = DecisionStudy.of(new VarianceComponents(1, 0, 0, 0, 0, 0, 0), 1, 1);
        assertEquals(1, d.generalizability(), 0);
        assertEquals(1, d.dependability(), 0);
    }

    @Test
    void dependability_neverAboveGeneralizability() {
        for (DecisionStudy d : DecisionStudy.table(PILOT, new int[] {1, 2, 5}, new int[] {1, 4})) {
            assertTrue(d.dependability() <= d.generalizability(), d.toString());
        }
    }

    @Test
    void negativeComponent_isRefusedWithTheCommonPractice() {
        var e = assertThrows(IllegalArgumentException.class, () -> new VarianceComponents(0.4, -0.01, 0, 0, 0, 0, 0.2));
        assertTrue(e.getMessage().contains("rater") && e.getMessage().contains("set a negative"), e.getMessage());
    }
}
