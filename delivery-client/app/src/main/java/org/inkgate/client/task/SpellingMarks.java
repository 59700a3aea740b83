package org.inkgate.client.task;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletionException;
import java.util.function.Consumer;
import javafx.animation.Animation;
import javafx.animation.PauseTransition;
import javafx.application.Platform;
import javafx.util.Duration;
import org.fxmisc.richtext.model.StyleSpans;
import org.fxmisc.richtext.model.StyleSpansBuilder;
import org.fxmisc.richtext.model.TwoDimensional;
import org.inkgate.packs.spelling.CheckIssue;
import org.inkgate.packs.spelling.CheckResult;
import org.inkgate.packs.spelling.SpellingChecker;

/**
 * Underlines what the task's checker flags. Checks run on the checker's own thread, at most one
 * every {@link #CHECK_AFTER} while the candidate types; a result that arrives after further edits
 * is moved through those edits (flags they touched are dropped) rather than thrown away, so
 * underlines keep up with continuous typing. Only paragraphs whose flags changed are restyled.
 */
final class SpellingMarks {

    /** Delay from the first edit to the check that covers it (common practice for live checking: a few hundred ms). */
    static final Duration CHECK_AFTER = Duration.millis(300);
    static final String SPELLING_STYLE = "spelling-flag";
    static final String GRAMMAR_STYLE = "grammar-flag";

    private final AnswerArea area;
    private final SpellingChecker checker;
    private final TaskEvents events;
    private final Consumer<List<CheckIssue>> onFlagsChanged;
    private final Consumer<Throwable> onFailure;
    private final Flags flags = new Flags();
    private final PauseTransition timer = new PauseTransition(CHECK_AFTER);
    /** Edits made since the newest check started; its result is moved through them. */
    private List<TextEdit> sinceCheck = new ArrayList<>();
    private boolean closed;

    SpellingMarks(AnswerArea area, SpellingChecker checker, TaskEvents events, Consumer<List<CheckIssue>> onFlagsChanged,
                  Consumer<Throwable> onFailure) {
        this.area = Objects.requireNonNull(area, "area");
        this.checker = Objects.requireNonNull(checker, "checker");
        this.events = Objects.requireNonNull(events, "events");
        this.onFlagsChanged = Objects.requireNonNull(onFlagsChanged, "onFlagsChanged");
        this.onFailure = Objects.requireNonNull(onFailure, "onFailure");
        timer.setOnFinished(e -> checkNow());
    }

    Flags flags() {
        return flags;
    }

    /** Called for every change to the text, on the JavaFX thread. */
    void edited(TextEdit edit) {
        sinceCheck.add(edit);
        List<CheckIssue> before = flags.all();
        List<CheckIssue> dropped = flags.apply(edit);
        if (!dropped.isEmpty()) {
            restyle(before, dropped);
            onFlagsChanged.accept(flags.all());
        }
        if (timer.getStatus() != Animation.Status.RUNNING) {
            timer.playFromStart();
        }
    }

    /** Starts a check of the whole text now (the checker re-checks only changed paragraphs). */
    void checkNow() {
        if (closed) {
            return;
        }
        timer.stop();
        List<TextEdit> edits = new ArrayList<>();
        sinceCheck = edits;
        checker.check(area.getText()).whenComplete((result, failure) -> Platform.runLater(() -> arrived(result, failure, edits)));
    }

    /** Removes the flags on one word everywhere (after "ignore"), until the next check agrees. */
    void forget(Collection<CheckIssue> gone) {
        List<CheckIssue> before = flags.all();
        List<CheckIssue> kept = new ArrayList<>(before);
        kept.removeAll(gone);
        flags.replaceAll(kept);
        restyle(before, List.copyOf(gone));
        onFlagsChanged.accept(flags.all());
    }

    void close() {
        closed = true;
        timer.stop();
    }

    private void arrived(CheckResult result, Throwable failure, List<TextEdit> editsSince) {
        if (closed) {
            return;
        }
        if (failure != null) {
            Throwable cause = failure instanceof CompletionException c && c.getCause() != null ? c.getCause() : failure;
            if (!(cause instanceof CancellationException)) {
                onFailure.accept(cause);
            }
            return; // cancelled: a newer check replaced this one and its result will come
        }
        events.tool(result.event());
        if (editsSince != sinceCheck) {
            return; // stale: a newer check started after this one, its result supersedes this
        }
        List<CheckIssue> moved = new ArrayList<>(result.issues().size());
        for (CheckIssue i : result.issues()) {
            CheckIssue m = i;
            for (TextEdit e : editsSince) {
                m = Flags.through(m, e).orElse(null);
                if (m == null) {
                    break;
                }
            }
            if (m != null && m.end() <= area.getLength()) {
                moved.add(m);
            }
        }
        List<CheckIssue> before = flags.all();
        flags.replaceAll(moved);
        restyle(before, moved);
        onFlagsChanged.accept(flags.all());
    }

    /** Restyles the paragraphs that held a flag before or hold one now, where the flags differ. */
    private void restyle(List<CheckIssue> before, List<CheckIssue> now) {
        Set<Integer> paragraphs = new TreeSet<>();
        int length = area.getLength();
        for (CheckIssue i : before) {
            if (i.start() <= length) {
                paragraphs.add(paragraphOf(Math.min(i.start(), length)));
            }
        }
        for (CheckIssue i : now) {
            paragraphs.add(paragraphOf(Math.min(i.start(), length)));
        }
        for (int p : paragraphs) {
            styleParagraph(p);
        }
    }

    private int paragraphOf(int offset) {
        return area.offsetToPosition(offset, TwoDimensional.Bias.Forward).getMajor();
    }

    private void styleParagraph(int paragraph) {
        if (paragraph >= area.getParagraphs().size()) {
            return;
        }
        int start = area.getAbsolutePosition(paragraph, 0);
        int length = area.getParagraph(paragraph).length();
        StyleSpansBuilder<Collection<String>> spans = new StyleSpansBuilder<>();
        int at = 0;
        for (CheckIssue i : flags.all()) {
            int from = i.start() - start;
            int to = Math.min(i.end() - start, length);
            if (to <= 0 || from >= length || from < at) {
                continue;
            }
            if (from > at) {
                spans.add(List.of(), from - at);
            }
            spans.add(List.of(i.kind() == CheckIssue.Kind.GRAMMAR ? GRAMMAR_STYLE : SPELLING_STYLE), to - from);
            at = to;
        }
        spans.add(List.of(), Math.max(0, length - at));
        StyleSpans<Collection<String>> built = spans.create();
        area.setStyleSpans(paragraph, 0, built);
    }
}
