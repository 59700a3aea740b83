package org.inkgate.analysis.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.analysis.data.QuestionnaireAnswer;
import org.inkgate.analysis.data.QuestionnaireData;
import org.inkgate.analysis.data.QuestionnaireItem;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.data.ToolUse;
import org.inkgate.analysis.report.Report;
import org.inkgate.analysis.report.ReportWriter;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.testutil.SimulatedStudy;
import org.junit.jupiter.api.Test;

/**
 * The questionnaire section and rater agreement on the reported score against Debian's R 4.2.2 with
 * psych 2.2.9 (script and output: src/test/resources/reference/questionnaire_score_reference.R, .txt,
 * .csv), over the SIMULATED study that script writes (not demo data): every key R computed must be in
 * the report's summary with R's value.
 */
class SimulatedStudyReferenceTest {

    static final List<String> HELP = List.of("Strongly disagree", "Disagree", "Neither agree nor disagree", "Agree",
            "Strongly agree");
    static final List<String> TIME = List.of("Not at all", "A little", "Mostly", "Completely");

    private static Report report() {
        Map<String, String> level = new HashMap<>();
        List<QuestionnaireAnswer> answers = new ArrayList<>();
        List<ToolUse> uses = new ArrayList<>();
        for (Map<String, String> c : SimulatedStudy.candidates()) {
            String id = c.get("candidate");
            level.put(id, c.get("level"));
            for (String item : List.of("help", "time", "comments")) {
                answers.add(new QuestionnaireAnswer(id, c.get("level"), c.get("conditions"), "after-writing", item,
                        c.get(item)));
            }
            String withTask = c.get("first_condition").equals("with-resources") ? c.get("first_task")
                    : c.get("first_task").equals("ferry-complaint") ? "market-square" : "ferry-complaint";
            long accepted = Long.parseLong(c.get("spelling_accepted"));
            long ignored = Long.parseLong(c.get("spelling_ignored"));
            uses.add(new ToolUse(id, withTask, "spelling", accepted + ignored, 0, accepted, ignored));
        }
        QuestionnaireData q = new QuestionnaireData(List.of(
                new QuestionnaireItem("after-writing", "help", "The writing tools helped me.", QuestionnaireItem.Kind.LIKERT, HELP),
                new QuestionnaireItem("after-writing", "time", "I had enough time.", QuestionnaireItem.Kind.LIKERT, TIME),
                new QuestionnaireItem("after-writing", "comments", "Anything else?", QuestionnaireItem.Kind.FREE_TEXT, null)),
                answers);
        List<Rating> ratings = new ArrayList<>();
        for (Map<String, String> r : SimulatedStudy.ratings()) {
            for (String rater : List.of("first", "second")) {
                ratings.add(new Rating(r.get("candidate"), level.get(r.get("candidate")), "", r.get("task"),
                        r.get("condition"), rater, r.get("criterion"), Double.parseDouble(r.get(rater))));
            }
        }
        return StudyAnalysis.report(new org.inkgate.analysis.study.StudyData(ratings, List.of(), List.of(), uses,
                List.of()), StudyOptions.DEFAULT, List.of(QuestionnaireSection.build(q, uses)));
    }

    static Map<String, Object> summary(Report report) {
        Map<String, Object> all = new LinkedHashMap<>();
        for (Section s : report.sections()) {
            all.putAll(s.summary());
        }
        return all;
    }

    /** Compares every R key with the summary; counts exactly, the rest to 1e-9 (R prints 15 digits). */
    static void assertMatchesR(Map<String, Object> summary, Map<String, String> reference) {
        int compared = 0;
        for (var e : reference.entrySet()) {
            Object got = summary.get(e.getKey());
            if (e.getValue().equals("NA")) {
                assertTrue(got == null || got instanceof Double d && d.isNaN(), e.getKey() + " is undefined in R: " + got);
            } else {
                assertTrue(got instanceof Number, e.getKey() + " missing from the report: " + got);
                assertEquals(Double.parseDouble(e.getValue()), ((Number) got).doubleValue(), 1e-9, e.getKey());
            }
            compared++;
        }
        assertEquals(reference.size(), compared);
        assertTrue(compared > 300, "the reference covers both parts: " + compared);
    }

    @Test
    void report_simulatedStudy_matchesRForEveryQuestionnaireAndReportedScoreFigure() {
        Report report = report();
        assertMatchesR(summary(report), SimulatedStudy.reference());
    }

    @Test
    void report_tablesNameTheLevelOfEveryRaterFigure() {
        Report report = report();
        Section raters = report.sections().stream().filter(s -> s.id().equals("raters")).findFirst().orElseThrow();
        for (var t : raters.tables()) {
            if (t.id().startsWith("raters_individual")) {
                continue;
            }
            assertEquals("level", t.columns().get(0), t.id());
            for (var row : t.rows()) {
                assertTrue(List.of("criterion", "pooled criterion ratings", "reported score").contains(row.get(0)),
                        t.id() + ": " + row);
            }
        }
        assertTrue(raters.tables().stream().anyMatch(t -> t.id().equals("raters_score_icc")));
    }

    @Test
    void html_freeTextAnswers_areListedEscaped_andTheCorrelationIsCalledNoEffect() {
        String html = ReportWriter.html(report());
        assertTrue(html.contains("The suggestions came too late, I had already moved on."));
        assertFalse(html.contains("<script>alert"), "a candidate's text never becomes markup");
        assertTrue(html.contains("&lt;script&gt;alert"), html.substring(0, 200));
        assertTrue(html.contains("A correlation over few candidates, not an effect"));
        assertTrue(html.contains("chart_questionnaire_after_writing_help"));
    }
}
