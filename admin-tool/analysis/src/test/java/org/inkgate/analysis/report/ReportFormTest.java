package org.inkgate.analysis.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.mfrm.MfrmOptions;
import org.inkgate.analysis.mfrm.MfrmSection;
import org.inkgate.analysis.mfrm.StudyRatings;
import org.inkgate.analysis.study.StudyAnalysis;
import org.inkgate.analysis.study.StudyData;
import org.inkgate.analysis.study.StudyOptions;
import org.inkgate.analysis.testutil.SimulatedSitting;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The report in our own form (issue 18, section 3), over a whole report of invented data with a
 * many-facet section: full-word column labels, snake_case CSV headers, a caption on every table,
 * wide tables in a scrolling block, p-values below double precision as "&lt; 1e-15". Structure
 * only: no statistical check values come from the invented data.
 */
class ReportFormTest {
    /** Abbreviations the many-facet tables must not use as labels (full words instead). */
    private static final Set<String> ABBREVIATIONS = Set.of("se", "sd", "rmse", "mnsq", "zstd", "df", "p", "r", "t",
            "z", "no.", "no", "std", "obs", "exp", "avg", "thr", "thr.", "sig", "n");
    @TempDir
    static Path dir;
    private static Report report;
    private static String html;

    @BeforeAll
    static void writeReport() throws Exception {
        List<Rating> ratings = SimulatedSitting.ratings(120, 5);
        Map<String, String> levels = new HashMap<>();
        ratings.forEach(r -> levels.put(r.candidate(), r.level()));
        var mfrm = MfrmSection.analyse(StudyRatings.of(ratings, levels,
                        List.of("task", "condition", "rater", "criterion", "level")),
                MfrmOptions.builder(List.of("task", "condition", "rater", "criterion")).bias("condition", "level")
                        .build());
        report = StudyAnalysis.report(StudyData.ofRatings(ratings), StudyOptions.DEFAULT, List.of(mfrm));
        ReportWriter.write(report, dir);
        html = Files.readString(dir.resolve("report.html"));
    }

    private static List<Table> tables() {
        return report.sections().stream().flatMap(s -> s.tables().stream()).toList();
    }

    @Test
    void manyFacetTables_labelEveryColumnInFullWords() {
        List<Table> mfrm = tables().stream().filter(t -> t.id().startsWith("mfrm")).toList();
        assertTrue(mfrm.size() >= 8, mfrm.toString());
        for (Table t : mfrm) {
            for (String label : t.columns()) {
                // "t statistic" is the statistic's full name (Student's t), not an abbreviation
                for (String word : label.toLowerCase(Locale.ROOT).replace("t statistic", "statistic")
                        .split("[\\s,()]+")) {
                    assertFalse(ABBREVIATIONS.contains(word), t.id() + ": '" + label + "' abbreviates '" + word + "'");
                }
            }
        }
        List<String> elements = tables().stream().filter(t -> t.id().equals("mfrm_elements_rater")).findFirst()
                .orElseThrow().columns();
        for (String label : List.of("infit mean square", "standardised infit", "outfit mean square",
                "standardised outfit", "point-measure correlation", "standard error", "joint standard error")) {
            assertTrue(elements.contains(label), label + " in " + elements);
        }
        assertTrue(tables().stream().filter(t -> t.id().equals("mfrm_categories")).findFirst().orElseThrow()
                .columns().contains("Rasch-Andrich threshold"), "published name of the thresholds kept");
    }

    @Test
    void everyCsvTable_hasStableSnakeCaseColumnNames() throws Exception {
        for (Table t : tables()) {
            String header = Files.readAllLines(dir.resolve("tables").resolve(t.id() + ".csv")).get(0);
            Set<String> seen = new HashSet<>();
            for (String name : header.split(",", -1)) {
                assertTrue(name.matches("[a-z][a-z0-9]*(_[a-z0-9]+)*"), t.id() + ": CSV column '" + name + "'");
                assertTrue(seen.add(name), t.id() + ": CSV column " + name + " twice");
            }
            assertEquals(t.columns().size(), seen.size(), t.id());
        }
        String rater = Files.readAllLines(dir.resolve("tables/mfrm_elements_rater.csv")).get(0);
        assertTrue(rater.contains("infit_mean_square,infit_standardised,outfit_mean_square,outfit_standardised"),
                rater);
        // the labels stay for the HTML
        assertTrue(html.contains(">infit mean square</th>"), "HTML header keeps the label");
    }

    @Test
    void everyTable_hasACaptionAndScrollsSidewaysWhenWide() {
        Matcher m = Pattern.compile("<div class=\"scroll\"[^>]*><table>\\s*<caption[^>]*>(.*?)</caption>",
                Pattern.DOTALL).matcher(html);
        int captioned = 0;
        while (m.find()) {
            assertFalse(m.group(1).replaceAll("<[^>]+>", "").isBlank(), "empty caption");
            captioned++;
        }
        int tablesInHtml = html.split("<table>", -1).length - 1;
        assertEquals(tables().size(), tablesInHtml);
        assertEquals(tablesInHtml, captioned, "every table opens inside a scrolling block with its caption");
        String style = html.substring(html.indexOf("<style>"), html.indexOf("</style>"));
        assertTrue(style.replace(" ", "").contains(".scroll{overflow-x:auto;"), style);
        assertTrue(style.replace(" ", "").contains("td.num{white-space:nowrap;}"),
                "numbers keep one line, so a wide table scrolls instead of squeezing: " + style);
    }

    @Test
    void pValueBelowDoublePrecision_showsAsBelow1e15_inTablesAndNotes() {
        // the candidates' fixed chi-square p-value is far below 1e-15 with 120 invented candidates
        Table facets = tables().stream().filter(t -> t.id().equals("mfrm_facets")).findFirst().orElseThrow();
        int p = facets.columns().indexOf("p-value");
        List<Object> candidates = facets.rows().stream().filter(r -> r.get(0).equals("candidate")).findFirst()
                .orElseThrow();
        assertTrue((Double) candidates.get(p) < 1e-15, candidates.toString());
        String block = html.substring(html.indexOf("id=\"mfrm_facets\""));
        block = block.substring(0, block.indexOf("</table>"));
        assertTrue(block.contains("<td class=\"num\">&lt; 1e-15</td>"), block);
        assertEquals("< 1e-15", PValueText.of(0));
        assertEquals("< 1e-15", PValueText.of(9.9e-16));
        assertEquals("1.00e-15", PValueText.of(1e-15));
        assertEquals("0.049", PValueText.of(0.049));
        List<String> notP = new ArrayList<>();
        // every p-value column of the report goes through the one formatter: no p-value prints as 0
        for (Table t : tables()) {
            for (int i = 0; i < t.header().size(); i++) {
                if (t.header().get(i).pValue()) {
                    notP.add(t.id() + "." + t.header().get(i).name());
                }
            }
        }
        assertTrue(notP.contains("levels_anova.p") && notP.contains("comparison_paired.p_holm"), notP.toString());
    }

    @Test
    void charts_useASansSerifFace_andTheStylesheetCarriesTheChartsPalette() {
        Matcher m = Pattern.compile("font-family(?::|=\")\\s*([^;\"]+)").matcher(html.substring(html.indexOf("<main>")));
        int n = 0;
        while (m.find()) {
            assertEquals("sans-serif", m.group(1).trim(), "every chart text is sans-serif");
            n++;
        }
        assertTrue(n > 10, "charts carry their font: " + n);
        for (int i = 0; i < org.inkgate.analysis.graphics.SeriesPalette.size(); i++) {
            assertTrue(html.contains("--series-" + (i + 1) + ": " + org.inkgate.analysis.graphics.SeriesPalette.hex(i)
                    + ";"), "stylesheet palette " + i);
        }
    }
}
