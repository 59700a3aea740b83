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

    /**
     * The default IRI base for activities, extensions and the account home page: a placeholder in
     * the reserved {@code example} domain (RFC 2606); {@link Options#iriBase} replaces it.
     */
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

    /**
     * What the statements file holds: statements written, and events left out (not exported, unknown
     * to this version, or keystrokes left out of a light export).
     */
    public record Written(long statements, long notExported, long unknownType, long keystrokesLeftOut) {
    }

    /**
     * How to export.
     *
     * @param iriBase the IRI every activity, extension and account home page starts with (ends in {@code /})
     * @param light   leave out the per-keystroke statements ({@code text.insert}, {@code text.delete}):
     *                tool use, task and sitting boundaries, focus and navigation remain
     */
    public record Options(String iriBase, boolean light) {
        public static final Options DEFAULT = new Options(BASE, false);

        public Options {
            iriBase = checkedBase(iriBase);
        }
    }

    /**
     * An IRI base a record store can use: absolute {@code https} or {@code http} with a host, no query
     * or fragment, printable ASCII only (activity ids should be IRIs under a domain the owner controls);
     * a final {@code /} is added.
     */
    static String checkedBase(String base) {
        java.net.URI uri;
        try {
            uri = new java.net.URI(base);
        } catch (java.net.URISyntaxException | NullPointerException e) {
            throw new IllegalArgumentException("xAPI IRI base \"" + OutputFolder.printable(base) + "\" is not an IRI;"
                    + " give one like https://assessment.your-domain.org/xapi/");
        }
        if (!("https".equals(uri.getScheme()) || "http".equals(uri.getScheme())) || uri.getHost() == null
                || uri.getQuery() != null || uri.getFragment() != null || !base.matches("[\\x21-\\x7E]+")) {
            throw new IllegalArgumentException("xAPI IRI base \"" + OutputFolder.printable(base) + "\" must be an http(s)"
                    + " address with a host and no query or fragment, e.g. https://assessment.your-domain.org/xapi/");
        }
        return base.endsWith("/") ? base : base + "/";
    }

    /** Writes the statements to {@code file} under the default options. */
    public static Written write(ResultsStore store, String examId, Path file) throws IOException, StoreException {
        return write(store, examId, file, Options.DEFAULT);
    }

    /** Writes the statements to {@code file}. */
    public static Written write(ResultsStore store, String examId, Path file, Options options)
            throws IOException, StoreException {
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        long[] n = new long[4];
        try (Writer out = new BufferedWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), 1 << 16)) {
            store.forEachEvent(examId, e -> {
                switch (EventType.parse(e.type())) {
                    // a store filled before the collector checked the event contract may hold one
                    case EventType.Unknown u -> n[2]++;
                    case EventType.Known(EventType type) when options.light() && perKeystroke(type) -> n[3]++;
                    case EventType.Known(EventType type) -> {
                        switch (mapping(type)) {
                            case Mapping.NotExported x -> n[1]++;
                            case Mapping.Statement(String verb) -> {
                                try {
                                    out.write(M.writeValueAsString(statement(options.iriBase(), e.examId(), e.candidateNumber(),
                                            e.packageId(), e.seq(), e.at(), verb, e.type(), e.taskId(), e.dataJson())));
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
        return new Written(n[0], n[1], n[2], n[3]);
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

    /** The events a light export leaves out: one per keystroke or deletion, the bulk of a log. */
    public static boolean perKeystroke(EventType type) {
        return type == EventType.TEXT_INSERT || type == EventType.TEXT_DELETE;
    }

    /**
     * The verb's display in English, in the past tense as the xAPI 1.0.3 specification's examples
     * write it (Data 2.4.3, e.g. "voided", "completed"; recalled from the specification, not checked
     * against a copy here): ADL's verbs are named in the past tense already, Activity Streams 1.0's
     * in the present, so those are turned here.
     */
    public static String display(String verbId) {
        String name = verbId.substring(verbId.lastIndexOf('/') + 1);
        return switch (name) {
            case "search" -> "searched";
            case "open" -> "opened";
            case "insert" -> "inserted";
            case "access" -> "accessed";
            case "close" -> "closed";
            case "experience" -> "experienced";
            case "accept" -> "accepted";
            case "ignore" -> "ignored";
            default -> name;
        };
    }

    static ObjectNode statement(String base, String examId, String candidate, String packageId, long seq, String at,
            String verbId, String type, String taskId, String dataJson) throws IOException {
        ObjectNode s = M.createObjectNode();
        s.put("id", UUID.nameUUIDFromBytes((packageId + "#" + seq).getBytes(StandardCharsets.UTF_8)).toString());
        ObjectNode actor = s.putObject("actor");
        actor.put("objectType", "Agent");
        ObjectNode account = actor.putObject("account");
        account.put("homePage", base + "candidates/" + examId);
        account.put("name", candidate);
        ObjectNode verb = s.putObject("verb");
        verb.put("id", verbId);
        verb.putObject("display").put("en", display(verbId));
        ObjectNode object = s.putObject("object");
        object.put("objectType", "Activity");
        String activity = base + "exams/" + examId + (taskId == null ? "" : "/tasks/" + taskId);
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
                .put("objectType", "Activity").put("id", base + "exams/" + examId);
        ObjectNode ext = context.putObject("extensions");
        ext.put(base + "extensions/event-type", type);
        ext.put(base + "extensions/seq", seq);
        JsonNode data = M.readTree(dataJson);
        ext.set(base + "extensions/data", data);
        s.put("timestamp", at);
        return s;
    }
}
