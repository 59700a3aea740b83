package org.inkgate.analysis.study;

import java.util.List;
import java.util.Objects;
import org.inkgate.analysis.data.Candidate;
import org.inkgate.analysis.data.ProcessEvent;
import org.inkgate.analysis.data.Rating;
import org.inkgate.analysis.data.ToolUse;

/**
 * Everything one analysis reads, as plain in-memory tables: ratings (required), and optionally
 * candidates (levels, survey answers), tool use and the writing-process log. A results store or a
 * CSV reader fills it the same way.
 */
public record StudyData(List<Rating> ratings, List<Candidate> candidates, List<String> surveyItems,
        List<ToolUse> toolUse, List<ProcessEvent> processLog) {

    public StudyData {
        Objects.requireNonNull(ratings, "ratings");
        candidates = candidates == null ? List.of() : candidates;
        surveyItems = surveyItems == null ? List.of() : List.copyOf(surveyItems);
        toolUse = toolUse == null ? List.of() : toolUse;
        processLog = processLog == null ? List.of() : processLog;
    }

    /** Ratings only. */
    public static StudyData ofRatings(List<Rating> ratings) {
        return new StudyData(ratings, List.of(), List.of(), List.of(), List.of());
    }
}
