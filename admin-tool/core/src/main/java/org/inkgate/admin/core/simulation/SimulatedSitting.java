package org.inkgate.admin.core.simulation;

import java.io.IOException;
import java.nio.file.Path;
import java.security.PrivateKey;
import java.security.PublicKey;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.UUID;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.QuestionItem;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.json.Json;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.QuestionnaireAnswers;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.ResponsePackageWriter;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.response.ToolUse;
import org.inkgate.packs.policy.Tool;

/**
 * Writes SIMULATED response packages for a bundle with the real {@link ResponsePackageWriter}:
 * invented texts made of filler words, a typing log, tool use where the policy offers tools. For
 * demos, tests and benchmarks only, never for a live sitting: every text says it is simulated.
 */
public final class SimulatedSitting {

    private static final String[] WORDS = {"simulated", "text", "the", "ferry", "square", "market", "because", "and",
        "people", "would", "like", "to", "see", "more", "time", "in", "town", "with", "a", "new", "plan", "for", "everyone"};
    private static final Instant START = Instant.parse("2026-06-15T09:00:00Z");

    private final BundleManifest bundle;
    private final String manifestSha256;
    private final ResponsePackageWriter writer;

    /**
     * @param installationKey the simulated client installation's signing key
     * @param ownerEncryption the owner's X25519 public key the packages are encrypted to
     */
    public SimulatedSitting(BundleManifest bundle, String manifestSha256, PrivateKey installationKey,
            PublicKey ownerEncryption) {
        this.bundle = bundle;
        this.manifestSha256 = manifestSha256;
        this.writer = new ResponsePackageWriter(installationKey, ownerEncryption);
    }

    /** The simulated response of one candidate on one form, with about {@code events} events in all. */
    public ResponseDocument document(String candidateNumber, String formId, long seed, String packageId) {
        SplittableRandom random = new SplittableRandom(seed);
        FormSpec form = bundle.form(formId).orElseThrow(() -> new IllegalArgumentException("no form " + formId));
        List<TaskResponse> tasks = new ArrayList<>();
        Instant t = START;
        for (FormSlot slot : form.slots()) {
            int words = 40 + random.nextInt(80);
            StringBuilder text = new StringBuilder("(Simulated response, invented for a demo.)");
            for (int i = 0; i < words; i++) {
                text.append(' ').append(WORDS[random.nextInt(WORDS.length)]);
            }
            Map<Tool, ToolUse> use = new EnumMap<>(Tool.class);
            for (Tool tool : slot.policy().offeredTools()) {
                int shown = random.nextInt(6);
                use.put(tool, new ToolUse(tool == Tool.GLOSSARY || tool == Tool.DICTIONARY ? random.nextInt(4) : 0, 0, 0,
                        shown, shown == 0 ? 0 : random.nextInt(shown + 1), 0, 0));
            }
            Instant end = t.plusSeconds(600 + random.nextInt(600));
            tasks.add(new TaskResponse(slot.taskId(), slot.conditionId(), text.toString(), words + 6, t, end, 0,
                    slot.policy(), slot.policy().offeredTools(), use, TaskResponse.EndReason.SUBMITTED));
            t = end.plusSeconds(60);
        }
        List<QuestionnaireAnswers> answers = new ArrayList<>();
        if (form.postQuestionnaire() != null) {
            QuestionnaireSpec q = bundle.questionnaire(form.postQuestionnaire()).orElseThrow();
            Map<String, String> a = new java.util.TreeMap<>();
            for (QuestionItem item : q.items()) {
                a.put(item.id(), item.kind() == QuestionItem.Kind.LIKERT
                        ? String.valueOf(1 + random.nextInt(item.labels().size())) : "(simulated answer)");
            }
            answers.add(new QuestionnaireAnswers(q.id(), a));
        }
        return new ResponseDocument(ResponseDocument.FORMAT, ResponseDocument.SCHEMA_VERSION, packageId, bundle.examId(),
                manifestSha256, candidateNumber, "seat-" + candidateNumber, formId, "simulated", START, t, tasks, answers);
    }

    /**
     * A log of {@code count} events spread over the document's tasks, keeping the event contract
     * ({@link EventType}): each task opens with {@code task.start} and, where it offers tools, the
     * first page in view ({@code panel.open}, closed just before the task ends); typing appends a letter, every seventh event deletes
     * the last one, every 97th is a lookup where a glossary or dictionary is offered; the task's
     * last event is {@code task.end}. Replaying the text events gives a text of letters (the
     * document's texts are filler words and do not match it).
     */
    public static List<ProcessEvent> events(ResponseDocument d, int count, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        List<ProcessEvent> events = new ArrayList<>();
        int perTask = Math.max(1, count / Math.max(1, d.tasks().size()));
        long[] mono = {1_000_000_000L};
        for (TaskResponse task : d.tasks()) {
            Instant[] at = {task.startedAt()};
            StringBuilder typed = new StringBuilder();
            Tool page = task.toolsOffered().stream().sorted().findFirst().orElse(null);
            Tool lookup = task.toolsOffered().contains(Tool.GLOSSARY) ? Tool.GLOSSARY
                    : task.toolsOffered().contains(Tool.DICTIONARY) ? Tool.DICTIONARY : null;
            java.util.function.BiConsumer<EventType, Map<String, Object>> add = (type, data) -> {
                long step = 50 + random.nextInt(400);
                at[0] = at[0].plusMillis(step);
                mono[0] += step * 1_000_000L;
                events.add(new ProcessEvent(events.size() + 1, at[0], mono[0], type, task.taskId(), data));
            };
            for (int i = 0; i < perTask && events.size() < count; i++) {
                boolean last = i == perTask - 1 || events.size() == count - 1;
                if (i == 0) {
                    add.accept(EventType.TASK_START, Map.of("policy", new String(Json.writeLine(task.policy()),
                            java.nio.charset.StandardCharsets.UTF_8), "tools", toolNames(task.toolsOffered()),
                            "condition", task.conditionId(), "resumed", false));
                } else if (last) {
                    add.accept(EventType.TASK_END, Map.of("reason", "submitted", "words", task.wordCount()));
                } else if (i == 1 && page != null) {
                    add.accept(EventType.PANEL_OPEN, Map.of("tool", wire(page)));
                } else if (i == perTask - 2 && page != null) {
                    add.accept(EventType.PANEL_CLOSE, Map.of("tool", wire(page)));
                } else if (lookup != null && i % 97 == 0) {
                    add.accept(EventType.TOOL_QUERY, Map.of("tool", wire(lookup), "pack", "simulated-pack",
                            "query", "simulated", "hits", 0, "micros", 100));
                } else if (i % 7 == 0 && !typed.isEmpty()) {
                    int pos = typed.length() - 1;
                    String removed = typed.substring(pos);
                    typed.setLength(pos);
                    add.accept(EventType.TEXT_DELETE, Map.of("pos", pos, "len", 1, "text", removed, "source", "typing"));
                } else {
                    String letter = String.valueOf((char) ('a' + random.nextInt(26)));
                    add.accept(EventType.TEXT_INSERT, Map.of("pos", typed.length(), "len", 1, "text", letter,
                            "source", "typing"));
                    typed.append(letter);
                }
            }
        }
        return events;
    }

    private static String wire(Tool tool) {
        return tool.name().toLowerCase(java.util.Locale.ROOT);
    }

    private static String toolNames(java.util.Set<Tool> tools) {
        return String.join(",", tools.stream().sorted().map(SimulatedSitting::wire).toList());
    }

    /** Writes one candidate's simulated package; returns its package id. */
    public String write(String candidateNumber, String formId, long seed, int events, Path out) throws IOException {
        String packageId = UUID.nameUUIDFromBytes((bundle.examId() + "|" + candidateNumber + "|" + seed)
                .getBytes(java.nio.charset.StandardCharsets.UTF_8)).toString();
        ResponseDocument d = document(candidateNumber, formId, seed, packageId);
        writer.write(d, events(d, events, seed), out);
        return packageId;
    }

    /** Writes a given document with a simulated event log (for conflicting or edited copies in tests). */
    public void write(ResponseDocument d, int events, long seed, Path out) throws IOException {
        writer.write(d, events(d, events, seed), out);
    }
}
