package org.inkgate.analysis.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportWriterTest {

    @Test
    void write_csvQuotesAndFullPrecision_jsonNullForUndefined_htmlEscapes(@TempDir Path dir) throws Exception {
        // RFC 4180 quoting; HTML escaping of data names by the template
        Table t = Table.builder("t1", "A table").method("m", "s").columns("name", "value")
                .row("a, \"b\"", 0.123456789012).row("<script>x</script>", Double.NaN).build();
        Section s = Section.builder("demo", "Demo").table(t).put("x", Double.NaN).put("y", 2.5).build();
        ReportWriter.write(new Report("R & D", List.of("line"), List.of(s)), dir);
        assertEquals("name,value\r\n\"a, \"\"b\"\"\",0.123456789012\r\n<script>x</script>,\r\n",
                Files.readString(dir.resolve("tables/t1.csv")));
        String json = Files.readString(dir.resolve("summary.json"));
        assertTrue(json.contains("\"demo.x\" : null"), json);
        assertTrue(json.contains("\"demo.y\" : 2.5"), json);
        String html = Files.readString(dir.resolve("report.html"));
        assertFalse(html.contains("<script>"));
        assertTrue(html.contains("&lt;script&gt;"));
        assertTrue(html.contains("R &amp; D"));
        assertTrue(html.contains(Table.UNDEFINED_NOTE.substring(0, 20)));
    }

    @Test
    void section_summaryKeyOutsideItsPrefix_isRefused() {
        assertThrows(IllegalArgumentException.class, () -> new Section("a", "A", List.of(), List.of(), List.of(),
                java.util.Map.of("b.x", 1)));
    }

    @Test
    void report_twoSectionsWithOneId_isRefused() {
        Section a = Section.builder("same", "A").build();
        assertThrows(IllegalArgumentException.class, () -> new Report("r", List.of(), List.of(a, a)));
    }
}
