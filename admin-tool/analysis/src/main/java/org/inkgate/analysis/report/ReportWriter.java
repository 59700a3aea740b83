package org.inkgate.analysis.report;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.github.mustachejava.DefaultMustacheFactory;
import com.github.mustachejava.Mustache;
import java.io.IOException;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.graphics.SeriesPalette;

/**
 * Writes a report to a folder: {@code report.html} (self-contained: inline CSS and SVG charts,
 * no scripts, no external files), {@code tables/<id>.csv} per table, and {@code summary.json}.
 * The HTML comes from a Mustache template, which escapes every value; only the SVG written by
 * Batik's SVG generator (from the charts' Graphics2D drawing) is inserted unescaped.
 */
public final class ReportWriter {

    /** The summary.json format id; bump when a key changes meaning. */
    public static final String SUMMARY_FORMAT = "inkgate-analysis-summary/1";
    private static final Mustache TEMPLATE = new DefaultMustacheFactory("org/inkgate/analysis/report")
            .compile("report.mustache");

    private ReportWriter() {
    }

    /** Writes the three outputs into dir (created if absent); existing files of the same names are replaced. */
    public static void write(Report report, Path dir) throws IOException {
        Files.createDirectories(dir.resolve("tables"));
        for (Section s : report.sections()) {
            for (Table t : s.tables()) {
                writeCsv(t, dir.resolve("tables").resolve(t.id() + ".csv"));
            }
        }
        try (Writer w = Files.newBufferedWriter(dir.resolve("report.html"), StandardCharsets.UTF_8)) {
            TEMPLATE.execute(w, view(report)).flush();
        }
        writeSummary(report, dir.resolve("summary.json"));
    }

    /** The report as HTML text. */
    public static String html(Report report) {
        StringWriter w = new StringWriter();
        TEMPLATE.execute(w, view(report));
        return w.toString();
    }

    private static Map<String, Object> view(Report report) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("title", report.title());
        v.put("preamble", report.preamble());
        // the charts' series colours, as stylesheet properties: one palette for page and charts
        List<Map<String, Object>> palette = new ArrayList<>();
        for (int i = 0; i < SeriesPalette.size(); i++) {
            palette.add(Map.of("n", i + 1, "hex", SeriesPalette.hex(i)));
        }
        v.put("palette", palette);
        List<Map<String, Object>> sections = new ArrayList<>();
        int tableNumber = 0;
        for (Section s : report.sections()) {
            Map<String, Object> sv = new LinkedHashMap<>();
            sv.put("id", s.id());
            sv.put("title", s.title());
            sv.put("paragraphs", s.paragraphs());
            List<Map<String, Object>> charts = new ArrayList<>();
            for (Chart c : s.charts()) {
                charts.add(Map.of("id", c.id(), "title", c.title(), "caption", c.caption(), "svg", svg(c)));
            }
            sv.put("charts", charts);
            List<Map<String, Object>> tables = new ArrayList<>();
            for (Table t : s.tables()) {
                tables.add(tableView(t, ++tableNumber));
            }
            sv.put("tables", tables);
            sections.add(sv);
        }
        v.put("sections", sections);
        v.put("toc", report.sections().stream().map(s -> Map.of("id", s.id(), "title", s.title())).toList());
        return v;
    }

    // Caption "Table n. title"; a first header row of group headings when any column has one
    // (spanning its neighbours of the same heading); p-values written by PValueText.
    private static Map<String, Object> tableView(Table t, int number) {
        Map<String, Object> tv = new LinkedHashMap<>();
        tv.put("id", t.id());
        tv.put("number", number);
        tv.put("title", t.title());
        tv.put("method", t.method());
        tv.put("source", t.source());
        tv.put("columns", t.header().stream().map(c -> Map.of("label", c.label(), "name", c.name())).toList());
        List<Map<String, Object>> headingRows = new ArrayList<>();
        for (java.util.function.Function<Column, String> level : List.<java.util.function.Function<Column, String>>of(
                c -> c.group(), c -> c.group() + '\u0000' + c.subgroup())) {
            if (t.header().stream().allMatch(c -> level.apply(c).replace("\u0000", "").isEmpty())) {
                continue;
            }
            List<Map<String, Object>> cells = new ArrayList<>();
            String last = null;
            for (Column c : t.header()) {
                String key = level.apply(c);
                if (key.equals(last)) {
                    Map<String, Object> cell = cells.get(cells.size() - 1);
                    cell.put("span", (Integer) cell.get("span") + 1);
                } else {
                    Map<String, Object> cell = new LinkedHashMap<>();
                    cell.put("label", key.substring(key.indexOf('\u0000') + 1));
                    cell.put("span", 1);
                    cells.add(cell);
                }
                last = key;
            }
            headingRows.add(Map.of("cells", cells));
        }
        tv.put("headingRows", headingRows);
        List<Map<String, Object>> rows = new ArrayList<>();
        for (List<Object> r : t.rows()) {
            List<Map<String, Object>> cells = new ArrayList<>();
            for (int i = 0; i < r.size(); i++) {
                Object o = r.get(i);
                String text = t.header().get(i).pValue() && o instanceof Number n ? PValueText.of(n.doubleValue())
                        : NumberText.html(o);
                cells.add(Map.of("text", text, "numeric", o instanceof Number));
            }
            rows.add(Map.of("cells", cells));
        }
        tv.put("rows", rows);
        tv.put("notes", t.notes());
        tv.put("csv", "tables/" + t.id() + ".csv");
        return tv;
    }

    /** The chart as an SVG element; ids prefixed by the chart id so several charts share one page. */
    static String svg(Chart c) {
        // the figure around it carries the chart id, so the SVG element gets its own
        return c.drawing().svg(c.id() + "-svg", c.title());
    }

    static void writeCsv(Table t, Path file) throws IOException {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write(line(new ArrayList<>(t.names())));
            for (List<Object> r : t.rows()) {
                List<String> cells = new ArrayList<>();
                for (Object o : r) {
                    cells.add(NumberText.csv(o));
                }
                w.write(line(cells));
            }
        }
    }

    private static String line(List<String> cells) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < cells.size(); i++) {
            String c = cells.get(i);
            if (i > 0) {
                b.append(',');
            }
            if (c.indexOf(',') >= 0 || c.indexOf('"') >= 0 || c.indexOf('\n') >= 0 || c.indexOf('\r') >= 0) {
                b.append('"').append(c.replace("\"", "\"\"")).append('"');
            } else {
                b.append(c);
            }
        }
        return b.append("\r\n").toString();
    }

    static void writeSummary(Report report, Path file) throws IOException {
        Map<String, Object> all = new LinkedHashMap<>();
        all.put("format", SUMMARY_FORMAT);
        all.put("title", report.title());
        for (Section s : report.sections()) {
            s.summary().forEach((k, v) -> all.put(k, v instanceof Double d && !Double.isFinite(d) ? null : v));
        }
        ObjectMapper mapper = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
                .configure(JsonGenerator.Feature.AUTO_CLOSE_TARGET, true);
        mapper.writeValue(file.toFile(), all);
    }
}
