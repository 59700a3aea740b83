package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.inkgate.analysis.mfrm.fit.MeanSquares;
import org.inkgate.analysis.mfrm.fit.Separation;
import org.junit.jupiter.api.Test;

/** Relations stated in the literature, checked on our implementation. */
class TextbookRelationsTest {

    @Test
    void separation_reliabilityAndStrata_followTheirDefinitions() {
        // Wright & Masters 1982 ch. 5 / Wright 1996, RMT 9:4 [memory]: G = 2 gives R = 0.8 and
        // (4G+1)/3 = 3 strata; G = 3 gives R = 0.9 and 4.33 strata
        assertEquals(0.8, Separation.reliabilityOf(2), 1e-12);
        assertEquals(3.0, Separation.strataOf(2), 1e-12);
        assertEquals(0.9, Separation.reliabilityOf(3), 1e-12);
        assertEquals(13.0 / 3, Separation.strataOf(3), 1e-12);
    }

    @Test
    void separation_ofMeasures_trueVarianceIsObservedMinusErrorVariance() {
        // observed SD^2 = true SD^2 + RMSE^2 (Wright & Masters 1982, ch. 5): measures with
        // population SD sqrt(1.25) and every SE 0.5 have true SD 1, G = 2, R = 0.8
        double[] m = {-1.5, -0.5, 0.5, 1.5};
        double[] se = {0.5, 0.5, 0.5, 0.5};
        Separation s = Separation.of(m, se);
        assertEquals(Math.sqrt(1.25), s.sd(), 1e-12);
        assertEquals(1.0, s.trueSd(), 1e-12);
        assertEquals(2.0, s.separation(), 1e-12);
        assertEquals(0.8, s.reliability(), 1e-12);
        assertEquals(s.trueSd() * s.trueSd() / (s.sd() * s.sd()), s.reliability(), 1e-12);
        // fixed chi-square: sum w D^2 - (sum w D)^2 / sum w with w = 4: 4 * 5 = 20 on 3 df;
        // upper tail of chi-square(3) at 20 = 1.697424356e-4 (R 4.2.2: pchisq(20, 3, lower.tail = FALSE))
        assertEquals(20.0, s.chiSquare(), 1e-12);
        assertEquals(3, s.df());
        assertEquals(1.697424356e-4, s.p(), 1e-12);
    }

    @Test
    void wilsonHilferty_meanSquareOfOne_isNearZero() {
        // t = (MnSq^(1/3) - 1)(3/q) + q/3 (Wright & Masters 1982, p. 100): at MnSq 1 only the
        // small q/3 term is left, e.g. q = 0.3 gives 0.1
        assertEquals(0.1, MeanSquares.standardise(1.0, 0.3), 1e-12);
        assertTrue(Math.abs(MeanSquares.standardise(1.0, 0.1)) < 0.05);
        // a mean-square of 1.5 with q = 0.2: (1.5^(1/3) - 1) * 15 + 0.2/3 = 2.237380305 (R 4.2.2 arithmetic)
        assertEquals(2.237380305, MeanSquares.standardise(1.5, 0.2), 1e-9);
    }

    @Test
    void fit_ratingsSimulatedFromTheModel_giveMeanSquaresNearOne() {
        // data that fit the model have expected infit and outfit mean-squares of 1 (Wright &
        // Masters 1982, ch. 5); over 12 raters with 1,350 ratings each the mean is close to 1
        MfrmResult r = ManyFacetRasch.analyse(RecoveryTest.crossed(71).data,
                MfrmOptions.builder(java.util.List.of("task", "rater", "criterion")).build());
        double infit = r.facet("rater").elements().stream().mapToDouble(MfrmResult.Element::infit).average().orElseThrow();
        double outfit = r.facet("rater").elements().stream().mapToDouble(MfrmResult.Element::outfit).average().orElseThrow();
        assertEquals(1.0, infit, 0.05);
        assertEquals(1.0, outfit, 0.05);
    }
}
