package org.inkgate.format.response;

import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;

/**
 * The fixed vocabulary of the process log ({@code events.jsonl}): each type's wire name, the level
 * it is written at and its {@code data} keys. This enum is the one definition: the client writes
 * only these types, the collector refuses a package that breaks them ({@link EventContract}), and
 * every reader switches on it without a default branch, so a new constant is a compile error in
 * each place that has to decide what to do with it. docs/formats.md ("Event types") lists the same
 * table, and a test compares the two.
 *
 * <p>Positions and lengths count UTF-16 code units of the answer text, as the editor does.
 */
public enum EventType {

    // sitting level
    /** The sitting began. */
    SITTING_START("sitting.start", Level.SITTING, keys("bundle", "form", "candidate"), keys()),
    /** The client restarted after a crash; {@code by} is {@code invigilator}. */
    SITTING_RESUME("sitting.resume", Level.SITTING, keys("downSeconds", "creditedSeconds", "by"), keys()),
    /** The candidate confirmed final submission: {@code reason} {@code submitted}. */
    SITTING_END("sitting.end", Level.SITTING, keys("reason"), keys()),
    /** The window lost focus (another program or the operating system took it). */
    FOCUS_LOST("focus.lost", Level.EITHER, keys(), keys()),
    /** The window has focus again. */
    FOCUS_RETURNED("focus.returned", Level.EITHER, keys("awayMillis"), keys()),
    /** The invigilator paused the sitting: {@code scope} {@code all} or {@code candidate}. */
    PAUSE_START("pause.start", Level.EITHER, keys("scope"), keys()),
    /** The pause ended. */
    PAUSE_END("pause.end", Level.EITHER, keys("pausedMillis"), keys()),
    /** A screen of the flow was shown (instructions, questionnaire, task, review...). */
    NAV_SCREEN("nav.screen", Level.EITHER, keys("screen"), keys()),

    // task level
    /** A task began or was re-entered after a restart ({@code resumed}). */
    TASK_START("task.start", Level.TASK, keys("policy", "tools", "condition", "resumed"), keys()),
    /** A task ended; {@code begun} false for a task ended before it began. */
    TASK_END("task.end", Level.TASK, keys("reason", "words"), keys("begun")),
    /** A recovered task's log did not replay to its last saved text; {@code problem} says where. */
    TASK_REPLAY_PROBLEM("task.replay-problem", Level.TASK, keys("problem"), keys()),
    /** Text was typed, pasted or inserted. */
    TEXT_INSERT("text.insert", Level.TASK, keys("pos", "len", "text", "source"), keys()),
    /** Text was removed ({@code text} is the removed text). */
    TEXT_DELETE("text.delete", Level.TASK, keys("pos", "len", "text", "source"), keys()),
    /** A paste was refused by the policy. */
    PASTE_REFUSED("paste.refused", Level.TASK, keys("reason", "len"), keys()),
    /**
     * The candidate went into the resource panel (keyboard focus in it, window focused), on the page
     * of {@code tool}; a tab switch while in the panel is a close and an open at the same moment.
     */
    PANEL_OPEN("panel.open", Level.TASK, keys("tool"), keys()),
    /** The candidate left the resource panel or its page (focus back to the answer or elsewhere, window lost focus, workspace closed). */
    PANEL_CLOSE("panel.close", Level.TASK, keys("tool"), keys()),
    /** A glossary or dictionary lookup. */
    TOOL_QUERY("tool.query", Level.TASK, keys("tool", "pack", "query", "hits", "micros"), keys()),
    /** An entry was opened from a lookup's results (not the panel: see {@link #PANEL_OPEN}). */
    TOOL_OPEN("tool.open", Level.TASK, keys("tool", "pack", "entry"), keys()),
    /** Text from the panel was inserted into the answer. */
    TOOL_INSERT("tool.insert", Level.TASK, keys("tool", "entry", "pos", "text"), keys()),
    /** A spelling or grammar check finished. */
    CHECK_RUN("check.run", Level.TASK, keys("issues", "micros"), keys()),
    /** Suggestions for one flagged range were shown. */
    SUGGESTION_SHOW("suggestion.show", Level.TASK, keys("tool", "rule", "pos", "len", "word", "suggestions"), keys()),
    /** A suggestion replaced the flagged text. */
    SUGGESTION_ACCEPT("suggestion.accept", Level.TASK, keys("tool", "rule", "pos", "from", "to"), keys()),
    /** A flagged word was ignored for this candidate. */
    SUGGESTION_IGNORE("suggestion.ignore", Level.TASK, keys("tool", "rule", "word"), keys()),
    /** A time warning was announced. */
    TIMER_WARNING("timer.warning", Level.TASK, keys("minutesLeft"), keys()),
    /** Time ran out: {@code scope} {@code task}, or {@code sitting} (then without a task). */
    TIMER_EXPIRED("timer.expired", Level.EITHER, keys("scope"), keys()),
    /** Time was added: {@code reason} roster, invigilator or crash-credit; without a task when none is left. */
    TIME_ADDED("time.added", Level.EITHER, keys("seconds", "reason"), keys());

    /** Where an event belongs: whether its line carries a {@code task}. */
    public enum Level {
        /** Never has a task. */
        SITTING,
        /** Always has a task. */
        TASK,
        /** Has the task that was current, or none when no task was. */
        EITHER;

        /** The name docs/formats.md uses. */
        public String docName() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    /** A wire name read from a log: one of the types, or a name the vocabulary does not have. */
    public sealed interface Parsed permits Known, Unknown {
    }

    /** A wire name of the vocabulary. */
    public record Known(EventType type) implements Parsed {
        public Known {
            Objects.requireNonNull(type, "type");
        }
    }

    /** A wire name that is not in the vocabulary (a newer or faulty client, or a hand-made file). */
    public record Unknown(String wireName) implements Parsed {
    }

    private static final Map<String, EventType> BY_WIRE = Arrays.stream(values())
            .collect(Collectors.toUnmodifiableMap(EventType::wireName, Function.identity()));

    private final String wireName;
    private final Level level;
    private final Set<String> requiredKeys;
    private final Set<String> optionalKeys;

    EventType(String wireName, Level level, Set<String> requiredKeys, Set<String> optionalKeys) {
        this.wireName = wireName;
        this.level = level;
        this.requiredKeys = requiredKeys;
        this.optionalKeys = optionalKeys;
    }

    /** The name in {@code events.jsonl}, e.g. {@code text.insert}. */
    public String wireName() {
        return wireName;
    }

    public Level level() {
        return level;
    }

    /** The data keys every event of this type carries, in the documented order. */
    public Set<String> requiredKeys() {
        return requiredKeys;
    }

    /** The data keys an event of this type may carry besides the required ones. */
    public Set<String> optionalKeys() {
        return optionalKeys;
    }

    /** Whether {@code key} is one of this type's data keys. */
    public boolean allows(String key) {
        return requiredKeys.contains(key) || optionalKeys.contains(key);
    }

    /** The type a wire name stands for, or {@link Unknown} (never null, never an exception). */
    public static Parsed parse(String wireName) {
        EventType t = wireName == null ? null : BY_WIRE.get(wireName);
        return t == null ? new Unknown(wireName) : new Known(t);
    }

    private static Set<String> keys(String... keys) {
        return Collections.unmodifiableSet(new LinkedHashSet<>(List.of(keys)));
    }
}
