package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Anchoring (issue 18): a run with an anchor file equals a fit with those parameters fixed.
 * Reference: src/test/resources/reference/mfrm_clogit_anchored.R (R 4.2.2, survival 3.5.3): the
 * anchors in mfrm_anchors.csv (task measures and rating-scale thresholds, invented values) as an
 * offset of a conditional logit on ratingscale-2000.csv; candidates free, raters centred; and each
 * anchored task's displacement at that fit; output mfrm_clogit_anchored.csv.
 */
class AnchoredReferenceTest {

    private static AnchorFile.Anchors anchors() throws Exception {
        try (InputStream in = AnchoredReferenceTest.class.getResourceAsStream("/reference/mfrm_anchors.csv")) {
            return AnchorFile.read(new InputStreamReader(in, StandardCharsets.UTF_8), "mfrm_anchors.csv");
        }
    }

    @Test
    void anchoredRun_equalsConditionalLogitWithTheAnchorsAsOffset() throws Exception {
        RatingData data = ReferenceFits.data("ratingscale-2000");
        MfrmOptions.Builder b = MfrmOptions.builder(List.of("task", "rater")).convergence(1e-7, 1e-6);
        List<String> left = anchors().applyTo(b, data, List.of("task", "rater"), new ScaleStructure.RatingScale());
        assertEquals(List.of(), left);
        MfrmResult r = ManyFacetRasch.analyse(data, b.build());
        Map<String, Map<String, double[]>> ref = PartialCreditJointSeTest.reference("mfrm_clogit_anchored.csv");
        for (String facet : List.of("candidate", "rater")) {
            for (MfrmResult.Element e : r.facet(facet).elements()) {
                if (e.status() == MfrmResult.Status.ESTIMATED) {
                    assertEquals(ref.get(facet).get(e.label())[0], e.measure(), 1e-5, facet + " " + e.label());
                }
            }
        }
        for (MfrmResult.Element e : r.facet("task").elements()) {
            assertEquals(MfrmResult.Status.ANCHORED, e.status(), "the report marks it anchored");
            assertEquals(ref.get("displacement").get(e.label())[0], e.displacement(), 1e-5, "displacement " + e.label());
        }
        assertEquals(-1.5, r.scales().get(0).categories().get(1).threshold(), 0.0);
        assertTrue(r.warnings().stream().noneMatch(w -> w.contains("displaced")), r.warnings().toString());
    }

    @Test
    void anchorFile_writtenByOneRun_readByTheNext_reproducesTheFreeFit() throws Exception {
        RatingData data = ReferenceFits.data("ratingscale-2000");
        MfrmResult free = ManyFacetRasch.analyse(data, MfrmOptions.builder(List.of("task", "rater")).build());
        StringWriter w = new StringWriter();
        AnchorFile.write(free, w);
        AnchorFile.Anchors a = AnchorFile.read(new StringReader(w.toString()), "written.csv");
        assertEquals(4, a.elements().get("task").size());
        assertEquals(5, a.elements().get("rater").size());
        MfrmOptions.Builder b = MfrmOptions.builder(List.of("task", "rater"));
        a.applyTo(b, data, List.of("task", "rater"), new ScaleStructure.RatingScale());
        MfrmResult anchored = ManyFacetRasch.analyse(data, b.build());
        for (int i = 0; i < free.facet("candidate").elements().size(); i++) {
            assertEquals(free.facet("candidate").elements().get(i).measure(),
                    anchored.facet("candidate").elements().get(i).measure(), 1e-3);
        }
        for (MfrmResult.Element e : anchored.facet("rater").elements()) {
            assertEquals(0, e.displacement(), 1e-3, "anchored at its own free estimate: nothing to displace");
        }
    }

    @Test
    void anchorFile_partialCredit_roundTripsElementsAndTheirThresholdSets() throws Exception {
        RatingData data = ReferenceFits.data("ratingscale-2000");
        ScaleStructure pcm = new ScaleStructure.PartialCredit("task");
        MfrmResult free = ManyFacetRasch.analyse(data, MfrmOptions.builder(List.of("task", "rater")).structure(pcm).build());
        StringWriter w = new StringWriter();
        AnchorFile.write(free, w);
        assertTrue(w.toString().contains("threshold,task,t3,2,2,"), w.toString());
        AnchorFile.Anchors a = AnchorFile.read(new StringReader(w.toString()), "written.csv");
        MfrmOptions.Builder b = MfrmOptions.builder(List.of("task", "rater")).structure(pcm);
        assertEquals(List.of(), a.applyTo(b, data, List.of("task", "rater"), pcm));
        MfrmResult anchored = ManyFacetRasch.analyse(data, b.build());
        for (int s = 0; s < free.scales().size(); s++) {
            for (int k = 1; k < free.scales().get(s).categories().size(); k++) {
                assertEquals(free.scales().get(s).categories().get(k).threshold(),
                        anchored.scales().get(s).categories().get(k).threshold(), 1e-12);
            }
        }
        for (MfrmResult.Element e : anchored.facet("task").elements()) {
            assertEquals(0, e.displacement(), 1e-3, e.label());
        }
        // the same file under the rating scale: the per-task threshold sets do not apply, and say so
        List<String> left = a.applyTo(MfrmOptions.builder(List.of("task", "rater")), data, List.of("task", "rater"),
                new ScaleStructure.RatingScale());
        assertEquals(4, left.size(), left.toString());
    }

    @Test
    void anchorFile_badRows_areRefusedWithRowAndColumn() {
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> AnchorFile.read(new StringReader(AnchorFile.HEADER + "\nelement,task,t1,,,abc\nstep,task,t1,,,1\n"
                        + "threshold,,all,2,2,0.5\n"), "a.csv"));
        assertTrue(e.getMessage().contains("a.csv, row 2, column measure: 'abc'"), e.getMessage());
        assertTrue(e.getMessage().contains("a.csv, row 3, column kind: 'step'"), e.getMessage());
        assertTrue(e.getMessage().contains("threshold set 'all' has steps [2]"), e.getMessage());
    }
}
