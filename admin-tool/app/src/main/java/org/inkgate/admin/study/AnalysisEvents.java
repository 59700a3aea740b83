package org.inkgate.admin.study;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.Optional;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.analysis.data.ProcessEvent;
import org.inkgate.format.response.EventType;

/**
 * The one mapping from the response format's event vocabulary ({@link EventType}) to the
 * analysis's plain process events ({@link ProcessEvent}), which know nothing of our formats. The
 * switch has no default branch: a new event type does not compile until it is decided here
 * whether the writing-process measures use it. docs/analysis.md ("Input from a results store")
 * describes the same mapping.
 */
public final class AnalysisEvents {
    private static final ObjectMapper JSON = new ObjectMapper();

    private AnalysisEvents() {
    }

    /** The analysis's type for an event type, or empty when the measures do not use it. */
    public static Optional<ProcessEvent.Type> typeFor(EventType type) {
        return Optional.ofNullable(switch (type) {
            case TASK_START -> ProcessEvent.Type.TASK_START;
            case TASK_END -> ProcessEvent.Type.TASK_END;
            case TEXT_INSERT -> ProcessEvent.Type.INSERT;
            case TEXT_DELETE -> ProcessEvent.Type.DELETE;
            // the resource panel: which tool's page is in view (not tool.open, which opens an entry)
            case PANEL_OPEN -> ProcessEvent.Type.PANEL_OPEN;
            case PANEL_CLOSE -> ProcessEvent.Type.PANEL_CLOSE;
            case TOOL_QUERY -> ProcessEvent.Type.TOOL_QUERY;
            // tool use is counted from the stored tool-use summary, not from these events
            case TOOL_OPEN, TOOL_INSERT, CHECK_RUN, SUGGESTION_SHOW, SUGGESTION_ACCEPT, SUGGESTION_IGNORE, PASTE_REFUSED,
                    TASK_REPLAY_PROBLEM -> null;
            case SITTING_START, SITTING_RESUME, SITTING_END, FOCUS_LOST, FOCUS_RETURNED, PAUSE_START, PAUSE_END,
                    NAV_SCREEN, TIMER_WARNING, TIMER_EXPIRED, TIME_ADDED -> null;
        });
    }

    /**
     * The analysis's view of one stored event, or empty for a type the measures do not use, a type
     * this version does not know (a store filled before the collector checked the contract), or an
     * event without a task. Time is the monotonic clock in whole milliseconds.
     */
    public static Optional<ProcessEvent> of(Rows.Event row) {
        if (row.taskId() == null || row.taskId().isEmpty()) {
            return Optional.empty();
        }
        return switch (EventType.parse(row.type())) {
            case EventType.Unknown u -> Optional.empty();
            case EventType.Known(EventType known) -> typeFor(known).map(type -> {
                JsonNode data = parse(row);
                int position = type == ProcessEvent.Type.INSERT || type == ProcessEvent.Type.DELETE
                        ? data.path("pos").asInt(0) : -1;
                String text = switch (type) {
                    case INSERT -> data.path("text").asText("");
                    // a deletion stored before the contract required its text keeps its length (the measures use only that)
                    case DELETE -> data.hasNonNull("text") ? data.get("text").asText()
                            : "\uFFFD".repeat(Math.max(0, data.path("len").asInt(0)));
                    case TOOL_QUERY -> data.path("query").asText("");
                    case TASK_START, TASK_END, PANEL_OPEN, PANEL_CLOSE -> "";
                };
                return new ProcessEvent(row.candidateNumber(), row.taskId(), Math.floorDiv(row.mono(), 1_000_000L), type,
                        position, text);
            });
        };
    }

    private static JsonNode parse(Rows.Event row) {
        try {
            return JSON.readTree(row.dataJson() == null ? "{}" : row.dataJson());
        } catch (java.io.IOException e) {
            throw new IllegalStateException("event " + row.seq() + " of package " + row.packageId()
                    + " has data that is not JSON; the store may be damaged: " + e.getMessage(), e);
        }
    }
}
