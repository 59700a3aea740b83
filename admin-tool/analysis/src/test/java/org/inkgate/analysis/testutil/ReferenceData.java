package org.inkgate.analysis.testutil;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The published datasets copied from the team's shared data folder into src/test/resources/reference
 * (sources in that folder's README.md: sleep = Student 1908; PlantGrowth = Dobson 1983;
 * warpbreaks = Tippett 1950; ToothGrowth = Crampton 1947; shrout_fleiss_1979 = Shrout &amp; Fleiss
 * 1979, Table 2).
 */
public final class ReferenceData {

    private ReferenceData() {
    }

    /** Rows of a reference CSV as column-name to text maps. */
    public static List<Map<String, String>> rows(String file) {
        try (InputStream in = ReferenceData.class.getResourceAsStream("/reference/" + file)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource /reference/" + file);
            }
            String[] lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\\R");
            String[] header = lines[0].split(",");
            List<Map<String, String>> out = new ArrayList<>();
            for (int i = 1; i < lines.length; i++) {
                if (lines[i].isBlank()) {
                    continue;
                }
                String[] cells = lines[i].split(",");
                Map<String, String> row = new LinkedHashMap<>();
                for (int c = 0; c < header.length; c++) {
                    row.put(header[c].replace("\"", ""), cells[c].replace("\"", ""));
                }
                out.add(row);
            }
            return out;
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    /** One numeric column. */
    public static double[] column(String file, String column) {
        return rows(file).stream().mapToDouble(r -> Double.parseDouble(r.get(column))).toArray();
    }

    /** One numeric column of the rows where another column has the given value. */
    public static double[] column(String file, String column, String whereColumn, String equals) {
        return rows(file).stream().filter(r -> r.get(whereColumn).equals(equals))
                .mapToDouble(r -> Double.parseDouble(r.get(column))).toArray();
    }

    /** A numeric column split by a label column, labels in order of first appearance. */
    public static Map<String, double[]> groups(String file, String column, String by) {
        Map<String, List<Double>> m = new LinkedHashMap<>();
        for (Map<String, String> r : rows(file)) {
            m.computeIfAbsent(r.get(by), k -> new ArrayList<>()).add(Double.parseDouble(r.get(column)));
        }
        Map<String, double[]> out = new LinkedHashMap<>();
        m.forEach((k, v) -> out.put(k, v.stream().mapToDouble(Double::doubleValue).toArray()));
        return out;
    }
}
