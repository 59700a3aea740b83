package org.inkgate.admin.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.analysis.data.Candidate;
import org.inkgate.analysis.data.ProcessEvent;
import org.inkgate.analysis.data.ToolUse;

/**
 * The analysis's candidate, tool-use and writing-process tables read straight from a results
 * store, so a researcher needs no CSV export in between. Ratings are not in the store until the
 * rating desk exists; they still come from a ratings CSV.
 *
 * <p>The mapping is documented in docs/analysis.md ("Input from a results store"):
 * <ul>
 *   <li>a candidate's level is the roster's level; roster fields (first language, personal fields) are
 *       read only when named by the caller, who must have the test owner's permission, and become
 *       categorical attributes;</li>
 *   <li>a tool's {@code uses} in a response are the candidate's own actions with it: queries,
 *       suggestions accepted and suggestions ignored (suggestions merely shown do not count);</li>
 *   <li>process events are mapped by {@link AnalysisEvents}: task bounds, text changes, the
 *       resource panel's {@code panel.open}/{@code panel.close} and lookups, with their task,
 *       monotonic time (as milliseconds) and the {@code pos}, {@code text} or {@code query} of their data.</li>
 * </ul>
 */
public final class StoreStudyInput {

    /** The three tables of one exam. */
    public record Tables(List<Candidate> candidates, List<ToolUse> toolUse, List<ProcessEvent> processLog) {
    }

    private StoreStudyInput() {
    }

    /** Reads the exam's candidates, tool use and process events from the store. */
    public static Tables read(ResultsStore store, String examId) throws StoreException {
        return read(store, examId, List.of());
    }

    /**
     * Reads the exam's candidates with the named roster fields as categorical attributes, tool use and
     * process events.
     */
    public static Tables read(ResultsStore store, String examId, List<String> rosterFields) throws StoreException {
        Map<String, Map<String, String>> fields = rosterFields.isEmpty() ? Map.of()
                : store.rosterFields(examId, rosterFields);
        List<Candidate> candidates = store.candidates(examId).stream()
                .map(row -> withFields(candidate(row), rosterFields, fields.getOrDefault(row.candidateNumber(), Map.of())))
                .toList();
        List<ToolUse> toolUse = new ArrayList<>();
        store.forEachToolUse(examId, row -> toolUse.add(toolUse(row)));
        List<ProcessEvent> events = new ArrayList<>();
        store.forEachEvent(examId, row -> AnalysisEvents.of(row).ifPresent(events::add));
        return new Tables(candidates, toolUse, events);
    }

    static Candidate candidate(Rows.Candidate row) {
        return new Candidate(row.candidateNumber(), row.level() == null ? "" : row.level(), Map.of());
    }

    /** The candidate with the fields in the order asked for (absent when the roster gives none). */
    private static Candidate withFields(Candidate c, List<String> names, Map<String, String> values) {
        Map<String, String> attributes = new java.util.LinkedHashMap<>();
        names.forEach(n -> {
            if (values.containsKey(n)) {
                attributes.put(n, values.get(n));
            }
        });
        return new Candidate(c.id(), c.level(), c.survey(), attributes);
    }

    static ToolUse toolUse(Rows.ToolUseRow row) {
        long uses = (long) row.queries() + row.suggestionsAccepted() + row.suggestionsIgnored();
        return new ToolUse(row.candidateNumber(), row.taskId(), row.tool(), uses, row.emptyQueries(),
                row.suggestionsAccepted(), row.suggestionsIgnored());
    }

    /** The analysis's view of one stored event (the mapping is {@link AnalysisEvents}), or null when it is not used. */
    static ProcessEvent processEvent(Rows.Event row) {
        return AnalysisEvents.of(row).orElse(null);
    }
}
