package org.inkgate.analysis.planning;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The lines of src/test/resources/reference/planning_reference.txt, written by planning_reference.R
 * (R 4.2.2, base stats only): each line a name then key value pairs.
 */
public final class PlanningReference {

    private PlanningReference() {
    }

    /** Every line with this name, as key to value maps, in the file's order. */
    public static List<Map<String, Double>> lines(String name) {
        List<Map<String, Double>> out = new ArrayList<>();
        for (String line : text().split("\\R")) {
            String[] w = line.trim().split("\\s+");
            if (!w[0].equals(name)) {
                continue;
            }
            Map<String, Double> m = new HashMap<>();
            for (int i = 1; i + 1 < w.length; i += 2) {
                m.put(w[i], Double.parseDouble(w[i + 1]));
            }
            out.add(m);
        }
        if (out.isEmpty()) {
            throw new IllegalStateException("planning_reference.txt has no line named " + name);
        }
        return out;
    }

    private static String text() {
        try (InputStream in = PlanningReference.class.getResourceAsStream("/reference/planning_reference.txt")) {
            if (in == null) {
                throw new IllegalStateException("missing test resource /reference/planning_reference.txt");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }
}
