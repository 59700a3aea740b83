package org.inkgate.admin.core.rating;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.Statement;
import java.util.List;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.StoreFixture;

/**
 * A results store holding an invented exam ("invented-river-exam"): candidates C0000.. with one
 * sitting each, every task answered, conditions alternating by candidate, and a two-criterion rubric
 * (1-9, bands 1-3, 4-6, 7-9). Rows are written with plain SQL so the rating tests do not depend on
 * bundles and packages; the schema is the real one (opening the results store migrates it).
 */
public final class InventedStore {

    public static final String EXAM = "invented-river-exam";
    static final ExamSource.Rubric RUBRIC = new ExamSource.Rubric("rubric.yaml", List.of(
            criterion("content", "Content"), criterion("language", "Language")));

    private InventedStore() {
    }

    private static ExamSource.Criterion criterion(String id, String name) {
        return new ExamSource.Criterion(id, name, 1, 9, List.of(new ExamSource.Band(1, 3, "weak (invented)"),
                new ExamSource.Band(4, 6, "adequate (invented)"), new ExamSource.Band(7, 9, "strong (invented)")));
    }

    public static Path make(Path dir, int candidates, List<String> tasks) throws Exception {
        Path file = dir.resolve("results.db");
        make(StoreFixture.of(file), candidates, tasks);
        return file;
    }

    /** The invented exam in a new store of the given kind (a SQLite file in {@code dir}, or a fresh server database). */
    public static StoreFixture make(StoreFixture.Kind kind, Path dir, int candidates, List<String> tasks) throws Exception {
        StoreFixture fixture = StoreFixture.create(kind, dir);
        make(fixture, candidates, tasks);
        return fixture;
    }

    private static void make(StoreFixture fixture, int candidates, List<String> tasks) throws Exception {
        try (ResultsStore store = fixture.results()) {
            try (Connection c = fixture.connect(); Statement s = c.createStatement()) {
                c.setAutoCommit(false);
                s.execute("INSERT INTO exams(exam_id, title, language, practice) VALUES ('" + EXAM + "', 'Invented river exam', 'en-GB', 0)");
                s.execute("INSERT INTO bundles VALUES ('b0', '" + EXAM + "', 'fp', '2026-12-01T00:00:00Z')");
                s.execute("INSERT INTO policy_snapshots(policy_id, policy_json, spelling, insert_from_panel, show_word_count,"
                        + " paste) VALUES (1, '{}', 'off', 0, 0, 'allow')");
                s.execute("INSERT INTO forms VALUES ('" + EXAM + "', 'F1')");
                s.execute("INSERT INTO conditions VALUES ('" + EXAM + "', 'with', 'With resources')");
                s.execute("INSERT INTO conditions VALUES ('" + EXAM + "', 'without', 'Without resources')");
                for (String t : tasks) {
                    s.execute("INSERT INTO tasks(exam_id, task_id, title, time_limit_seconds) VALUES ('" + EXAM + "', '" + t
                            + "', 'Invented task " + t + "', 1800)");
                }
                c.commit();
            }
            store.registerRubric(EXAM, RUBRIC);
        }
        addCandidates(fixture, 0, candidates, tasks);
    }

    /** Adds candidates {@code from} .. {@code from + count - 1}, each with one sitting answering every task. */
    public static void addCandidates(Path file, int from, int count, List<String> tasks) throws Exception {
        addCandidates(StoreFixture.of(file), from, count, tasks);
    }

    /** As {@link #addCandidates(Path, int, int, List)} in a store of any kind. */
    public static void addCandidates(StoreFixture fixture, int from, int count, List<String> tasks) throws Exception {
        try (Connection c = fixture.connect()) {
            c.setAutoCommit(false);
            try (PreparedStatement cand = c.prepareStatement("INSERT INTO candidates(exam_id, candidate_number, level,"
                    + " form_id) VALUES (?,?,?,'F1')");
                    PreparedStatement sit = c.prepareStatement("INSERT INTO sittings(sitting_id, package_sha256,"
                            + " package_id, content_sha256, exam_id, bundle_manifest_sha256, candidate_number, form_id,"
                            + " installation_fingerprint, submitted_at, source_file, imported_at)"
                            + " VALUES (?,?,?,?,?,'b0',?,'F1','inst','2026-12-01T10:00:00Z','f','2026-12-01T12:00:00Z')");
                    PreparedStatement resp = c.prepareStatement("INSERT INTO responses(sitting_id, task_id, position,"
                            + " condition_id, policy_id, tools_offered, text, word_count, extra_time_seconds, end_reason)"
                            + " VALUES (?,?,?,?,1,'',?,?,0,'submitted')")) {
                for (int i = from; i < from + count; i++) {
                    String number = String.format("C%04d", i);
                    cand.setString(1, EXAM);
                    cand.setString(2, number);
                    cand.setString(3, List.of("A2", "B1", "B2").get(i % 3));
                    cand.executeUpdate();
                    sit.setLong(1, i + 1);
                    sit.setString(2, "pkg" + i);
                    sit.setString(3, "P" + i);
                    sit.setString(4, "content" + i);
                    sit.setString(5, EXAM);
                    sit.setString(6, number);
                    sit.executeUpdate();
                    for (int t = 0; t < tasks.size(); t++) {
                        resp.setLong(1, i + 1);
                        resp.setString(2, tasks.get(t));
                        resp.setInt(3, t);
                        resp.setString(4, (i + t) % 2 == 0 ? "with" : "without");
                        resp.setString(5, "Invented response " + i + " to " + tasks.get(t) + ".");
                        resp.setInt(6, 5);
                        resp.executeUpdate();
                    }
                }
            }
            c.commit();
        }
    }
}
