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

/**
 * Process and tool events as xAPI 1.0.3 statements, one JSON object per line. The actor is an
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

    /** Writes the statements to {@code file}; returns how many were written. */
    public static long write(ResultsStore store, String examId, Path file) throws IOException, StoreException {
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        long[] n = new long[1];
        try (Writer out = new BufferedWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), 1 << 16)) {
            store.forEachEvent(examId, e -> {
                try {
                    out.write(M.writeValueAsString(statement(e.examId(), e.candidateNumber(), e.packageId(), e.seq(),
                            e.at(), e.type(), e.taskId(), e.dataJson())));
                    out.write('\n');
                    n[0]++;
                } catch (IOException x) {
                    throw new UncheckedIOException(x);
                }
            });
        }
        return n[0];
    }

    /** The verb for an event type: the closest ADL or Activity Streams verb, "interacted" otherwise. */
    static String verb(String type) {
        return switch (type) {
            case "tool.query" -> AS + "search";
            case "tool.open" -> AS + "open";
            case "suggestion.accept" -> AS + "accept";
            case "task.start" -> ADL + "initialized";
            case "task.end", "sitting.submit" -> ADL + "completed";
            default -> ADL + "interacted";
        };
    }

    static ObjectNode statement(String examId, String candidate, String packageId, long seq, String at, String type,
            String taskId, String dataJson) throws IOException {
        ObjectNode s = M.createObjectNode();
        s.put("id", UUID.nameUUIDFromBytes((packageId + "#" + seq).getBytes(StandardCharsets.UTF_8)).toString());
        ObjectNode actor = s.putObject("actor");
        actor.put("objectType", "Agent");
        ObjectNode account = actor.putObject("account");
        account.put("homePage", BASE + "candidates/" + examId);
        account.put("name", candidate);
        String verbId = verb(type);
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
