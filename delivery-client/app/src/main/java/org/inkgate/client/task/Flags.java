package org.inkgate.client.task;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.inkgate.packs.spelling.CheckIssue;

/**
 * The spelling and grammar flags currently shown, kept in step with edits: a flag after an edit
 * moves with its text, a flag the edit touches is dropped until the next check (its word has
 * changed, so its suggestions may no longer fit). Ordered by position.
 */
final class Flags {

    private List<CheckIssue> issues = List.of();

    /** Every flag, by position. */
    List<CheckIssue> all() {
        return issues;
    }

    /** Replaces every flag with the result of a check. */
    void replaceAll(List<CheckIssue> fresh) {
        issues = List.copyOf(fresh);
    }

    /** The flag covering this offset (its start up to and including its end), if any. */
    Optional<CheckIssue> at(int offset) {
        for (CheckIssue i : issues) {
            if (i.start() <= offset && offset <= i.end()) {
                return Optional.of(i);
            }
        }
        return Optional.empty();
    }

    /** Moves every flag through one edit; returns the flags it dropped. */
    List<CheckIssue> apply(TextEdit edit) {
        List<CheckIssue> kept = new ArrayList<>(issues.size());
        List<CheckIssue> dropped = new ArrayList<>();
        for (CheckIssue i : issues) {
            Optional<CheckIssue> moved = through(i, edit);
            if (moved.isPresent()) {
                kept.add(moved.get());
            } else {
                dropped.add(i);
            }
        }
        issues = List.copyOf(kept);
        return dropped;
    }

    /**
     * One flag moved through one edit, or empty when the edit changed its text: an edit inside it,
     * a deletion beside it (words may join), or non-blank text typed against it. A space typed
     * right after a flagged word leaves the flag alone, so flags do not flicker while typing.
     */
    static Optional<CheckIssue> through(CheckIssue i, TextEdit e) {
        int from = e.position();
        int to = e.removedEnd();
        if (i.end() < from) {
            return Optional.of(i);
        }
        if (i.start() > to) {
            return Optional.of(moved(i, e.shift()));
        }
        boolean overlaps = i.start() < to && i.end() > from;
        boolean touches = !overlaps && (i.end() == from || i.start() == to);
        if (overlaps || (touches && (!e.removed().isEmpty() || !e.inserted().isBlank()))) {
            return Optional.empty();
        }
        // touching with blank text only: the flag stays where its text now is
        return Optional.of(i.end() == from ? i : moved(i, e.shift()));
    }

    private static CheckIssue moved(CheckIssue i, int by) {
        return by == 0 ? i : new CheckIssue(i.kind(), i.ruleId(), i.category(), i.start() + by, i.end() + by, i.message(), i.suggestions());
    }
}
