package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.inkgate.analysis.mfrm.chart.BiasChart;
import org.inkgate.analysis.mfrm.chart.CategoryCurves;
import org.inkgate.analysis.mfrm.chart.WrightMap;
import org.junit.jupiter.api.Test;

/** Charts render headless as SVG and PNG and carry the elements they should show. */
class ChartTest {
    private static final byte[] PNG_SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n'};

    @Test
    void charts_ofAnAnalysis_renderSvgAndPng() throws IOException {
        MfrmResult r = ManyFacetRasch.analyse(RecoveryTest.crossed(81).data,
                MfrmOptions.builder(List.of("task", "rater", "criterion")).bias("rater", "task").build());
        String map = WrightMap.svg(r);
        assertTrue(map.startsWith("<svg"), map.substring(0, 40));
        assertTrue(map.contains("rater12") && map.contains("criterion3") && map.contains("thresholds"));
        assertTrue(map.contains("Wright map"));
        String curves = CategoryCurves.svg(r, 0);
        assertTrue(curves.contains("score 4"));
        String bias = BiasChart.svg(r.bias().get(0));
        assertTrue(bias.contains("Bias: rater x task"), bias.substring(0, 300));
        byte[] png = WrightMap.png(r);
        assertArrayEquals(PNG_SIGNATURE, Arrays.copyOf(png, 8));
        assertArrayEquals(PNG_SIGNATURE, Arrays.copyOf(CategoryCurves.png(r, 0), 8));
        assertArrayEquals(PNG_SIGNATURE, Arrays.copyOf(BiasChart.png(r.bias().get(0)), 8));
        // kept under target/ for a look by eye
        Path dir = Path.of(System.getProperty("inkgate.tmpdir", System.getProperty("java.io.tmpdir")), "mfrm-charts");
        Files.createDirectories(dir);
        Files.writeString(dir.resolve("wright-map.svg"), map);
        Files.write(dir.resolve("wright-map.png"), png);
        Files.write(dir.resolve("category-curves.png"), CategoryCurves.png(r, 0));
        Files.write(dir.resolve("bias.png"), BiasChart.png(r.bias().get(0)));
    }
}
