package org.inkgate.admin.core.store.sql;

import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.inkgate.admin.core.rating.RaterRegister.RaterEntry;

/** Finding a third rater for a flagged response, inside the transaction that flagged it. */
final class Adjudicators {

    private final RatingSession s;

    Adjudicators(RatingSession s) {
        this.s = s;
    }

    /**
     * A third rater for a flagged response, by the assignment's balancing: not one of its raters,
     * capacity left, the smallest workload in this exam; among equals one whose queue does not end
     * with the same candidate; remaining ties broken at random from the run's seed and the response,
     * so a review repeated on a copy of the store picks the same rater.
     */
    void assign(long sittingId, String taskId, String now) throws SQLException {
        s.lockQueues(); // before the queue ends are read: another desk's flag may be adding to them
        Set<String> already = new HashSet<>(s.db.list("SELECT rater_id FROM rating_assignments WHERE sitting_id=? AND"
                + " task_id=?", rs -> rs.getString(1), sittingId, taskId));
        Map<String, Integer> load = s.tails.loadInTx();
        long seed = s.db.list("SELECT COALESCE(MAX(seed), 0) FROM rating_assignments WHERE sitting_id=? AND task_id=?",
                rs -> rs.getLong(1), sittingId, taskId).get(0);
        Random rng = new Random(seed * 31 + sittingId * 1_000_003L + taskId.hashCode());
        String candidate = s.db.list("SELECT candidate_number FROM sittings WHERE sitting_id=?", rs -> rs.getString(1),
                sittingId).get(0);
        List<String> eligible = new ArrayList<>();
        int least = Integer.MAX_VALUE;
        for (RaterEntry r : s.raterEntries()) {
            int l = load.getOrDefault(r.id(), 0);
            if (already.contains(r.id()) || r.capacity() != null && l >= r.capacity()) {
                continue;
            }
            eligible.add(r.id());
            least = Math.min(least, l);
        }
        String best = null;
        long bestKey = Long.MAX_VALUE;
        for (String r : eligible) {
            if (load.getOrDefault(r, 0) != least) {
                continue;
            }
            // among the least loaded, a rater whose queue would end with this candidate's other response is
            // passed over (common practice against the halo effect); then a seeded random choice
            int adjacent = candidate.equals(s.tails.lastCandidateInTx(r)) ? 1 : 0;
            long key = ((long) adjacent << 20) + rng.nextInt(1 << 20);
            if (key < bestKey) {
                bestKey = key;
                best = r;
            }
        }
        if (best == null) {
            return; // stays in the adjudication queue without a rater: flags() says so, and a resolution entry settles it
        }
        String blind;
        do {
            blind = s.blindIds.next(new HashSet<>());
        } while (s.db.exists("SELECT 1 FROM rating_assignments WHERE blind_id=?", blind));
        s.db.update("INSERT INTO rating_assignments(sitting_id, task_id, rater_id, seed, created_at, run_id, blind_id, kind,"
                + " queue_position) VALUES (?,?,?,?,?,NULL,?,'adjudication',?)", sittingId, taskId, best, seed, now,
                blind, s.tails.nextPositionInTx(best));
        s.tails.added(best, candidate); // the new item is now the end of that rater's queue
    }
}
