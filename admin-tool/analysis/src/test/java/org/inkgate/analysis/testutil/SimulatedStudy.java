package org.inkgate.analysis.testutil;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The SIMULATED study of {@code reference/questionnaire_score_reference.R} (18 invented candidates,
 * set.seed(20261202); not demo data, not real people): its candidate and rating tables and R's
 * reference values (key to value text, "NA" where R gives none).
 */
public final class SimulatedStudy {

    private SimulatedStudy() {
    }

    public static List<Map<String, String>> candidates() {
        return rows("study_candidates.csv");
    }

    public static List<Map<String, String>> ratings() {
        return rows("study_ratings.csv");
    }

    public static Map<String, String> reference() {
        Map<String, String> out = new LinkedHashMap<>();
        for (Map<String, String> r : rows("questionnaire_score_reference.csv")) {
            out.put(r.get("key"), r.get("value"));
        }
        return out;
    }

    /** Rows of an R-written CSV (quoted cells with commas and doubled quotes) as column-name to text maps. */
    public static List<Map<String, String>> rows(String file) {
        String text;
        try (InputStream in = SimulatedStudy.class.getResourceAsStream("/reference/" + file)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource /reference/" + file);
            }
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
        List<List<String>> lines = parse(text);
        List<String> header = lines.get(0);
        List<Map<String, String>> out = new ArrayList<>();
        for (List<String> cells : lines.subList(1, lines.size())) {
            Map<String, String> row = new LinkedHashMap<>();
            for (int c = 0; c < header.size(); c++) {
                row.put(header.get(c), cells.get(c));
            }
            out.add(row);
        }
        return out;
    }

    private static List<List<String>> parse(String text) {
        List<List<String>> rows = new ArrayList<>();
        List<String> row = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            if (quoted) {
                if (ch == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
                    cell.append('"');
                    i++;
                } else if (ch == '"') {
                    quoted = false;
                } else {
                    cell.append(ch);
                }
            } else if (ch == '"') {
                quoted = true;
            } else if (ch == ',') {
                row.add(cell.toString());
                cell.setLength(0);
            } else if (ch == '\n' || ch == '\r') {
                if (ch == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
                    i++;
                }
                row.add(cell.toString());
                cell.setLength(0);
                rows.add(row);
                row = new ArrayList<>();
            } else {
                cell.append(ch);
            }
        }
        if (cell.length() > 0 || !row.isEmpty()) {
            row.add(cell.toString());
            rows.add(row);
        }
        return rows;
    }
}
