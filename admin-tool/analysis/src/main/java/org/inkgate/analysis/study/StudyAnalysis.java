package org.inkgate.analysis.study;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.function.Supplier;
import org.inkgate.analysis.data.Candidate;
import org.inkgate.analysis.data.StudyDesign;
import org.inkgate.analysis.report.Report;
import org.inkgate.analysis.report.Section;
import org.inkgate.analysis.scores.ScoreTable;

/**
 * Runs the classical analyses of a sitting over plain data and returns the report: input and
 * scoring rules, descriptives, the condition comparison, proficiency levels, raters, rubric,
 * resource use, writing process and survey. Further sections (e.g. many-facet Rasch measurement)
 * can be appended with {@link #report(StudyData, StudyOptions, List)}.
 */
public final class StudyAnalysis {

    private StudyAnalysis() {
    }

    /** The report of the classical analyses. */
    public static Report report(StudyData data, StudyOptions options) {
        return report(data, options, List.of());
    }

    /** The report with extra sections appended after the classical ones. */
    public static Report report(StudyData data, StudyOptions options, List<Section> extraSections) {
        Map<String, String> levels = new HashMap<>();
        for (Candidate c : data.candidates()) {
            levels.put(c.id(), c.level());
        }
        ScoreTable scores = ScoreTable.of(data.ratings(), options.scoreRule(), levels);
        ComparisonDirection direction = ComparisonDirection.of(scores.conditions(), data.ratings(), data.toolUse(),
                options.baselineCondition());
        StudyOptions opts = options.withBaseline(direction.baseline());
        StudyDesign design = StudyDesign.of(data.ratings(), options.design());
        // sections only read the scores and the input, so they are built concurrently (the rater
        // section, the largest, runs beside the others) and then kept in their fixed order
        List<Supplier<Section>> builders = new ArrayList<>();
        builders.add(() -> InputSection.build(data, scores, opts));
        builders.add(() -> DescriptivesSection.build(scores, opts));
        builders.add(() -> ConditionSection.build(data, scores, opts, direction, design));
        builders.add(() -> LevelsSection.build(scores, opts));
        if (!Candidate.attributeNames(data.candidates()).isEmpty()) {
            builders.add(() -> AttributesSection.build(data.candidates(), scores, opts));
        }
        builders.add(() -> RatersSection.build(data.ratings(), opts));
        builders.add(() -> RubricSection.build(scores, opts));
        if (!data.toolUse().isEmpty()) {
            builders.add(() -> UsageSection.build(data.toolUse(), scores, opts));
        }
        if (!data.processLog().isEmpty()) {
            builders.add(() -> ProcessSection.build(data.processLog(), scores, opts));
        }
        if (!data.surveyItems().isEmpty()) {
            builders.add(() -> SurveySection.build(data.candidates(), data.surveyItems()));
        }
        List<CompletableFuture<Section>> futures = builders.stream().map(CompletableFuture::supplyAsync).toList();
        List<Section> sections = new ArrayList<>();
        for (CompletableFuture<Section> f : futures) {
            try {
                sections.add(f.join());
            } catch (CompletionException e) {
                if (e.getCause() instanceof RuntimeException r) {
                    throw r;
                }
                throw e;
            }
        }
        sections.addAll(extraSections);
        List<String> preamble = List.of(
                options.scoreRule().describe(),
                "A candidate's score under a condition is their response score there (the mean of their response"
                        + " scores if they sat several tasks under it).",
                "Every table names its method and source. Where a method's assumptions fail or its minimum n is not"
                        + " met, the note under the table says so: read such results with care and follow the test"
                        + " owner's regulations on how results may be used.",
                "Tables are also written as CSV (tables/*.csv); every figure is in summary.json under the keys"
                        + " documented in docs/analysis.md.");
        return new Report(options.title(), preamble, sections);
    }

    /** Conditions in analysis order: the baseline first. */
    static List<String> orderedConditions(ScoreTable scores, StudyOptions options) {
        List<String> c = new ArrayList<>(scores.conditions());
        if (options.baselineCondition() != null && c.remove(options.baselineCondition())) {
            c.add(0, options.baselineCondition());
        }
        return c;
    }
}
