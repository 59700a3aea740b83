package org.inkgate.analysis.mfrm;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Loads the committed simulated data sets and the reference fits made by the R scripts beside them. */
public final class ReferenceFits {
    private ReferenceFits() {
    }

    public static RatingData data(String name) throws IOException {
        try (InputStream in = ReferenceFits.class.getResourceAsStream("/mfrm/reference/" + name + ".csv")) {
            return RatingCsvReader.read(new InputStreamReader(in, StandardCharsets.UTF_8), name + ".csv");
        }
    }

    /** facet -> element -> measure, from a file written by reference.R. */
    public static Map<String, Map<String, Double>> measures(String file) throws IOException {
        Map<String, Map<String, Double>> out = new LinkedHashMap<>();
        try (InputStream in = ReferenceFits.class.getResourceAsStream("/mfrm/reference/" + file)) {
            List<String> lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).lines().toList();
            for (String line : lines.subList(1, lines.size())) {
                String[] f = line.split(",");
                out.computeIfAbsent(f[0], k -> new LinkedHashMap<>()).put(f[1], Double.parseDouble(f[2]));
            }
        }
        return out;
    }

    /** Largest |difference| between the result's measures and the reference, over the named facets. */
    public static double compare(MfrmResult r, Map<String, Map<String, Double>> ref, List<String> facets) {
        double worst = 0;
        for (String facet : facets) {
            Map<String, Double> expected = ref.get(facet);
            List<MfrmResult.Element> els = r.facet(facet).elements();
            assertEquals(expected.size(), els.size(), facet + " element count");
            for (MfrmResult.Element e : els) {
                worst = Math.max(worst, Math.abs(e.measure() - expected.get(e.label())));
            }
        }
        return worst;
    }
}
