package org.inkgate.format.response;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.inkgate.format.refusal.FormatRefusal;

/**
 * Checks a process log against the vocabulary of {@link EventType}: every type known, every
 * required data key present, no key the type does not declare, the task present exactly when the
 * type's level asks for one, and every task one of the response's tasks. The reader does not
 * apply these rules (a package that breaks them is still a faithful copy of what a client wrote);
 * the collector does, so that no broken event is ever counted in a study.
 */
public final class EventContract {

    /** Longest wire name or key quoted back in a message; longer ones are cut (they come from the file). */
    private static final int QUOTE_LIMIT = 60;

    /** One event that breaks the contract. */
    public record Violation(long seq, String type, Problem problem, String detail) {

        /** {@code event 12 (tool.query): data key "query" missing}, safe to print. */
        public String describe() {
            return "event " + seq + " (" + quote(type) + "): " + detail;
        }
    }

    /** What is wrong with the event. */
    public enum Problem {
        UNKNOWN_TYPE, MISSING_KEY, UNDECLARED_KEY, TASK_MISSING, TASK_NOT_ALLOWED, TASK_NOT_IN_RESPONSE
    }

    private EventContract() {
    }

    /** Every violation in the log, in log order; empty when the log keeps the contract. */
    public static List<Violation> check(Collection<String> responseTaskIds, List<ProcessEvent> events) {
        Set<String> tasks = Set.copyOf(responseTaskIds);
        List<Violation> out = new ArrayList<>();
        // a log repeats a few shapes (a type with its data keys) thousands of times: the last keys that kept the
        // contract for each type name are remembered, and an event with the same keys needs only its task checked
        Map<String, Shape> kept = new HashMap<>();
        for (ProcessEvent e : events) {
            String[] keys = e.data() instanceof EventData d ? d.keyArray() : null;
            Shape shape = keys == null ? null : kept.get(e.type());
            if (shape != null && Arrays.equals(shape.keys(), keys)) {
                checkTask(shape.type(), e, tasks, out);
                continue;
            }
            switch (EventType.parse(e.type())) {
                case EventType.Unknown u -> out.add(new Violation(e.seq(), e.type(), Problem.UNKNOWN_TYPE,
                        "not an event type of the response format (docs/formats.md lists them)"));
                case EventType.Known(EventType type) -> {
                    if (checkKeys(type, e, out) && keys != null) {
                        kept.put(e.type(), new Shape(type, keys));
                    }
                    checkTask(type, e, tasks, out);
                }
            }
        }
        return out;
    }

    /** A type and data keys that keep the contract together. */
    private record Shape(EventType type, String[] keys) {
    }

    /** The same check for a response document: its tasks are the ones events may name. */
    public static List<Violation> check(ResponseDocument response, List<ProcessEvent> events) {
        return check(response.tasks().stream().map(TaskResponse::taskId).toList(), events);
    }

    /** Adds what is wrong with the event's data keys; true if nothing is. */
    private static boolean checkKeys(EventType type, ProcessEvent e, List<Violation> out) {
        int before = out.size();
        for (String key : type.requiredKeys()) {
            if (!e.data().containsKey(key)) {
                out.add(new Violation(e.seq(), e.type(), Problem.MISSING_KEY, "data key \"" + key + "\" missing"));
            }
        }
        for (String key : e.data().keySet()) {
            if (!type.allows(key)) {
                out.add(new Violation(e.seq(), e.type(), Problem.UNDECLARED_KEY, "data key \"" + quote(key)
                        + "\" is not one of this type's keys " + type.requiredKeys() + (type.optionalKeys().isEmpty()
                                ? "" : " (optional " + type.optionalKeys() + ")")));
            }
        }
        return out.size() == before;
    }

    /** Adds what is wrong with the event's task: missing, not allowed, or not one of the response's. */
    private static void checkTask(EventType type, ProcessEvent e, Set<String> tasks, List<Violation> out) {
        boolean hasTask = e.task() != null;
        switch (type.level()) {
            case TASK -> {
                if (!hasTask) {
                    out.add(new Violation(e.seq(), e.type(), Problem.TASK_MISSING, "a task-level event without a task"));
                }
            }
            case SITTING -> {
                if (hasTask) {
                    out.add(new Violation(e.seq(), e.type(), Problem.TASK_NOT_ALLOWED, "a sitting-level event names task \""
                            + quote(e.task()) + "\""));
                }
            }
            case EITHER -> {
            }
        }
        if (hasTask && !tasks.contains(e.task())) {
            out.add(new Violation(e.seq(), e.type(), Problem.TASK_NOT_IN_RESPONSE, "names task \"" + quote(e.task())
                    + "\", which is not one of the response's tasks " + tasks.stream().sorted().toList()));
        }
    }

    private static String quote(String outside) {
        if (outside == null) {
            return "null";
        }
        String cut = outside.length() > QUOTE_LIMIT ? outside.substring(0, QUOTE_LIMIT) + "..." : outside;
        return FormatRefusal.printable(cut);
    }
}
