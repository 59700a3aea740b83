package org.inkgate.admin.gui.rating;

import java.time.LocalTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingDesk.BlindResponse;
import org.inkgate.admin.core.rating.RatingDesk.Progress;
import org.inkgate.admin.core.rating.RatingDesk.QueueItem;
import org.inkgate.admin.core.rating.RatingDesk.Rater;
import org.inkgate.admin.core.rating.RatingDesk.RatingSheet;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.Referrals;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.gui.Messages;

/**
 * The rating desk's view model: who is signed in, their queue, the response open now with its
 * rubric, the scores and comment being entered, and progress. Every change to a score or the
 * comment is kept as a draft through {@link RatingDesk#saveDraft} (durable when it returns), so
 * closing or losing the window loses nothing typed; all store calls run off the JavaFX thread.
 */
public final class DeskModel implements AutoCloseable {

    private static final DateTimeFormatter CLOCK = DateTimeFormatter.ofPattern("HH:mm:ss");

    /** One criterion's score field as the rater fills it. */
    public static final class CriterionScore {
        private final ExamSource.Criterion criterion;
        private final StringProperty text = new SimpleStringProperty("");
        private final ObjectProperty<ScoreEntry> entry = new SimpleObjectProperty<>(new ScoreEntry.Empty());
        private final StringProperty message = new SimpleStringProperty("");

        CriterionScore(ExamSource.Criterion criterion) {
            this.criterion = criterion;
        }

        public ExamSource.Criterion criterion() {
            return criterion;
        }

        /** The digits in the field (bound both ways to the field). */
        public StringProperty text() {
            return text;
        }

        /** What the digits mean: empty, partial, a valid score. */
        public ObjectProperty<ScoreEntry> entry() {
            return entry;
        }

        /** Why the last keystroke was refused, or what is still missing; empty when all is well. */
        public StringProperty message() {
            return message;
        }

        /** The score, if the field holds a valid one. */
        public Optional<Integer> score() {
            return entry.get() instanceof ScoreEntry.Valid v ? Optional.of(v.score()) : Optional.empty();
        }
    }

    private record Loaded(List<QueueItem> queue, Progress progress) {
    }

    private record Opened(QueueItem item, BlindResponse response, ExamSource.Rubric rubric, Optional<RatingSheet> sheet) {
    }

    private final RatingDesk desk;
    private final DeskCalls calls = new DeskCalls();
    private final ObservableList<Rater> raters = FXCollections.observableArrayList();
    private final ObjectProperty<Rater> rater = new SimpleObjectProperty<>();
    private final ObservableList<QueueItem> queue = FXCollections.observableArrayList();
    private final ObjectProperty<QueueItem> current = new SimpleObjectProperty<>();
    private final ObjectProperty<BlindResponse> response = new SimpleObjectProperty<>();
    private final ObservableList<CriterionScore> scores = FXCollections.observableArrayList();
    private final StringProperty comment = new SimpleStringProperty("");
    private final ObjectProperty<Referrals.Reason> referReason = new SimpleObjectProperty<>();
    private final StringProperty referNote = new SimpleStringProperty("");
    private final ObjectProperty<Progress> progress = new SimpleObjectProperty<>();
    private final StringProperty status = new SimpleStringProperty("");
    private final StringProperty problem = new SimpleStringProperty("");
    private final BooleanProperty finished = new SimpleBooleanProperty(false);
    private final IntegerProperty revision = new SimpleIntegerProperty(0);
    /** Drafts typed but not yet written, by blind id; the writer takes the newest and skips stale ones. */
    private final Map<String, RatingSheet> unwritten = new ConcurrentHashMap<>();
    private boolean filling;

    public DeskModel(RatingDesk desk) {
        this.desk = desk;
        comment.addListener((o, was, now) -> keepDraft());
    }

    public ObservableList<Rater> raters() {
        return raters;
    }

    /** The rater signed in; null on the sign-in screen. */
    public ObjectProperty<Rater> rater() {
        return rater;
    }

    public ObservableList<QueueItem> queue() {
        return queue;
    }

    /** The queue item open now; null before one opens and when the queue is finished. */
    public ObjectProperty<QueueItem> current() {
        return current;
    }

    public ObjectProperty<BlindResponse> response() {
        return response;
    }

    /** One entry per rubric criterion of the open response, in rubric order. */
    public ObservableList<CriterionScore> scores() {
        return scores;
    }

    public StringProperty comment() {
        return comment;
    }

    public ObjectProperty<Progress> progress() {
        return progress;
    }

    /** Quiet news: when the draft was last kept, what was saved. */
    public StringProperty status() {
        return status;
    }

    /** A problem the rater must see (a score missing, a store that refused a write); empty when none. */
    public StringProperty problem() {
        return problem;
    }

    /** True when every item of the queue is submitted and nothing is open. */
    public BooleanProperty finished() {
        return finished;
    }

    /** Goes up by one each time a response (or the finished state) is shown, after all other properties are set. */
    public ReadOnlyIntegerProperty revision() {
        return revision;
    }

    /** Store calls queued or running (0 when every draft has been written). */
    public ReadOnlyIntegerProperty pending() {
        return calls.pending();
    }

    /** Reads the exam's raters for the sign-in list. */
    public void loadRaters() {
        calls.run(desk::raters, list -> {
            raters.setAll(list);
            problem.set(list.isEmpty() ? "No raters are set up for this exam. The test owner adds raters and assigns"
                    + " responses before rating starts." : "");
        }, this::failed);
    }

    /** Signs {@code who} in and opens where they stopped: the first response in their queue not yet submitted. */
    public void signIn(Rater who) {
        if (who == null) {
            problem.set("Choose your rater id in the list first.");
            return;
        }
        problem.set("");
        rater.set(who);
        calls.run(() -> load(who.id()), loaded -> {
            apply(loaded);
            openNextAfter(0);
        }, this::failed);
    }

    /** Back to the sign-in screen; what was typed is already kept as a draft. */
    public void signOut() {
        rater.set(null);
        clearOpen();
        queue.clear();
        progress.set(null);
        finished.set(false);
        status.set("");
        problem.set("");
        revision.set(revision.get() + 1);
    }

    /** Opens {@code item} (its draft or submitted sheet filled in). */
    public void open(QueueItem item) {
        Rater who = rater.get();
        if (who == null || item == null) {
            return;
        }
        calls.run(() -> new Opened(item, desk.response(who.id(), item.blindId()), desk.rubric(item.blindId()),
                desk.sheet(who.id(), item.blindId())), this::show, this::failed);
    }

    /** Opens the item {@code delta} places away in the queue (drafts are already kept). */
    public void move(int delta) {
        QueueItem at = current.get();
        int index = at == null ? (delta > 0 ? -1 : queue.size()) : queue.indexOf(at);
        int target = index + delta;
        if (target >= 0 && target < queue.size()) {
            open(queue.get(target));
        }
    }

    /** Records a keystroke the field refused, so the rater sees why. */
    public void refused(CriterionScore score, String message) {
        score.message().set(message);
    }

    /** Steps a criterion's score with the arrow keys, within its range. */
    public void step(CriterionScore score, int delta) {
        score.text().set(Integer.toString(ScoreEntry.step(score.criterion(), score.entry().get(), delta)));
    }

    /**
     * Submits the open sheet and opens the next response not yet submitted. When a criterion has no
     * score, nothing is sent: the problem names it and the criterion is returned, so the view can focus it.
     */
    public Optional<CriterionScore> submitAndNext() {
        Rater who = rater.get();
        QueueItem item = current.get();
        if (who == null || item == null) {
            return Optional.empty();
        }
        List<String> missing = new ArrayList<>();
        CriterionScore first = null;
        for (CriterionScore s : scores) {
            if (s.score().isEmpty()) {
                missing.add(s.criterion().name());
                first = first == null ? s : first;
                s.message().set(s.criterion().name() + " needs a score from " + s.criterion().minScore() + " to "
                        + s.criterion().maxScore() + ".");
            }
        }
        if (first != null) {
            problem.set("Not saved yet: score every criterion first. Missing: " + String.join(", ", missing) + ".");
            return Optional.of(first);
        }
        RatingSheet sheet = sheet();
        unwritten.remove(item.blindId());
        problem.set("");
        calls.run(() -> {
            desk.submit(who.id(), item.blindId(), sheet);
            return load(who.id());
        }, loaded -> {
            apply(loaded);
            status.set("Rating of " + item.blindId() + " saved at " + LocalTime.now().format(CLOCK) + ".");
            openNextAfter(item.position());
        }, this::failed);
        return Optional.empty();
    }

    /** The reason chosen for referring the open script; null until chosen. */
    public ObjectProperty<Referrals.Reason> referReason() {
        return referReason;
    }

    /** What the rater saw, sent with a referral. */
    public StringProperty referNote() {
        return referNote;
    }

    /**
     * Refers the open script to the test owner with the chosen reason and note. The script stays
     * in the queue: the test owner decides what follows, and the rater may still rate it.
     */
    public void refer() {
        Rater who = rater.get();
        QueueItem item = current.get();
        Referrals.Reason reason = referReason.get();
        String note = referNote.get() == null ? "" : referNote.get().strip();
        if (who == null || item == null) {
            return;
        }
        if (reason == null || note.isEmpty()) {
            problem.set("Not referred yet: choose a reason and say in the note what you saw.");
            return;
        }
        problem.set("");
        calls.run(() -> desk.refer(who.id(), item.blindId(), reason, note), id -> {
            referReason.set(null);
            referNote.set("");
            status.set("Response " + item.blindId() + " referred to the test owner (referral " + id + ", "
                    + reason.word() + ") at " + LocalTime.now().format(CLOCK) + ". You may still rate it.");
        }, this::failed);
    }

    /** Waits for queued drafts to reach the store, then stops the background thread. */
    @Override
    public void close() {
        calls.close();
    }

    private Loaded load(String raterId) throws RatingException {
        return new Loaded(desk.queue(raterId), desk.progress(raterId));
    }

    private void apply(Loaded loaded) {
        queue.setAll(loaded.queue());
        progress.set(loaded.progress());
    }

    /** Opens the first unsubmitted item after {@code position}, else the first unsubmitted one, else shows the end. */
    private void openNextAfter(int position) {
        Optional<QueueItem> next = queue.stream().filter(q -> !q.done() && q.position() > position).findFirst()
                .or(() -> queue.stream().filter(q -> !q.done()).findFirst());
        if (next.isPresent()) {
            open(next.get());
        } else {
            clearOpen();
            finished.set(true);
            revision.set(revision.get() + 1);
        }
    }

    private void show(Opened opened) {
        filling = true;
        try {
            Map<String, Integer> saved = opened.sheet().map(RatingSheet::scores).orElse(Map.of());
            List<CriterionScore> fresh = new ArrayList<>();
            for (ExamSource.Criterion c : opened.rubric().criteria()) {
                CriterionScore s = new CriterionScore(c);
                s.text().addListener((o, was, now) -> typed(s, now));
                Integer score = saved.get(c.id());
                s.text().set(score == null ? "" : Integer.toString(score));
                fresh.add(s);
            }
            scores.setAll(fresh);
            comment.set(opened.sheet().map(RatingSheet::comment).orElse(""));
            response.set(opened.response());
            current.set(opened.item());
            finished.set(false);
            problem.set("");
            status.set(opened.sheet().isPresent() && !opened.item().done()
                    ? "Your draft for " + opened.item().blindId() + " is back as you left it." : "");
        } finally {
            filling = false;
        }
        revision.set(revision.get() + 1);
    }

    private void typed(CriterionScore s, String text) {
        ScoreEntry entry = ScoreEntry.of(s.criterion(), text);
        s.entry().set(entry);
        s.message().set(switch (entry) {
            case ScoreEntry.Partial p -> "Keep typing: " + p.digits() + " is not a score of " + s.criterion().name() + " yet.";
            case ScoreEntry.Refused r -> r.message();
            case ScoreEntry.Empty e -> "";
            case ScoreEntry.Valid v -> "";
        });
        keepDraft();
    }

    /** The sheet as entered now: valid scores only, and the comment. */
    private RatingSheet sheet() {
        Map<String, Integer> map = new LinkedHashMap<>();
        scores.forEach(s -> s.score().ifPresent(v -> map.put(s.criterion().id(), v)));
        return new RatingSheet(map, comment.get());
    }

    private void keepDraft() {
        Rater who = rater.get();
        QueueItem item = current.get();
        // a submitted rating changes only when submitted again, so edits to it are not drafts
        if (filling || who == null || item == null || item.done()) {
            return;
        }
        String id = item.blindId();
        unwritten.put(id, sheet());
        calls.run(() -> {
            RatingSheet newest = unwritten.remove(id);
            if (newest != null) {
                desk.saveDraft(who.id(), id, newest);
            }
            return newest != null;
        }, wrote -> {
            if (wrote) {
                status.set("Draft kept at " + LocalTime.now().format(CLOCK) + ".");
            }
        }, e -> problem.set("Your last change could not be kept: " + message(e) + " Keep this window open and tell"
                + " the test owner; the scores on screen are not stored yet."));
    }

    private void failed(Exception e) {
        problem.set(message(e));
    }

    private static String message(Exception e) {
        Function<Exception, String> plain = x -> x instanceof RatingException ? x.getMessage() : Messages.of(x);
        return plain.apply(e);
    }

    private void clearOpen() {
        filling = true;
        try {
            current.set(null);
            response.set(null);
            scores.clear();
            comment.set("");
        } finally {
            filling = false;
        }
    }
}
