package org.inkgate.analysis.groups;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/** Named groups of values (e.g. candidates' scores per proficiency level), in a fixed order. */
public record Groups(List<String> labels, List<double[]> values) {

    public Groups {
        labels = List.copyOf(labels);
        values = List.copyOf(values);
        if (labels.size() != values.size()) {
            throw new IllegalArgumentException("labels and value arrays differ in number");
        }
    }

    /** Groups from a label-to-values map, keeping its order. */
    public static Groups of(Map<String, double[]> map) {
        return new Groups(new ArrayList<>(map.keySet()), new ArrayList<>(map.values()));
    }

    /** Groups a column of values by a parallel column of labels, in order of first appearance. */
    public static Groups split(double[] values, String[] labels) {
        Map<String, List<Double>> map = new LinkedHashMap<>();
        for (int i = 0; i < values.length; i++) {
            map.computeIfAbsent(Objects.requireNonNull(labels[i], "label"), k -> new ArrayList<>()).add(values[i]);
        }
        Map<String, double[]> out = new LinkedHashMap<>();
        map.forEach((k, v) -> out.put(k, v.stream().mapToDouble(Double::doubleValue).toArray()));
        return of(out);
    }

    public int count() {
        return labels.size();
    }

    public int total() {
        return values.stream().mapToInt(v -> v.length).sum();
    }

}
