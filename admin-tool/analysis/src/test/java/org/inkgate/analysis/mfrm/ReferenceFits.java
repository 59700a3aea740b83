package org.inkgate.analysis.mfrm;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Loads the committed simulated data sets and the reference fits made by reference.R. */
final class ReferenceFits {
    private ReferenceFits() {
    }

    static RatingData data(String name) throws IOException {
        try (InputStream in = ReferenceFits.class.getResourceAsStream("/mfrm/reference/" + name + ".csv")) {
            return RatingCsvReader.read(new InputStreamReader(in, StandardCharsets.UTF_8), name + ".csv");
        }
    }

    /** facet -> element -> measure, from a file written by reference.R. */
    static Map<String, Map<String, Double>> measures(String file) throws IOException {
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
}
