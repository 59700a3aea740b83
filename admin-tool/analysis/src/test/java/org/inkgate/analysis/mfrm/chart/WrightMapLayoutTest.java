package org.inkgate.analysis.mfrm.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.mfrm.MfrmResult;
import org.inkgate.analysis.mfrm.fit.Separation;
import org.junit.jupiter.api.Test;

/**
 * The Wright map's layout (issue 18): every element a point with its whisker on its own labelled
 * row, candidates as a distribution per level, partial-credit zones per element, and no two
 * labels overlapping, on a deliberately crowded invented result (layout only: the numbers are
 * made up to crowd the map, not estimates).
 */
class WrightMapLayoutTest {

    private static RecordingCanvas draw(MfrmResult r, Map<String, String> levels) {
        WrightMap.Layout layout = new WrightMap.Layout(r, levels);
        int h = (int) Math.ceil(layout.height());
        BufferedImage image = new BufferedImage(WrightMap.WIDTH, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        RecordingCanvas rec = new RecordingCanvas(g);
        WrightMap.paint(rec, layout);
        g.dispose();
        assertEquals(0, rec.turned, "the map's labels are all upright");
        for (Rectangle2D b : rec.boxes) {
            assertTrue(b.getMinX() >= 0 && b.getMaxX() <= WrightMap.WIDTH && b.getMinY() >= 0 && b.getMaxY() <= h,
                    "label inside the canvas " + WrightMap.WIDTH + " x " + h + ": " + b);
        }
        return rec;
    }

    private static void assertNoOverlap(RecordingCanvas rec) {
        for (int i = 0; i < rec.boxes.size(); i++) {
            for (int j = i + 1; j < rec.boxes.size(); j++) {
                Rectangle2D a = rec.boxes.get(i);
                Rectangle2D b = rec.boxes.get(j);
                // a shared edge is not an overlap; any area in common is
                Rectangle2D common = a.createIntersection(b);
                assertTrue(common.getWidth() <= 0.01 || common.getHeight() <= 0.01, "'" + rec.texts.get(i) + "' "
                        + a + " overlaps '" + rec.texts.get(j) + "' " + b);
            }
        }
    }

    private static MfrmResult.Element element(String label, MfrmResult.Status status, double measure, double se) {
        return new MfrmResult.Element(label, status, measure, se, se * 1.1, 40, 80, 80, 2, 1, 0, 1, 0, 0.3, 0, 80, 70, 90);
    }

    private static Separation separation() {
        return new Separation(2, 0, 1, 0.2, 1, 3, 0.9, 4, 10, 1, 0.01);
    }

    private static MfrmResult.Scale scale(String label, double... thresholds) {
        List<MfrmResult.Category> cats = new ArrayList<>();
        cats.add(new MfrmResult.Category(0, 10, 10, -1, -1, 1, Double.NaN, Double.NaN, Double.NaN));
        for (int k = 0; k < thresholds.length; k++) {
            cats.add(new MfrmResult.Category(k + 1, 10, 10, k, k, 1, thresholds[k], 0.1, 0.1));
        }
        return new MfrmResult.Scale(label, cats, List.of());
    }

    /** 300 candidates in five levels, 45 raters within 0.05 logit of each other with long names, partial credit. */
    private static MfrmResult crowded(Map<String, String> levels) {
        List<MfrmResult.Element> candidates = new ArrayList<>();
        for (int i = 0; i < 300; i++) {
            double m = -9 + 18.0 * ((i * 37) % 300) / 299;
            candidates.add(element("cand" + i, i == 0 ? MfrmResult.Status.EXTREME_MINIMUM
                    : MfrmResult.Status.ESTIMATED, m, 0.4));
            levels.put("cand" + i, "level " + (char) ('A' + i % 5));
        }
        List<MfrmResult.Element> raters = new ArrayList<>();
        for (int i = 0; i < 45; i++) {
            String name = i % 3 == 0 ? "rater with a very long name that cannot fit in the column " + i : "R" + i;
            raters.add(element(name, i == 1 ? MfrmResult.Status.ANCHORED : MfrmResult.Status.ESTIMATED,
                    0.001 * i, i == 2 ? 9 : 0.15));
        }
        List<MfrmResult.Element> criteria = new ArrayList<>();
        List<MfrmResult.Scale> scales = new ArrayList<>();
        for (int i = 0; i < 6; i++) {
            criteria.add(element("criterion " + i, MfrmResult.Status.ESTIMATED, 0.02 * i, 0.05));
            // crowded thresholds (zones too narrow for their numbers) and one disordered set
            scales.add(i == 5 ? scale("criterion " + i, 0.4, -0.2, 0.1, 0.3)
                    : scale("criterion " + i, -0.15, -0.05, 0.05, 0.15 + i));
        }
        List<MfrmResult.Facet> facets = List.of(
                new MfrmResult.Facet("candidate", candidates, separation(), null),
                new MfrmResult.Facet("rater", raters, separation(), separation()),
                new MfrmResult.Facet("criterion", criteria, separation(), separation()));
        return new MfrmResult(new MfrmResult.Model(List.of("candidate", "rater", "criterion"),
                "partial credit by criterion", 12000, 11900, false, 1, List.of()),
                new MfrmResult.Convergence(true, 10, 100, 0.001, 0.001, 0.01, 0.01), facets, scales, List.of(),
                List.of(), List.of());
    }

    @Test
    void crowdedPartialCredit_labelsNeverOverlap_everyElementHasAPointAndARow() {
        Map<String, String> levels = new HashMap<>();
        MfrmResult r = crowded(levels);
        RecordingCanvas rec = draw(r, levels);
        assertNoOverlap(rec);
        // one point per rater and criterion (the anchored rater is a square, the extreme candidate is in the bars)
        assertEquals(44 + 6, rec.points);
        for (String level : List.of("level A (60)", "level E (60)")) {
            assertTrue(rec.texts.contains(level), level + " in " + rec.texts);
        }
        assertTrue(rec.texts.contains("R44") && rec.texts.contains("criterion 5"), rec.texts.toString());
        assertTrue(rec.texts.stream().anyMatch(t -> t.startsWith("rater with a very long") && t.endsWith("\u2026")),
                "a long label is shortened with an ellipsis, not drawn over the plot");
        assertTrue(rec.texts.contains("disordered"), "the disordered threshold set is marked");
        // criterion 4's widest zone (score 4, from 0.15 + 4 logits on) is wide enough for its number
        assertTrue(rec.texts.contains("4"), rec.texts.toString());
    }

    @Test
    void crowdedRatingScale_labelsNeverOverlap() {
        Map<String, String> levels = new HashMap<>();
        MfrmResult pc = crowded(levels);
        MfrmResult r = new MfrmResult(new MfrmResult.Model(pc.model().facets(), "rating scale", 12000, 11900, false,
                1, List.of()), pc.convergence(), pc.facets(), List.of(scale("rating scale", -3, -1, 0.9, 1, 3.2)),
                List.of(), List.of(), List.of());
        RecordingCanvas rec = draw(r, Map.of());
        assertNoOverlap(rec);
        assertTrue(rec.texts.contains("all (300)"), "without levels: one distribution of all candidates");
        assertTrue(rec.texts.contains("scores"), rec.texts.toString());
    }

    @Test
    void realPartialCreditRun_labelsNeverOverlap_andEachCriterionHasItsZones() throws Exception {
        // simulated crossed design (RecoveryTest), anchored rater, partial credit by criterion
        MfrmResult r = org.inkgate.analysis.mfrm.ManyFacetRasch.analyse(
                org.inkgate.analysis.mfrm.RecoveryTestAccess.crossed(81),
                org.inkgate.analysis.mfrm.MfrmOptions.builder(List.of("task", "rater", "criterion"))
                        .structure(new org.inkgate.analysis.mfrm.ScaleStructure.PartialCredit("criterion"))
                        .anchor("rater", "rater1", 0.0).build());
        RecordingCanvas rec = draw(r, Map.of());
        assertNoOverlap(rec);
        assertTrue(rec.texts.contains("criterion (3 elements): each with its own score zones"), rec.texts.toString());
        assertTrue(rec.texts.contains("rater1") && rec.texts.contains("rater12"), rec.texts.toString());
        // kept under target/ for a look by eye
        java.nio.file.Path dir = java.nio.file.Path.of(System.getProperty("inkgate.tmpdir",
                System.getProperty("java.io.tmpdir")), "mfrm-charts");
        java.nio.file.Files.createDirectories(dir);
        java.nio.file.Files.write(dir.resolve("wright-map-partial-credit.png"), WrightMap.drawing(r).png());
    }
}
