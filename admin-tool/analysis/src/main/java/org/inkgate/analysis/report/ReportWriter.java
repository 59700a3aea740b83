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
        List<Map<String, Object>> sections = new ArrayList<>();
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
                Map<String, Object> tv = new LinkedHashMap<>();
                tv.put("id", t.id());
                tv.put("title", t.title());
                tv.put("method", t.method());
                tv.put("source", t.source());
                tv.put("columns", t.columns());
                List<Map<String, Object>> rows = new ArrayList<>();
                for (List<Object> r : t.rows()) {
                    List<Map<String, Object>> cells = new ArrayList<>();
                    for (Object o : r) {
                        cells.add(Map.of("text", NumberText.html(o), "numeric", o instanceof Number));
                    }
                    rows.add(Map.of("cells", cells));
                }
                tv.put("rows", rows);
                tv.put("notes", t.notes());
                tv.put("csv", "tables/" + t.id() + ".csv");
                tables.add(tv);
            }
            sv.put("tables", tables);
            sections.add(sv);
        }
        v.put("sections", sections);
        v.put("toc", report.sections().stream().map(s -> Map.of("id", s.id(), "title", s.title())).toList());
        return v;
    }

    /** The chart as an SVG element; ids prefixed by the chart id so several charts share one page. */
    static String svg(Chart c) {
        // the figure around it carries the chart id, so the SVG element gets its own
        return c.drawing().svg(c.id() + "-svg", c.title());
    }

    static void writeCsv(Table t, Path file) throws IOException {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write(line(new ArrayList<>(t.columns())));
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
