package org.inkgate.admin.core.store.sql;

import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.inkgate.admin.core.rating.AssignmentRuns;
import org.inkgate.admin.core.rating.RaterLinks;
import org.inkgate.admin.core.rating.RaterRegister.RaterEntry;
import org.inkgate.admin.core.rating.RatingAssigner;
import org.inkgate.admin.core.rating.RatingException;

/** {@link AssignmentRuns} in the results store (SQLite or PostgreSQL). */
final class SqlAssignmentRuns implements AssignmentRuns {

    private final RatingSession s;

    SqlAssignmentRuns(RatingSession s) {
        this.s = s;
    }

    @Override
    public List<RatingAssigner.Response> unassignedResponses() throws RatingException {
        return s.read("listing responses", this::unassigned);
    }

    private List<RatingAssigner.Response> unassigned() throws SQLException {
        return s.db.list("SELECT r.sitting_id, r.task_id, s.candidate_number FROM"
                + " responses r JOIN sittings s ON s.sitting_id = r.sitting_id WHERE s.exam_id=? AND NOT EXISTS (SELECT 1"
                + " FROM rating_assignments a WHERE a.sitting_id = r.sitting_id AND a.task_id = r.task_id)"
                + " ORDER BY r.sitting_id, r.task_id",
                rs -> new RatingAssigner.Response(rs.getLong(1), rs.getString(2), rs.getString(3)), s.examId);
    }

    /**
     * Plans and stores the run in one transaction that first takes the exam's assignment lock
     * ({@link Dialect#lockAssignmentRuns}): a second run started meanwhile (another admin machine on
     * a server store) waits, then plans from what this one stored, so no response is assigned twice
     * and no queue interleaves.
     */
    @Override
    public AssignmentOutcome assign(int k, long seed, boolean allowUnlinked) throws RatingException {
        return s.tx("storing the rating assignment", () -> {
            s.lockQueues();
            List<RatingAssigner.Response> todo = unassigned();
            if (todo.isEmpty()) {
                throw SqlSession.refusal(new RatingException("every response of exam " + s.examId
                        + " already has its raters; nothing to assign"));
            }
            List<RaterEntry> raters = s.raterEntries();
            if (raters.isEmpty()) {
                throw SqlSession.refusal(new RatingException("no raters yet; add them first (rate raters add ID --label NAME)"));
            }
            List<RatingAssigner.RaterCapacity> capacities = new ArrayList<>();
            Map<String, Integer> load = s.workloads();
            for (RaterEntry r : raters) {
                Integer left = r.capacity() == null ? null : Math.max(0, r.capacity() - load.getOrDefault(r.id(), 0));
                capacities.add(new RatingAssigner.RaterCapacity(r.id(), left));
            }
            Map<String, String> last = new HashMap<>();
            for (RaterEntry r : raters) {
                String c = s.tails.lastOwnCandidate(r.id());
                if (c != null) {
                    last.put(r.id(), c);
                }
            }
            RatingAssigner.Plan plan;
            try {
                plan = RatingAssigner.assign(todo, capacities, load, last, k, seed);
            } catch (RatingException refused) {
                throw SqlSession.refusal(refused);
            }
            return store(plan, todo.size(), capacities, k, seed, allowUnlinked);
        });
    }

    private AssignmentOutcome store(RatingAssigner.Plan plan, int responses, List<RatingAssigner.RaterCapacity> capacities,
            int k, long seed, boolean allowUnlinked) throws SQLException {
        String now = s.now();
        StringBuilder raterList = new StringBuilder();
        capacities.forEach(r -> raterList.append(raterList.isEmpty() ? "" : " ").append(r.raterId())
                .append(r.capacity() == null ? "" : ":" + r.capacity()));
        long run = s.db.insert("INSERT INTO rating_runs(exam_id, seed, raters_per_response, raters, responses, linked,"
                + " rater_groups, created_at) VALUES (?,?,?,?,?,?,?,?)", s.examId, seed, k, raterList.toString(),
                responses, plan.links().connected() ? 1 : 0, plan.links().components().toString(), now);
        Set<String> taken = new HashSet<>(s.db.list("SELECT blind_id FROM rating_assignments WHERE blind_id IS NOT NULL",
                rs -> rs.getString(1)));
        Map<String, Integer> offset = new HashMap<>();
        for (String r : plan.workload().keySet()) {
            offset.put(r, s.tails.nextPosition(r) - 1);
        }
        for (RatingAssigner.Placement p : plan.placements()) {
            s.db.update("INSERT INTO rating_assignments(sitting_id, task_id, rater_id, seed, created_at, run_id, blind_id,"
                    + " kind, queue_position) VALUES (?,?,?,?,?,?,?,'rating',?)", p.response().sittingId(),
                    p.response().taskId(), p.raterId(), seed, now, run, s.blindIds.next(taken),
                    offset.get(p.raterId()) + p.queuePosition());
        }
        RaterLinks.Report whole = designNow();
        if (k >= 2 && !whole.connected() && !allowUnlinked) {
            throw SqlSession.refusal(new RatingException("the raters would fall into " + whole.components().size()
                    + " groups that share no response " + whole.components() + "; a many-facet Rasch analysis"
                    + " could not put them on one scale. Add responses per rater (fewer raters), raise raters per"
                    + " response, change capacities, or accept the split with --allow-unlinked. Nothing was stored"));
        }
        return new AssignmentOutcome(run, plan, whole);
    }

    @Override
    public RaterLinks.Report design() throws RatingException {
        return s.read("reading the rating design", this::designNow);
    }

    private RaterLinks.Report designNow() throws SQLException {
        Map<String, List<String>> byResponse = new TreeMap<>();
        // || concatenates in SQLite and PostgreSQL alike (a bigint and text give text in both)
        s.db.each("SELECT a.sitting_id || '/' || a.task_id, a.rater_id FROM rating_assignments a JOIN sittings s"
                + " ON s.sitting_id = a.sitting_id WHERE s.exam_id=? AND " + RatingSession.NOT_CONTROL
                + " ORDER BY a.assignment_id",
                rs -> byResponse.computeIfAbsent(rs.getString(1), x -> new ArrayList<>()).add(rs.getString(2)), s.examId);
        return RaterLinks.ofRaterSets(byResponse);
    }
}
