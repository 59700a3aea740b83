package org.inkgate.client.sitting.replay;

import java.util.List;
import java.util.Objects;
import org.inkgate.format.response.EventType;
import org.inkgate.format.response.ProcessEvent;

/**
 * Rebuilds a task's text from its process log: each {@code text.insert} puts {@code text} at
 * {@code pos}, each {@code text.delete} removes {@code len} code units at {@code pos} that must
 * equal its {@code text}. Any event that does not fit the text it applies to (a position out of
 * range, a deleted text that is not there, a length that disagrees) is reported with its
 * sequence number, never silently skipped: a log that does not replay is evidence, not noise.
 */
public final class TextReplay {

    private TextReplay() {
    }

    /**
     * Applies the text events of {@code taskId} among {@code events} to {@code start}, in order.
     * Events of other tasks and other types are ignored.
     *
     * @throws ReplayException naming the first event that does not fit
     */
    public static Replayed replay(String start, int startCaret, String taskId, List<ProcessEvent> events) throws ReplayException {
        Objects.requireNonNull(taskId, "taskId");
        StringBuilder text = new StringBuilder(Objects.requireNonNullElse(start, ""));
        int caret = startCaret;
        int applied = 0;
        long lastSeq = 0;
        for (ProcessEvent e : events) {
            if (!taskId.equals(e.task())) {
                continue;
            }
            boolean insert = EventType.TEXT_INSERT.wireName().equals(e.type());
            boolean delete = EventType.TEXT_DELETE.wireName().equals(e.type());
            if (!insert && !delete) {
                continue;
            }
            int pos = intField(e, "pos");
            String piece = stringField(e, "text");
            Object len = e.data().get("len");
            if (len != null && (!(len instanceof Number n) || n.intValue() != piece.length())) {
                throw new ReplayException(e.seq(), "its len " + len + " differs from the length " + piece.length() + " of its text");
            }
            if (pos < 0 || pos > text.length()) {
                throw new ReplayException(e.seq(), "position " + pos + " lies outside the text (length " + text.length() + ")");
            }
            if (insert) {
                text.insert(pos, piece);
                caret = pos + piece.length();
            } else {
                int end = pos + piece.length();
                if (end > text.length() || !text.substring(pos, end).equals(piece)) {
                    throw new ReplayException(e.seq(), "it deletes \"" + shorten(piece) + "\" at " + pos + " but the text there is \""
                            + shorten(text.substring(pos, Math.min(end, text.length()))) + "\"");
                }
                text.delete(pos, end);
                caret = pos;
            }
            applied++;
            lastSeq = e.seq();
        }
        return new Replayed(text.toString(), Math.max(0, Math.min(caret, text.length())), applied, lastSeq);
    }

    /** Replays a task from an empty text. */
    public static Replayed replay(String taskId, List<ProcessEvent> events) throws ReplayException {
        return replay("", 0, taskId, events);
    }

    /**
     * Compares a stored text (a snapshot or a submitted answer) with what the log replays to;
     * empty when they agree.
     */
    public static java.util.Optional<ReplayMismatch> compare(String taskId, String expected, String replayed) {
        if (expected.equals(replayed)) {
            return java.util.Optional.empty();
        }
        int i = 0;
        int n = Math.min(expected.length(), replayed.length());
        while (i < n && expected.charAt(i) == replayed.charAt(i)) {
            i++;
        }
        return java.util.Optional.of(new ReplayMismatch(taskId, i, expected.length(), replayed.length()));
    }

    private static int intField(ProcessEvent e, String name) throws ReplayException {
        Object v = e.data().get(name);
        if (v instanceof Number n && n.doubleValue() == n.intValue()) {
            return n.intValue();
        }
        throw new ReplayException(e.seq(), "its field \"" + name + "\" is " + (v == null ? "missing" : "not a whole number: " + v));
    }

    private static String stringField(ProcessEvent e, String name) throws ReplayException {
        if (e.data().get(name) instanceof String s) {
            return s;
        }
        throw new ReplayException(e.seq(), "its field \"" + name + "\" is missing or not text");
    }

    private static String shorten(String s) {
        String shown = s.length() > 40 ? s.substring(0, 40) + "..." : s;
        return shown.replace("\n", "\\n");
    }
}
