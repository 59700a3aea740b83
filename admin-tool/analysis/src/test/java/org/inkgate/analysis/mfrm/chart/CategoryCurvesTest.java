package org.inkgate.analysis.mfrm.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import org.inkgate.analysis.mfrm.MfrmResult;
import org.junit.jupiter.api.Test;

/** Category curves: one distinct colour (or colour and dash) per category, legend to match. */
class CategoryCurvesTest {

    @Test
    void tenCategories_everyCurveHasItsOwnColourOrDash() {
        // invented thresholds for a 0-9 scale (layout only)
        List<MfrmResult.Category> cats = new ArrayList<>();
        for (int k = 0; k <= 9; k++) {
            cats.add(new MfrmResult.Category(k, 10, 10, 0, 0, 1, k == 0 ? Double.NaN : -4.5 + k, 0.1, 0.1));
        }
        BufferedImage image = new BufferedImage(640, 400, BufferedImage.TYPE_INT_RGB);
        RecordingCanvas rec = new RecordingCanvas(image.createGraphics());
        CategoryCurves.paint(rec, new MfrmResult.Scale("rating scale", cats, List.of()), true);
        // each category: its curve, then its legend line in the same style
        assertEquals(20, rec.lines.size(), rec.lines.toString());
        List<String> curves = new ArrayList<>();
        for (int k = 0; k < 10; k++) {
            assertEquals(rec.lines.get(2 * k), rec.lines.get(2 * k + 1), "legend of score " + k);
            curves.add(rec.lines.get(2 * k));
        }
        assertEquals(10, new HashSet<>(curves).size(), "distinct: " + curves);
    }
}
