package org.inkgate.admin.core.export;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.UUID;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.format.json.Json;
import org.inkgate.format.response.EventType;

/**
 * Process and tool events as xAPI 1.0.3 statements, one JSON object per line; {@link #mapping}
 * says which event types become statements and with which verb. The actor is an
 * account with the candidate number as name (no names, no email); the object is the task as a
 * {@code cmi.interaction} activity; the original event type and data ride in extensions under
 * our own IRI namespace. Statement ids are name-based UUIDs of package and sequence number, so
 * exporting twice gives the same ids and a record store can drop duplicates.
 */
public final class XapiExport {

    /** Our own IRI namespace for activities, extensions and the account home page. */
    public static final String BASE = "https://inkgate.example/xapi/";
    private static final String ADL = "http://adlnet.gov/expapi/verbs/";
    private static final String AS = "http://activitystrea.ms/schema/1.0/";
    private static final ObjectMapper M = Json.mapper().copy()
            .disable(com.fasterxml.jackson.databind.SerializationFeature.INDENT_OUTPUT);

    private XapiExport() {
    }

    /** How one event type appears in the export: a statement with this verb, or no statement and why. */
    public sealed interface Mapping {
        /** Exported with the verb's IRI. */
        record Statement(String verb) implements Mapping {
        }

        /** Not exported: the statement's actor is the candidate, and this is not something the candidate did. */
        record NotExported(String why) implements Mapping {
        }
    }

    /** What the statements file holds: statements written, and events left out (not exported, or unknown to this version). */
    public record Written(long statements, long notExported, long unknownType) {
    }

    /** Writes the statements to {@code file}. */
    public static Written write(ResultsStore store, String examId, Path file) throws IOException, StoreException {
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        long[] n = new long[3];
        try (Writer out = new BufferedWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), 1 << 16)) {
            store.forEachEvent(examId, e -> {
                switch (EventType.parse(e.type())) {
                    // a store filled before the collector checked the event contract may hold one
                    case EventType.Unknown u -> n[2]++;
                    case EventType.Known(EventType type) -> {
                        switch (mapping(type)) {
                            case Mapping.NotExported x -> n[1]++;
                            case Mapping.Statement(String verb) -> {
                                try {
                                    out.write(M.writeValueAsString(statement(e.examId(), e.candidateNumber(), e.packageId(),
                                            e.seq(), e.at(), verb, e.type(), e.taskId(), e.dataJson())));
                                    out.write('\n');
                                    n[0]++;
                                } catch (IOException x) {
                                    throw new UncheckedIOException(x);
                                }
                            }
                        }
                    }
                }
            });
        }
        return new Written(n[0], n[1], n[2]);
    }

    /**
     * Each event type's statement: the closest verb of the ADL vocabulary (adlnet.gov/expapi/verbs) or
     * the Activity Streams 1.0 base schema (activitystreams/activity-schema), "interacted" where none
     * is closer. No default branch: a new event type does not compile until it is mapped here.
     */
    public static Mapping mapping(EventType type) {
        return switch (type) {
            case SITTING_START -> new Mapping.Statement(ADL + "attempted");
            case SITTING_RESUME -> new Mapping.Statement(ADL + "resumed");
            case SITTING_END -> new Mapping.Statement(ADL + "terminated");
            case TASK_START -> new Mapping.Statement(ADL + "initialized");
            case TASK_END -> new Mapping.Statement(ADL + "completed");
            case NAV_SCREEN -> new Mapping.Statement(ADL + "experienced");
            case TOOL_QUERY -> new Mapping.Statement(AS + "search");
            case TOOL_OPEN -> new Mapping.Statement(AS + "open");
            case TOOL_INSERT -> new Mapping.Statement(AS + "insert");
            case PANEL_OPEN -> new Mapping.Statement(AS + "access");
            case PANEL_CLOSE -> new Mapping.Statement(AS + "close");
            case SUGGESTION_SHOW -> new Mapping.Statement(AS + "experience");
            case SUGGESTION_ACCEPT -> new Mapping.Statement(AS + "accept");
            case SUGGESTION_IGNORE -> new Mapping.Statement(AS + "ignore");
            case TEXT_INSERT, TEXT_DELETE, PASTE_REFUSED, FOCUS_LOST, FOCUS_RETURNED -> new Mapping.Statement(ADL + "interacted");
            case CHECK_RUN -> new Mapping.NotExported("the client's spelling or grammar checker ran, not the candidate");
            case TASK_REPLAY_PROBLEM -> new Mapping.NotExported("the client's own recovery check, not the candidate");
            case PAUSE_START, PAUSE_END -> new Mapping.NotExported("the invigilator paused the sitting, not the candidate");
            case TIMER_WARNING, TIMER_EXPIRED -> new Mapping.NotExported("the client's timer, not the candidate");
            case TIME_ADDED -> new Mapping.NotExported("time given by the roster, the invigilator or crash credit, not the candidate");
        };
    }

    static ObjectNode statement(String examId, String candidate, String packageId, long seq, String at, String verbId,
            String type, String taskId, String dataJson) throws IOException {
        ObjectNode s = M.createObjectNode();
        s.put("id", UUID.nameUUIDFromBytes((packageId + "#" + seq).getBytes(StandardCharsets.UTF_8)).toString());
        ObjectNode actor = s.putObject("actor");
        actor.put("objectType", "Agent");
        ObjectNode account = actor.putObject("account");
        account.put("homePage", BASE + "candidates/" + examId);
        account.put("name", candidate);
        ObjectNode verb = s.putObject("verb");
        verb.put("id", verbId);
        verb.putObject("display").put("en", verbId.substring(verbId.lastIndexOf('/') + 1));
        ObjectNode object = s.putObject("object");
        object.put("objectType", "Activity");
        String activity = BASE + "exams/" + examId + (taskId == null ? "" : "/tasks/" + taskId);
        object.put("id", activity);
        ObjectNode definition = object.putObject("definition");
        if (taskId != null) {
            definition.put("type", "http://adlnet.gov/expapi/activities/cmi.interaction");
            definition.put("interactionType", "long-fill-in");
        } else {
            definition.put("type", "http://adlnet.gov/expapi/activities/assessment");
        }
        definition.putObject("name").put("en", taskId == null ? examId : taskId);
        ObjectNode context = s.putObject("context");
        context.put("registration", UUID.fromString(packageId).toString());
        context.putObject("contextActivities").putArray("parent").addObject()
                .put("objectType", "Activity").put("id", BASE + "exams/" + examId);
        ObjectNode ext = context.putObject("extensions");
        ext.put(BASE + "extensions/event-type", type);
        ext.put(BASE + "extensions/seq", seq);
        JsonNode data = M.readTree(dataJson);
        ext.set(BASE + "extensions/data", data);
        s.put("timestamp", at);
        return s;
    }
}
