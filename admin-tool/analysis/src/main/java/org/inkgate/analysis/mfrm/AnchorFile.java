package org.inkgate.analysis.mfrm;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.Writer;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * The anchor file: measures and thresholds one run writes so a later run can fix them, which puts
 * the later sitting on the earlier scale (linking). CSV (RFC 4180, UTF-8), header
 * {@code kind,facet,element,step,score,measure}:
 * <ul>
 * <li>{@code element} rows: a non-candidate facet's element and its measure in logits;</li>
 * <li>{@code threshold} rows: {@code facet} = the partial-credit facet (empty for the rating
 *     scale), {@code element} = the threshold set ({@code all} for the rating scale, else the
 *     element), {@code step} = k (1..m), {@code score} = the raw score of the upper category of
 *     step k (a check), {@code measure} = F_k.</li>
 * </ul>
 * Written from every element estimated (not extreme) and every threshold set. A researcher may
 * delete rows to anchor less.
 */
public final class AnchorFile {
    public static final String HEADER = "kind,facet,element,step,score,measure";
    public static final String FILE_NAME = "mfrm_anchors.csv";

    private AnchorFile() {
    }

    /** What the file fixes: facet -> element -> logits; threshold set -> step -> {score, F_k}. */
    public record Anchors(Map<String, Map<String, Double>> elements, Map<String, TreeMap<Integer, double[]>> thresholds) {

        /**
         * Adds to the options every anchor that applies to these ratings and this model.
         *
         * @return one sentence per anchor left out (a facet not modelled, an element or threshold set
         *         not in the ratings), for the researcher to read; an anchor is never silently dropped
         */
        public List<String> applyTo(MfrmOptions.Builder b, RatingData data, List<String> facets, ScaleStructure structure) {
            List<String> left = new ArrayList<>();
            elements.forEach((facet, els) -> {
                if (!facets.contains(facet)) {
                    left.add("anchors for facet '" + facet + "' left out: it is not among the modelled facets " + facets);
                    return;
                }
                List<String> present = List.of(data.labels(data.columnIndex(facet)));
                List<String> absent = new ArrayList<>();
                els.forEach((element, m) -> {
                    if (present.contains(element)) {
                        b.anchor(facet, element, m);
                    } else {
                        absent.add(element);
                    }
                });
                if (!absent.isEmpty()) {
                    left.add("anchors for " + facet + " " + absent + " left out: not in these ratings");
                }
            });
            List<String> sets = structure instanceof ScaleStructure.PartialCredit pc
                    ? List.of(data.labels(data.columnIndex(pc.facet()))) : List.of(MfrmOptions.SHARED_SCALE);
            thresholds.forEach((set, steps) -> {
                if (!sets.contains(set)) {
                    left.add("threshold anchors for '" + set + "' left out: the threshold sets of this model are "
                            + (sets.size() > 6 ? sets.subList(0, 6) + "..." : sets));
                    return;
                }
                b.anchorThresholds(set, steps.values().stream().mapToDouble(v -> v[1]).toArray());
            });
            return left;
        }
    }

    /** Writes the anchors of a finished run. */
    public static void write(MfrmResult r, Writer w) throws IOException {
        w.write(HEADER + "\r\n");
        for (int f = 1; f < r.facets().size(); f++) {
            MfrmResult.Facet facet = r.facets().get(f);
            for (MfrmResult.Element e : facet.elements()) {
                if (e.status() == MfrmResult.Status.ESTIMATED || e.status() == MfrmResult.Status.ANCHORED) {
                    w.write(row("element", facet.name(), e.label(), "", "", e.measure()));
                }
            }
        }
        String structure = r.model().structure();
        String pcFacet = structure.startsWith("partial credit by ") ? structure.substring("partial credit by ".length())
                : "";
        for (MfrmResult.Scale s : r.scales()) {
            for (int k = 1; k < s.categories().size(); k++) {
                MfrmResult.Category c = s.categories().get(k);
                w.write(row("threshold", pcFacet, s.label(), Integer.toString(k), Integer.toString(c.score()),
                        c.threshold()));
            }
        }
    }

    /**
     * Reads an anchor file.
     *
     * @throws IllegalArgumentException naming the file, row and column of every bad line
     */
    public static Anchors read(Reader in, String file) throws IOException {
        BufferedReader r = new BufferedReader(in);
        String header = r.readLine();
        if (header == null || !header.replace("\uFEFF", "").trim().equalsIgnoreCase(HEADER)) {
            throw new IllegalArgumentException(file + ", row 1: the header must be " + HEADER + " (an anchor file"
                    + " written by analyse as " + FILE_NAME + ")");
        }
        Map<String, Map<String, Double>> elements = new LinkedHashMap<>();
        Map<String, TreeMap<Integer, double[]>> thresholds = new LinkedHashMap<>();
        List<String> problems = new ArrayList<>();
        String line;
        int row = 1;
        while ((line = r.readLine()) != null) {
            row++;
            if (line.isBlank()) {
                continue;
            }
            List<String> cells = cells(line);
            String where = file + ", row " + row;
            if (cells == null || cells.size() != 6) {
                problems.add(where + ": expected 6 cells (" + HEADER + ")");
                continue;
            }
            Double measure = number(cells.get(5));
            if (measure == null) {
                problems.add(where + ", column measure: '" + cells.get(5) + "' is not a finite number of logits");
                continue;
            }
            switch (cells.get(0)) {
                case "element" -> {
                    if (cells.get(1).isEmpty() || cells.get(2).isEmpty()) {
                        problems.add(where + ": an element row needs its facet and element");
                    } else if (elements.computeIfAbsent(cells.get(1), k -> new LinkedHashMap<>())
                            .put(cells.get(2), measure) != null) {
                        problems.add(where + ": " + cells.get(1) + " '" + cells.get(2) + "' is anchored twice");
                    }
                }
                case "threshold" -> {
                    Double step = number(cells.get(3));
                    Double score = number(cells.get(4));
                    if (step == null || step < 1 || step != Math.rint(step) || score == null) {
                        problems.add(where + ", column step: a threshold row needs a step 1, 2, ... and its score");
                    } else if (thresholds.computeIfAbsent(cells.get(2), k -> new TreeMap<>())
                            .put(step.intValue(), new double[] {score, measure}) != null) {
                        problems.add(where + ": step " + step.intValue() + " of '" + cells.get(2) + "' appears twice");
                    }
                }
                default -> problems.add(where + ", column kind: '" + cells.get(0) + "'; use element or threshold");
            }
        }
        thresholds.forEach((set, steps) -> {
            if (steps.lastKey() != steps.size()) {
                problems.add(file + ": threshold set '" + set + "' has steps " + steps.keySet() + "; give every step"
                        + " from 1 to the highest");
            }
        });
        if (!problems.isEmpty()) {
            throw new IllegalArgumentException(String.join("\n", problems));
        }
        return new Anchors(elements, thresholds);
    }

    private static Double number(String s) {
        try {
            double v = Double.parseDouble(s.trim());
            return Double.isFinite(v) ? v : null;
        } catch (NumberFormatException e) {
            return null;
        }
    }

    private static String row(String kind, String facet, String element, String step, String score, double measure) {
        return String.join(",", kind, quote(facet), quote(element), step, score,
                String.format(Locale.ROOT, "%.17g", measure)) + "\r\n";
    }

    private static String quote(String s) {
        return s.contains(",") || s.contains("\"") || s.contains("\n") || s.contains("\r")
                ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }

    /** One line's cells (RFC 4180 quoting, no line breaks inside cells), or null if a quote is unbalanced. */
    private static List<String> cells(String line) {
        List<String> out = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') {
                    cur.append('"');
                    i++;
                } else if (c == '"') {
                    quoted = false;
                } else {
                    cur.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                out.add(cur.toString());
                cur.setLength(0);
            } else {
                cur.append(c);
            }
        }
        if (quoted) {
            return null;
        }
        out.add(cur.toString());
        return out;
    }
}
