package org.inkgate.client.sitting;

/**
 * The fixed vocabulary of the process log, with the data fields each event carries. The admin
 * tool's analysis reads {@code text.insert}/{@code text.delete} ({@code pos}, {@code len},
 * {@code text}) and {@code tool.query} ({@code query}); docs/formats.md keeps the same list.
 * Positions and lengths count UTF-16 code units of the answer text, as the editor does.
 */
public final class EventTypes {

    // sitting level (task is null)
    /** The sitting began: {@code bundle} (manifest SHA-256), {@code form}, {@code candidate}. */
    public static final String SITTING_START = "sitting.start";
    /** The client restarted after a crash: {@code downSeconds}, {@code creditedSeconds}, {@code by} ("invigilator"). */
    public static final String SITTING_RESUME = "sitting.resume";
    /** The candidate confirmed final submission, or the sitting was ended: {@code reason}. */
    public static final String SITTING_END = "sitting.end";
    /** The window lost focus (another program or the OS took it). */
    public static final String FOCUS_LOST = "focus.lost";
    /** The window has focus again: {@code awayMillis}. */
    public static final String FOCUS_RETURNED = "focus.returned";
    /** The invigilator paused the sitting: {@code scope} ("all" or "candidate"). */
    public static final String PAUSE_START = "pause.start";
    /** The pause ended: {@code pausedMillis}. */
    public static final String PAUSE_END = "pause.end";
    /** A screen of the flow was shown: {@code screen} (instructions, questionnaire, task, review). */
    public static final String NAV_SCREEN = "nav.screen";

    // task level
    /** A task began or was re-entered: {@code policy} (the resource policy as JSON), {@code tools} (offered, comma-separated). */
    public static final String TASK_START = "task.start";
    /** A task ended: {@code reason} (submitted, time-up, ended-by-invigilator), {@code words}. */
    public static final String TASK_END = "task.end";
    /** Text was typed, pasted or inserted: {@code pos}, {@code len}, {@code text}, {@code source} (typing, paste, panel, suggestion, undo, redo). */
    public static final String TEXT_INSERT = "text.insert";
    /** Text was removed: {@code pos}, {@code len}, {@code text} (the removed text), {@code source}. */
    public static final String TEXT_DELETE = "text.delete";
    /** A paste was refused by the policy: {@code reason} (outside-clipboard, paste-forbidden), {@code len}. */
    public static final String PASTE_REFUSED = "paste.refused";
    /** The resource panel (or one tool's tab in it) was opened: {@code tool}. */
    public static final String PANEL_OPEN = "panel.open";
    /** The resource panel (or one tool's tab) was closed: {@code tool}. */
    public static final String PANEL_CLOSE = "panel.close";
    /** A glossary or dictionary lookup: {@code tool}, {@code pack}, {@code query}, {@code hits}, {@code micros}. */
    public static final String TOOL_QUERY = "tool.query";
    /** An entry was opened from the results: {@code tool}, {@code pack}, {@code entry}. */
    public static final String TOOL_OPEN = "tool.open";
    /** Text from the panel was inserted into the answer: {@code tool}, {@code entry}, {@code pos}, {@code text}. */
    public static final String TOOL_INSERT = "tool.insert";
    /** A spelling/grammar check finished: {@code issues}, {@code micros}. */
    public static final String CHECK_RUN = "check.run";
    /** Suggestions for one flagged range were shown: {@code tool}, {@code rule}, {@code pos}, {@code len}, {@code word}, {@code suggestions}. */
    public static final String SUGGESTION_SHOW = "suggestion.show";
    /** A suggestion replaced the flagged text: {@code tool}, {@code rule}, {@code pos}, {@code from}, {@code to}. */
    public static final String SUGGESTION_ACCEPT = "suggestion.accept";
    /** A flagged word was ignored for this candidate: {@code tool}, {@code rule}, {@code word}. */
    public static final String SUGGESTION_IGNORE = "suggestion.ignore";
    /** A time warning was announced: {@code minutesLeft}. */
    public static final String TIMER_WARNING = "timer.warning";
    /** The task's time ran out. */
    public static final String TIMER_EXPIRED = "timer.expired";
    /** Time was added: {@code seconds}, {@code reason} (roster, invigilator, crash-credit). */
    public static final String TIME_ADDED = "time.added";

    private EventTypes() {
    }
}
