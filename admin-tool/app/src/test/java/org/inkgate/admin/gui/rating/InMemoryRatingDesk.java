package org.inkgate.admin.gui.rating;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.inkgate.admin.core.rating.RatingDesk;
import org.inkgate.admin.core.rating.RatingException;
import org.inkgate.admin.core.rating.Referrals;
import org.inkgate.admin.core.source.ExamSource;

/**
 * A test double of the {@link RatingDesk} contract held in memory, so the desk's window can be
 * driven before (and beside) the store's implementation. It keeps what a store would (drafts,
 * submissions with their history) and refuses what the contract says to refuse. Each response
 * also carries the facts a rater must never see (candidate, level, form, condition), which the
 * desk never returns, so a test can look for them on screen. All content is invented.
 */
final class InMemoryRatingDesk implements RatingDesk {

    /** A response with the facts the desk hides. */
    record Hidden(String blindId, String taskId, String taskTitle, String text, String candidate, String level,
            String form, String condition) {
    }

    private record Entry(String blindId, Kind kind) {
    }

    private final List<Rater> raters = new ArrayList<>();
    private final Map<String, Hidden> responses = new LinkedHashMap<>();
    private final Map<String, List<Entry>> queues = new LinkedHashMap<>();
    private final Map<String, RatingSheet> drafts = new LinkedHashMap<>();
    private final Map<String, RatingSheet> submitted = new LinkedHashMap<>();
    private final List<String> history = new ArrayList<>();
    private final Map<String, String> prompts = new LinkedHashMap<>();
    private final ExamSource.Rubric rubric;
    private int draftWrites;

    InMemoryRatingDesk(ExamSource.Rubric rubric) {
        this.rubric = rubric;
    }

    synchronized InMemoryRatingDesk rater(String id, String label) {
        raters.add(new Rater(id, label));
        queues.put(id, new ArrayList<>());
        return this;
    }

    synchronized InMemoryRatingDesk response(Hidden response) {
        responses.put(response.blindId(), response);
        return this;
    }

    synchronized InMemoryRatingDesk prompt(String taskId, String prompt) {
        prompts.put(taskId, prompt);
        return this;
    }

    synchronized InMemoryRatingDesk assign(String raterId, String blindId, Kind kind) {
        queues.get(raterId).add(new Entry(blindId, kind));
        return this;
    }

    synchronized Optional<RatingSheet> submitted(String raterId, String blindId) {
        return Optional.ofNullable(submitted.get(key(raterId, blindId)));
    }

    synchronized Optional<RatingSheet> draft(String raterId, String blindId) {
        return Optional.ofNullable(drafts.get(key(raterId, blindId)));
    }

    synchronized List<String> history() {
        return List.copyOf(history);
    }

    synchronized int draftWrites() {
        return draftWrites;
    }

    synchronized List<Hidden> hidden() {
        return List.copyOf(responses.values());
    }

    @Override
    public synchronized List<Rater> raters() {
        return List.copyOf(raters);
    }

    @Override
    public synchronized List<QueueItem> queue(String raterId) throws RatingException {
        List<Entry> entries = entries(raterId);
        List<QueueItem> items = new ArrayList<>();
        for (int i = 0; i < entries.size(); i++) {
            Entry e = entries.get(i);
            items.add(new QueueItem(i + 1, e.blindId(), responses.get(e.blindId()).taskId(), e.kind(),
                    submitted.containsKey(key(raterId, e.blindId()))));
        }
        return items;
    }

    @Override
    public synchronized BlindResponse response(String raterId, String blindId) throws RatingException {
        inQueue(raterId, blindId);
        Hidden h = responses.get(blindId);
        return new BlindResponse(h.blindId(), h.taskId(), h.taskTitle(), h.text(), prompts.get(h.taskId()));
    }

    @Override
    public synchronized ExamSource.Rubric rubric(String blindId) throws RatingException {
        if (!responses.containsKey(blindId)) {
            throw new RatingException("No response " + blindId + ".");
        }
        return rubric;
    }

    @Override
    public synchronized Optional<RatingSheet> sheet(String raterId, String blindId) throws RatingException {
        inQueue(raterId, blindId);
        String k = key(raterId, blindId);
        return Optional.ofNullable(drafts.containsKey(k) ? drafts.get(k) : submitted.get(k));
    }

    @Override
    public synchronized void saveDraft(String raterId, String blindId, RatingSheet sheet) throws RatingException {
        inQueue(raterId, blindId);
        drafts.put(key(raterId, blindId), sheet);
        draftWrites++;
    }

    @Override
    public synchronized void submit(String raterId, String blindId, RatingSheet sheet) throws RatingException {
        inQueue(raterId, blindId);
        for (ExamSource.Criterion c : rubric.criteria()) {
            Integer s = sheet.scores().get(c.id());
            if (s == null) {
                throw new RatingException("Criterion " + c.id() + " has no score.");
            }
            if (s < c.minScore() || s > c.maxScore()) {
                throw new RatingException("Criterion " + c.id() + ": " + s + " is outside " + c.minScore() + "-" + c.maxScore() + ".");
            }
        }
        String k = key(raterId, blindId);
        submitted.put(k, sheet);
        drafts.remove(k);
        history.add(raterId + " " + blindId + " " + sheet.scores());
    }

    /** Referrals sent: rater, blind id, reason word and note. */
    final List<String> referrals = new ArrayList<>();

    @Override
    public synchronized long refer(String raterId, String blindId, Referrals.Reason reason, String note)
            throws RatingException {
        inQueue(raterId, blindId);
        referrals.add(raterId + " " + blindId + " " + reason.word() + " " + note);
        return referrals.size();
    }

    @Override
    public synchronized Progress progress(String raterId) throws RatingException {
        List<Entry> entries = entries(raterId);
        int rated = (int) entries.stream().filter(e -> submitted.containsKey(key(raterId, e.blindId()))).count();
        return new Progress(entries.size(), rated, entries.size() - rated, 0);
    }

    private List<Entry> entries(String raterId) throws RatingException {
        List<Entry> entries = queues.get(raterId);
        if (entries == null) {
            throw new RatingException("No rater " + raterId + ".");
        }
        return entries;
    }

    private void inQueue(String raterId, String blindId) throws RatingException {
        if (entries(raterId).stream().noneMatch(e -> e.blindId().equals(blindId))) {
            throw new RatingException("Response " + blindId + " is not in the queue of rater " + raterId + ".");
        }
    }

    private static String key(String raterId, String blindId) {
        return raterId + "\u0000" + blindId;
    }
}
