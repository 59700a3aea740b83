package org.inkgate.rehearsal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javafx.stage.Stage;
import org.inkgate.admin.core.csv.Csv;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.submit.InstallationKey;
import org.inkgate.client.sitting.open.SittingBundleOpener;
import org.inkgate.client.sitting.open.SittingLoad;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.format.response.EventType;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * The rehearsal: a small invented study run through the real programs, whose every figure is
 * known because a script made it (issue 14, section 3).
 *
 * <ol>
 * <li>The test owner's steps with the real command line: keys, exam check, roster, forms
 * (crossover, seeded), bundle (signed, with the glossary and dictionary packs the build writes).</li>
 * <li>Six candidates (three levels, two each; {@code -Dinkgate.rehearsal.candidates=N} for more)
 * sit it in the real sitting window with the real task workspace and the lock applied, headless,
 * each following a {@link CandidateScript} on a {@link ScriptedClock}. One candidate's client is a
 * real process, killed with SIGKILL in the first task, and their sitting is recovered from its
 * per-sitting database by the real recovery screens.</li>
 * <li>The packages are collected by the real {@code collect} with the installations enrolled:
 * the client shows its installation fingerprint nowhere (no command, no screen), so the test reads
 * each seat's with the client's own {@code InstallationKey} from its data folder, as an enrolment
 * step would.</li>
 * <li>Three scripted raters of known severity (-1, 0, +1 on a known true score) rate through
 * {@code rate assign} and the rating sheets; {@code rate export} and {@code analyse --store}.</li>
 * </ol>
 *
 * Every mismatch is collected and reported together, so one run shows all that is wrong. Files
 * stay in {@code target/rehearsal} (commands.log holds every command and its output).
 */
@ExtendWith(ApplicationExtension.class)
class RehearsalTest {

    /** Six by default (two per level); more with -Dinkgate.rehearsal.candidates=N (a multiple of 6 keeps forms balanced). */
    private static final int CANDIDATES = Integer.getInteger("inkgate.rehearsal.candidates", 6);
    private static final List<String> LEVELS = List.of("A2", "B1", "B2");
    private static final String PASSPHRASE = "invented rehearsal passphrase";
    private static final String PIN = "rehearsal-pin-2468";
    private static final String WITH_TOOLS = "with-tools";
    /** Scripted raters: a harsh one, a middling one, a lenient one, in score points from the true score. */
    private static final Map<String, Integer> SEVERITY = new LinkedHashMap<>(Map.of("S1", -1, "S2", 0, "S3", 1));

    private final List<String> failures = new ArrayList<>();
    private final List<String> timings = new ArrayList<>();
    private long phaseStart = System.nanoTime();

    @Start
    void start(Stage primary) {
        // the JavaFX toolkit; every seat opens its own stage
    }

    @Test
    void rehearsal_scriptedRoom_everyFigureInStoreExportAndReportIsTheScripts() throws Exception {
        Path dir = Path.of("target", "rehearsal").toAbsolutePath();
        deleteTree(dir);
        Files.createDirectories(dir);
        Admin admin = new Admin(Map.of("REHEARSAL_PASSPHRASE", PASSPHRASE, "REHEARSAL_PIN", PIN), dir.resolve("commands.log"));
        List<CandidateScript> room = CandidateScript.room(CANDIDATES, LEVELS);

        // ---- 1. the test owner's preparation
        Path source = copyExamSource(dir);
        Path roster = dir.resolve("roster.csv");
        StringBuilder r = new StringBuilder("candidate_number,level\n");
        room.forEach(c -> r.append(c.number()).append(',').append(c.level()).append('\n'));
        Files.writeString(roster, r);
        Path keys = dir.resolve("owner-keys");
        ok(admin.run("keys", "init", "--keys", keys.toString(), "--passphrase-env", "REHEARSAL_PASSPHRASE"));
        String owner = fingerprint(ok(admin.run("keys", "show", "--keys", keys.toString())).out());
        ok(admin.run("exam", "check", source.toString()));
        ok(admin.run("roster", roster.toString()));
        Path assignment = dir.resolve("assignment.csv");
        ok(admin.run("forms", source.toString(), "--roster", roster.toString(), "--seed", "20261202", "--out",
                assignment.toString()));
        Path bundle = dir.resolve("rehearsal.inkexam");
        ok(admin.run("bundle", source.toString(), "--out", bundle.toString(), "--keys", keys.toString(), "--roster",
                roster.toString(), "--assignment", assignment.toString(), "--passphrase-env", "REHEARSAL_PASSPHRASE",
                "--pin-env", "REHEARSAL_PIN"));

        // which tasks each candidate writes with tools, in order: from the signed bundle itself
        Map<String, List<String>> tasksOf = new HashMap<>();
        Map<String, List<Boolean>> toolsOf = new HashMap<>();
        readPlan(bundle, owner, tasksOf, toolsOf);
        CandidateScript killed = room.stream().filter(c -> !toolsOf.get(c.number()).get(0)).findFirst()
                .orElseThrow(() -> new AssertionError("no form starts without tools: " + toolsOf));

        phase("preparation (keys, exam check, roster, forms, bundle)");
        // ---- 2. the sitting
        Path responses = Files.createDirectories(dir.resolve("responses"));
        Map<String, ScriptedSitting.Done> done = new LinkedHashMap<>();
        Map<String, Path> dataFolders = new LinkedHashMap<>();
        String typedBeforeKill = CandidateScript.PLAIN_TEXT.substring(0, CandidateScript.KILL_AFTER);
        for (CandidateScript c : room) {
            Path data = dir.resolve("seats").resolve(c.number());
            dataFolders.put(c.number(), data);
            if (c == killed) {
                KilledClient.typeThenKill(bundle, owner, data, responses, PIN, c.number(), typedBeforeKill,
                        dir.resolve("killed-client-stderr.txt"));
            }
            try (Seat seat = new Seat(new ScriptedClock())) {
                seat.open(bundle, data, owner);
                ScriptedSitting sitting = new ScriptedSitting(seat, c);
                done.put(c.number(), c == killed ? sitting.sitFromRecovery(PIN, responses, typedBeforeKill, toolsOf.get(c.number()))
                        : sitting.sitFromStart(PIN, responses, toolsOf.get(c.number())));
            }
            phase("sitting of " + c.number() + (c == killed ? " (killed and recovered)" : ""));
        }
        check("text the recovered client showed after the kill (" + killed.number() + ")", typedBeforeKill,
                done.get(killed.number()).recoveredText);

        // ---- 3. collect, with each seat's installation enrolled
        StringBuilder enrolled = new StringBuilder();
        for (Path data : dataFolders.values()) {
            enrolled.append(InstallationKey.loadOrCreate(new ClientDataFolder(data)).fingerprint()).append('\n');
        }
        Path installations = dir.resolve("installations.txt");
        Files.writeString(installations, enrolled);
        Path store = dir.resolve("results.db");
        Admin.Run collect = ok(admin.run("collect", responses.toString(), "--store", store.toString(), "--bundle",
                bundle.toString(), "--keys", keys.toString(), "--installations", installations.toString(), "--roster",
                roster.toString(), "--exam", source.toString(), "--assignment", assignment.toString(), "--passphrase-env",
                "REHEARSAL_PASSPHRASE"));
        check("collect's count", true, collect.out().contains("Imported " + CANDIDATES + ","));

        phase("collect");
        // ---- 4. what the store holds
        try (Connection db = DriverManager.getConnection("jdbc:sqlite:" + store)) {
            checkStore(db, room, tasksOf, toolsOf, done, killed, typedBeforeKill);
        }

        // ---- 5. the tidy export
        Path export = dir.resolve("export");
        ok(admin.run("export", "--store", store.toString(), "--out", export.toString()));
        checkExport(export.resolve("rehearsal-island-ferry/csv"), room, tasksOf, toolsOf, killed, typedBeforeKill);

        phase("store and export checks");
        // ---- 6. scripted raters through the rating commands
        for (String rater : SEVERITY.keySet()) {
            ok(admin.run("rate", "raters", "add", rater, "--label", "Invented rater " + rater, "--store", store.toString()));
        }
        ok(admin.run("rate", "assign", "--raters-per-response", "2", "--seed", "20261202", "--store", store.toString()));
        Map<String, String> levelOf = new HashMap<>();
        room.forEach(c -> levelOf.put(c.number(), c.level()));
        for (String rater : SEVERITY.keySet()) {
            Path sheet = dir.resolve("sheets").resolve(rater + ".csv");
            Files.createDirectories(sheet.getParent());
            ok(admin.run("rate", "sheet", "export", "--rater", rater, "--out", sheet.toString(), "--store", store.toString()));
            Files.writeString(sheet, fillSheet(store, rater, Files.readString(sheet), levelOf));
            ok(admin.run("rate", "sheet", "import", "--rater", rater, sheet.toString(), "--store", store.toString()));
        }
        Path ratingExport = dir.resolve("rating-export");
        ok(admin.run("rate", "export", "--out", ratingExport.toString(), "--store", store.toString()));
        Map<String, String> pairOf = checkRatings(ratingExport.resolve("ratings.csv"), levelOf, room.size());

        phase("rating");
        // ---- 7. the report from the store
        Path report = dir.resolve("report");
        ok(admin.run("analyse", "--store", store.toString(), "--out", report.toString()));
        checkReport(report, room, done, pairOf, killed);

        phase("analyse and report checks");
        Files.writeString(dir.resolve("timings.txt"), String.join("\n", timings) + "\n");
        Files.writeString(dir.resolve("failures.txt"), String.join("\n", failures) + "\n");
        assertEquals(List.of(), failures, failures.size() + " figure(s) differ from the script (also in "
                + dir.resolve("failures.txt") + ")");
    }

    // ---- the store

    private void checkStore(Connection db, List<CandidateScript> room, Map<String, List<String>> tasksOf,
            Map<String, List<Boolean>> toolsOf, Map<String, ScriptedSitting.Done> done, CandidateScript killed,
            String typedBeforeKill) throws Exception {
        for (CandidateScript c : room) {
            List<String> tasks = tasksOf.get(c.number());
            for (int k = 0; k < tasks.size(); k++) {
                boolean tools = toolsOf.get(c.number()).get(k);
                String expectedText = tools ? c.toolsText() : CandidateScript.PLAIN_TEXT;
                String where = c.number() + "/" + tasks.get(k);
                List<List<String>> rows = query(db, "SELECT r.text, r.word_count, r.condition_id, r.end_reason FROM responses r"
                        + " JOIN sittings s ON s.sitting_id = r.sitting_id WHERE s.candidate_number = ? AND r.task_id = ?",
                        c.number(), tasks.get(k));
                if (rows.size() != 1) {
                    failures.add(where + ": " + rows.size() + " responses in the store, not 1");
                    continue;
                }
                check(where + " text", expectedText, rows.get(0).get(0));
                check(where + " words", String.valueOf(CandidateScript.words(expectedText)), rows.get(0).get(1));
                check(where + " condition", tools ? WITH_TOOLS : "without-tools", rows.get(0).get(2));
                check(where + " end reason", "submitted", rows.get(0).get(3));
                if (!tools) {
                    check(where + " tool-use rows (no tools offered)", "0", query(db, "SELECT count(*) FROM tool_use t JOIN"
                            + " sittings s ON s.sitting_id = t.sitting_id WHERE s.candidate_number = ? AND t.task_id = ?",
                            c.number(), tasks.get(k)).get(0).get(0));
                    continue;
                }
                Map<String, List<Integer>> expected = c.toolUse();
                for (var e : expected.entrySet()) {
                    List<List<String>> use = query(db, "SELECT queries, empty_queries, entries_opened, suggestions_shown,"
                            + " suggestions_accepted, suggestions_ignored, insertions FROM tool_use t JOIN sittings s ON"
                            + " s.sitting_id = t.sitting_id WHERE s.candidate_number = ? AND t.task_id = ? AND t.tool = ?",
                            c.number(), tasks.get(k), e.getKey());
                    check(where + " tool use of " + e.getKey() + " (queries, empty, opened, shown, accepted, ignored,"
                            + " insertions)", e.getValue().toString(),
                            use.isEmpty() ? "(no row)" : use.get(0).stream().map(Integer::valueOf).toList().toString());
                }
                // the process log: insertions from the panel, accepted suggestions, lookups, and the pages in view
                List<List<String>> events = query(db, "SELECT e.type, e.mono, e.data_json FROM process_events e JOIN sittings s"
                        + " ON s.sitting_id = e.sitting_id WHERE s.candidate_number = ? AND e.task_id = ? ORDER BY e.seq",
                        c.number(), tasks.get(k));
                long panelInserts = events.stream().filter(ev -> ev.get(0).equals(EventType.TEXT_INSERT.wireName())
                        && ev.get(2).contains("\"source\":\"panel\"")).count();
                check(where + " text.insert events from the panel", (long) (expected.get("glossary").get(6)
                        + expected.get("dictionary").get(6)), panelInserts);
                check(where + " suggestion.accept events", (long) expected.get("spelling").get(4),
                        events.stream().filter(ev -> ev.get(0).equals(EventType.SUGGESTION_ACCEPT.wireName())).count());
                check(where + " tool.query events", (long) c.lookups(),
                        events.stream().filter(ev -> ev.get(0).equals(EventType.TOOL_QUERY.wireName())).count());
                check(where + " milliseconds in the panel on each tool's page (panel.open to panel.close)",
                        done.get(c.number()).pageInView.toString(), pagesInView(events).toString());
            }
            Map<String, String> answers = new TreeMap<>();
            for (List<String> row : query(db, "SELECT q.item_id, q.value FROM questionnaire_answers q JOIN sittings s ON"
                    + " s.sitting_id = q.sitting_id WHERE s.candidate_number = ?", c.number())) {
                answers.put(row.get(0), row.get(1));
            }
            check(c.number() + " questionnaire answers", new TreeMap<>(Map.of("tools-helped", String.valueOf(c.toolsHelped()),
                    "time-enough", String.valueOf(c.timeEnough()), "comments", c.comment())).toString(), answers.toString());
        }
        check("sittings in the store", String.valueOf(room.size()), query(db, "SELECT count(*) FROM sittings").get(0).get(0));
        List<List<String>> resumed = query(db, "SELECT s.candidate_number FROM process_events e JOIN sittings s ON"
                + " s.sitting_id = e.sitting_id WHERE e.type = ?", EventType.SITTING_RESUME.wireName());
        check("candidates whose log shows a resumed sitting", List.of(List.of(killed.number())).toString(), resumed.toString());
        // the killed client's keystrokes are in the log once each: the typed text is rebuilt from them
        String first = tasksOf.get(killed.number()).get(0);
        StringBuilder replay = new StringBuilder();
        for (List<String> row : query(db, "SELECT e.data_json FROM process_events e JOIN sittings s ON s.sitting_id = e.sitting_id"
                + " WHERE s.candidate_number = ? AND e.task_id = ? AND e.type = ? ORDER BY e.seq",
                killed.number(), first, EventType.TEXT_INSERT.wireName())) {
            replay.append(new com.fasterxml.jackson.databind.ObjectMapper().readTree(row.get(0)).path("text").asText());
        }
        check(killed.number() + "'s first task rebuilt from its logged insertions (before and after the kill)",
                CandidateScript.PLAIN_TEXT, replay.toString());
    }

    /** Milliseconds each tool's page was in view, from panel.open/panel.close pairs on the monotonic clock. */
    private static Map<String, Long> pagesInView(List<List<String>> events) throws Exception {
        Map<String, Long> out = new LinkedHashMap<>();
        String open = null;
        long since = 0;
        for (List<String> e : events) {
            String tool = e.get(2) == null ? "" : new com.fasterxml.jackson.databind.ObjectMapper().readTree(e.get(2))
                    .path("tool").asText();
            long ms = Long.parseLong(e.get(1)) / 1_000_000L;
            if (e.get(0).equals(EventType.PANEL_OPEN.wireName())) {
                open = tool;
                since = ms;
            } else if (e.get(0).equals(EventType.PANEL_CLOSE.wireName()) && tool.equals(open)) {
                out.merge(tool, ms - since, Long::sum);
                open = null;
            }
        }
        return out;
    }

    // ---- the export

    private void checkExport(Path csv, List<CandidateScript> room, Map<String, List<String>> tasksOf,
            Map<String, List<Boolean>> toolsOf, CandidateScript killed, String typedBeforeKill) throws Exception {
        List<Map<String, String>> responses = table(csv.resolve("responses.csv"));
        List<Map<String, String>> toolUse = table(csv.resolve("tool_use.csv"));
        check("rows of responses.csv", room.size() * 2, responses.size());
        List<Map<String, String>> answers = table(csv.resolve("questionnaire_answers.csv"));
        List<String> labels = List.of("Strongly disagree", "Disagree", "Neither", "Agree", "Strongly agree");
        for (CandidateScript c : room) {
            Map<String, String> got = new TreeMap<>();
            for (Map<String, String> a : answers) {
                if (a.get("candidate_number").equals(c.number())) {
                    got.put(a.get("item_id"), a.get("answer") + (a.get("answer_label").isEmpty() ? "" : " " + a.get("answer_label")));
                }
            }
            check("questionnaire_answers.csv " + c.number(), new TreeMap<>(Map.of(
                    "tools-helped", c.toolsHelped() + " " + labels.get(c.toolsHelped() - 1),
                    "time-enough", c.timeEnough() + " " + labels.get(c.timeEnough() - 1),
                    "comments", c.comment())).toString(), got.toString());
        }
        for (CandidateScript c : room) {
            for (int k = 0; k < 2; k++) {
                String task = tasksOf.get(c.number()).get(k);
                boolean tools = toolsOf.get(c.number()).get(k);
                String expectedText = tools ? c.toolsText() : CandidateScript.PLAIN_TEXT;
                String where = "responses.csv " + c.number() + "/" + task;
                Map<String, String> row = responses.stream().filter(x -> x.get("candidate_number").equals(c.number())
                        && x.get("task_id").equals(task)).findFirst().orElse(Map.of());
                check(where + " level", c.level(), row.get("level"));
                check(where + " position", String.valueOf(k + 1), row.get("position"));
                check(where + " word_count", String.valueOf(CandidateScript.words(expectedText)), row.get("word_count"));
                check(where + " text", expectedText, row.get("text"));
                if (tools) {
                    for (var e : c.toolUse().entrySet()) {
                        Map<String, String> u = toolUse.stream().filter(x -> x.get("candidate_number").equals(c.number())
                                && x.get("task_id").equals(task) && x.get("tool").equals(e.getKey())).findFirst().orElse(Map.of());
                        List<String> got = new ArrayList<>();
                        for (String col : List.of("queries", "empty_queries", "entries_opened", "suggestions_shown",
                                "suggestions_accepted", "suggestions_ignored", "insertions")) {
                            got.add(String.valueOf(u.get(col)));
                        }
                        check("tool_use.csv " + c.number() + "/" + task + "/" + e.getKey(),
                                e.getValue().stream().map(String::valueOf).toList().toString(), got.toString());
                    }
                }
            }
        }
    }

    // ---- the raters

    /** True score of a response: content by level (A2 2, B1 3, B2 4), language one more with tools. */
    private static int trueScore(String level, String condition, String criterion) {
        int base = 2 + LEVELS.indexOf(level);
        return criterion.equals("language") && condition.equals(WITH_TOOLS) ? base + 1 : base;
    }

    /** A rater's sheet filled with true score plus the rater's severity; the store says whose response each blind id is. */
    private static String fillSheet(Path store, String rater, String sheet, Map<String, String> levelOf) throws Exception {
        Map<String, String[]> whose = new HashMap<>();
        try (Connection db = DriverManager.getConnection("jdbc:sqlite:" + store)) {
            for (List<String> row : query(db, "SELECT a.blind_id, s.candidate_number, r.condition_id FROM rating_assignments a"
                    + " JOIN sittings s ON s.sitting_id = a.sitting_id JOIN responses r ON r.sitting_id = a.sitting_id"
                    + " AND r.task_id = a.task_id WHERE a.rater_id = ?", rater)) {
                whose.put(row.get(0), new String[] {row.get(1), row.get(2)});
            }
        }
        List<Csv.Row> rows = Csv.parse(sheet);
        List<String> header = rows.get(0).fields();
        StringBuilder out = new StringBuilder();
        java.io.StringWriter w = new java.io.StringWriter();
        Csv.writeRow(w, header);
        for (Csv.Row row : rows.subList(1, rows.size())) {
            List<String> f = new ArrayList<>(row.fields());
            String[] who = whose.get(f.get(header.indexOf("blind_id")));
            for (String criterion : List.of("content", "language")) {
                f.set(header.indexOf(criterion), String.valueOf(trueScore(levelOf.get(who[0]), who[1], criterion)
                        + SEVERITY.get(rater)));
            }
            Csv.writeRow(w, f);
        }
        out.append(w);
        return out.toString();
    }

    /** Checks every exported rating against the script; returns each response's pair of raters ("S1 S2"). */
    private Map<String, String> checkRatings(Path ratingsCsv, Map<String, String> levelOf, int candidates) throws Exception {
        List<Map<String, String>> rows = table(ratingsCsv);
        check("ratings exported (responses x 2 raters x 2 criteria)", candidates * 2 * 2 * 2, rows.size());
        Map<String, java.util.TreeSet<String>> raters = new TreeMap<>();
        for (Map<String, String> row : rows) {
            int expected = trueScore(levelOf.get(row.get("candidate")), row.get("condition"), row.get("criterion"))
                    + SEVERITY.get(row.get("rater"));
            check("rating " + row.get("candidate") + "/" + row.get("task") + "/" + row.get("rater") + "/"
                    + row.get("criterion"), String.valueOf(expected), row.get("score"));
            check("level of " + row.get("candidate") + " in ratings.csv", levelOf.get(row.get("candidate")), row.get("level"));
            raters.computeIfAbsent(row.get("candidate") + "/" + row.get("task"), k -> new java.util.TreeSet<>()).add(row.get("rater"));
        }
        Map<String, String> pairs = new TreeMap<>();
        raters.forEach((k, v) -> pairs.put(k, String.join(" ", v)));
        return pairs;
    }

    // ---- the report

    private void checkReport(Path report, List<CandidateScript> room, Map<String, ScriptedSitting.Done> done,
            Map<String, String> pairOf, CandidateScript killed) throws Exception {
        Path tables = report.resolve("tables");
        com.fasterxml.jackson.databind.JsonNode summary = new com.fasterxml.jackson.databind.ObjectMapper()
                .readTree(report.resolve("summary.json").toFile());
        // resource use by level: offered, users, uses per candidate, suggestions accepted and ignored
        List<Map<String, String>> usage = table(tables.resolve("usage_by_level.csv"));
        for (String level : LEVELS) {
            List<CandidateScript> at = room.stream().filter(c -> c.level().equals(level)).toList();
            for (String tool : List.of("spelling", "glossary", "dictionary")) {
                Map<String, String> row = usage.stream().filter(x -> x.get("tool").equals(tool) && x.get("level").equals(level))
                        .findFirst().orElse(Map.of());
                double uses = at.stream().mapToInt(c -> CandidateScript.uses(c.toolUse().get(tool))).sum();
                long accepted = at.stream().mapToInt(c -> c.toolUse().get(tool).get(4)).sum();
                long ignored = at.stream().mapToInt(c -> c.toolUse().get(tool).get(5)).sum();
                long empty = at.stream().mapToInt(c -> c.toolUse().get(tool).get(1)).sum();
                long using = at.stream().filter(c -> CandidateScript.uses(c.toolUse().get(tool)) > 0).count();
                String where = "usage_by_level " + tool + "/" + level + " ";
                checkNumber(where + "candidates offered", at.size(), row.get("candidates_offered"));
                checkNumber(where + "candidates using", using, row.get("candidates_using"));
                checkNumber(where + "uses per candidate", uses / at.size(), row.get("uses_per_candidate"));
                checkNumber(where + "queries finding nothing", empty, row.get("queries_finding_nothing"));
                checkNumber(where + "suggestions accepted", accepted, row.get("suggestions_accepted"));
                checkNumber(where + "suggestions ignored", ignored, row.get("suggestions_ignored"));
                String key = "usage.tool." + tool + ".level." + level.toLowerCase(java.util.Locale.ROOT) + ".";
                checkNumber("summary.json " + key + "uses_per_candidate", uses / at.size(), text(summary, key + "uses_per_candidate"));
                checkNumber("summary.json " + key + "suggestions_accepted", accepted, text(summary, key + "suggestions_accepted"));
            }
        }
        // writing process, with-tools responses by level: lookups, lookups followed by use, time in the panel
        List<Map<String, String>> process = table(tables.resolve("process_measures.csv"));
        for (String level : LEVELS) {
            List<CandidateScript> at = room.stream().filter(c -> c.level().equals(level)).toList();
            Map<String, String> row = process.stream().filter(x -> x.get("condition").equals(WITH_TOOLS)
                    && x.get("level").equals(level)).findFirst().orElse(Map.of());
            String where = "process_measures with-tools/" + level + " ";
            checkNumber(where + "responses", at.size(), row.get("responses"));
            checkNumber(where + "lookups mean", at.stream().mapToInt(CandidateScript::lookups).average().orElseThrow(),
                    row.get("lookups_mean"));
            checkNumber(where + "lookups followed by use mean", at.stream().mapToInt(CandidateScript::lookupsUsed).average()
                    .orElseThrow(), row.get("lookups_used_mean"));
            // panel.open to panel.close: the scripted spans with keyboard focus in the panel (shortcut to insertion or Esc)
            double panel = at.stream().mapToLong(c -> done.get(c.number()).pageInView.values().stream()
                    .mapToLong(Long::longValue).sum()).average().orElseThrow() / 1000.0;
            checkNumber(where + "time in resource panel (s) mean", panel, row.get("panel_time_s_mean"));
            String key = "process.with_tools." + level.toLowerCase(java.util.Locale.ROOT) + ".panel_time_s.mean";
            checkNumber("summary.json " + key, panel, text(summary, key));
            // task.start to task.end: the task's whole time on the scripted clock
            double onTask = at.stream().mapToLong(c -> done.get(c.number()).toolsTaskMillis).average().orElseThrow() / 1000.0;
            checkNumber(where + "time on task (s) mean", onTask, row.get("time_on_task_s_mean"));
            check(where + "time in the panel is shorter than time on task", "true", String.valueOf(panel < onTask));
            // without tools: the plain text typed at the candidate's speed, start to finish (the killed
            // candidate's task spans two processes' clocks, so its level is left out)
            if (at.stream().noneMatch(c -> c == killed)) {
                Map<String, String> plain = process.stream().filter(x -> x.get("condition").equals("without-tools")
                        && x.get("level").equals(level)).findFirst().orElse(Map.of());
                double typing = at.stream().mapToLong(c -> c.msPerChar() * CandidateScript.PLAIN_TEXT.length()).average()
                        .orElseThrow() / 1000.0;
                checkNumber("process_measures without-tools/" + level + " time on task (s) mean", typing,
                        plain.get("time_on_task_s_mean"));
                checkNumber("process_measures without-tools/" + level + " time in resource panel (s) mean", 0,
                        plain.get("panel_time_s_mean"));
            }
        }
        // questionnaire: Likert descriptives by level, every free-text answer listed
        List<Map<String, String>> likert = table(tables.resolve("questionnaire_likert_descriptives.csv"));
        for (String level : LEVELS) {
            List<CandidateScript> at = room.stream().filter(c -> c.level().equals(level)).toList();
            for (String item : List.of("tools-helped", "time-enough")) {
                Map<String, String> row = likert.stream().filter(x -> x.get("item").equals(item)
                        && x.get("conditions").equals("all") && x.get("level").equals(level)).findFirst().orElse(Map.of());
                double mean = at.stream().mapToInt(c -> item.equals("tools-helped") ? c.toolsHelped() : c.timeEnough())
                        .average().orElseThrow();
                checkNumber("questionnaire_likert_descriptives " + item + "/" + level + " n", at.size(), row.get("n"));
                checkNumber("questionnaire_likert_descriptives " + item + "/" + level + " mean", mean, row.get("mean"));
            }
        }
        List<Map<String, String>> freeText = table(tables.resolve("questionnaire_free_text.csv"));
        for (CandidateScript c : room) {
            check("questionnaire_free_text " + c.number(), List.of(c.comment()).toString(), freeText.stream()
                    .filter(x -> x.get("candidate").equals(c.number())).map(x -> x.get("answer")).toList().toString());
        }
        // rater agreement inputs: each rater's ratings and mean, and the pairs' agreement per criterion
        List<Map<String, String>> individual = table(tables.resolve("raters_individual.csv"));
        List<Map<String, String>> ratings = table(report.getParent().resolve("rating-export/ratings.csv"));
        for (String rater : SEVERITY.keySet()) {
            Map<String, String> row = individual.stream().filter(x -> x.get("rater").equals(rater)).findFirst().orElse(Map.of());
            List<Integer> scores = ratings.stream().filter(x -> x.get("rater").equals(rater))
                    .map(x -> Integer.valueOf(x.get("score"))).toList();
            checkNumber("raters_individual " + rater + " ratings", scores.size(), row.get("ratings"));
            checkNumber("raters_individual " + rater + " mean score", scores.stream().mapToInt(i -> i).average().orElse(Double.NaN),
                    row.get("mean_score"));
        }
        long farApart = pairOf.values().stream().filter(p -> p.equals("S1 S3")).count();
        List<Map<String, String>> agreement = table(tables.resolve("raters_agreement.csv"));
        for (String criterion : List.of("content", "language")) {
            Map<String, String> row = agreement.stream().filter(x -> x.get("criterion").equals(criterion)).findFirst()
                    .orElse(Map.of());
            checkNumber("raters_agreement " + criterion + " pairs", pairOf.size(), row.get("pairs"));
            // severities -1, 0, +1: two different raters never agree exactly; S1 with S3 are 2 points apart
            checkNumber("raters_agreement " + criterion + " exact", 0.0, row.get("exact"));
            checkNumber("raters_agreement " + criterion + " adjacent", (double) (pairOf.size() - farApart) / pairOf.size(),
                    row.get("adjacent"));
        }
    }

    // ---- helpers

    /** Wall time of each phase, for docs/benchmarks.md (never asserted: the machine is shared). */
    private void phase(String name) {
        long now = System.nanoTime();
        timings.add(String.format(java.util.Locale.ROOT, "%6.1f s  %s", (now - phaseStart) / 1e9, name));
        phaseStart = now;
    }

    private Admin.Run ok(Admin.Run run) {
        assertEquals(0, run.code(), run.out());
        return run;
    }

    private void check(String what, Object expected, Object actual) {
        if (!java.util.Objects.equals(expected, actual)) {
            failures.add(what + ": expected <" + expected + "> but was <" + actual + ">");
        }
    }

    private void checkNumber(String what, double expected, String actual) {
        double got;
        try {
            got = actual == null ? Double.NaN : Double.parseDouble(actual);
        } catch (NumberFormatException e) {
            got = Double.NaN;
        }
        if (!(Math.abs(got - expected) <= 1e-3 * Math.max(1, Math.abs(expected)))) {
            failures.add(what + ": expected <" + expected + "> but was <" + actual + ">");
        }
    }

    private static String text(com.fasterxml.jackson.databind.JsonNode summary, String key) {
        com.fasterxml.jackson.databind.JsonNode n = summary.findValue(key);
        return n == null || n.isNull() ? null : n.asText();
    }

    private static String fingerprint(String keysShow) {
        Matcher m = Pattern.compile("signing key \\(Ed25519\\)\\s+fingerprint (\\S+)").matcher(keysShow);
        assertTrue(m.find(), keysShow);
        return m.group(1);
    }

    private static Path copyExamSource(Path dir) throws Exception {
        Path from = Path.of("src/test/resources/rehearsal/exam-source");
        Path to = dir.resolve("exam-source");
        try (var files = Files.walk(from)) {
            for (Path p : files.toList()) {
                Path target = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(target);
                } else {
                    Files.copy(p, target);
                }
            }
        }
        Path packs = Path.of("../../resource-packs/target/packs");
        Files.createDirectories(to.resolve("packs"));
        for (String pack : List.of("demo-ferry-en-es.inkpack", "wordnet-3.1-en.inkpack")) {
            assertTrue(Files.exists(packs.resolve(pack)), "the build writes " + packs.resolve(pack)
                    + " (mvn -pl resource-packs package -DskipTests); the rehearsal bundles it");
            Files.copy(packs.resolve(pack), to.resolve("packs").resolve(pack));
        }
        return to;
    }

    private static void readPlan(Path bundle, String owner, Map<String, List<String>> tasksOf,
            Map<String, List<Boolean>> toolsOf) throws Exception {
        SittingLoad load = new SittingBundleOpener(Set.of(owner)).open(bundle);
        if (!(load instanceof SittingLoad.Opened opened)) {
            throw new AssertionError("the client refused the rehearsal bundle: " + load);
        }
        try (var b = opened.bundle()) {
            BundleManifest m = b.manifest();
            Map<String, FormSpec> forms = new HashMap<>();
            m.forms().forEach(f -> forms.put(f.id(), f));
            for (RosterEntry e : m.roster()) {
                FormSpec f = forms.get(e.formId());
                tasksOf.put(e.candidateNumber(), f.slots().stream().map(s -> s.taskId()).toList());
                toolsOf.put(e.candidateNumber(), f.slots().stream().map(s -> s.conditionId().equals(WITH_TOOLS)).toList());
            }
        }
    }

    private static List<List<String>> query(Connection db, String sql, String... args) throws Exception {
        try (PreparedStatement ps = db.prepareStatement(sql)) {
            for (int i = 0; i < args.length; i++) {
                ps.setString(i + 1, args[i]);
            }
            List<List<String>> out = new ArrayList<>();
            try (ResultSet rs = ps.executeQuery()) {
                int n = rs.getMetaData().getColumnCount();
                while (rs.next()) {
                    List<String> row = new ArrayList<>();
                    for (int c = 1; c <= n; c++) {
                        row.add(rs.getString(c));
                    }
                    out.add(row);
                }
            }
            return out;
        }
    }

    private static List<Map<String, String>> table(Path csv) throws Exception {
        List<Csv.Row> rows = Csv.parse(Files.readString(csv));
        List<String> header = rows.get(0).fields();
        List<Map<String, String>> out = new ArrayList<>();
        for (Csv.Row row : rows.subList(1, rows.size())) {
            Map<String, String> m = new LinkedHashMap<>();
            for (int i = 0; i < header.size() && i < row.fields().size(); i++) {
                m.put(header.get(i), row.fields().get(i));
            }
            out.add(m);
        }
        return out;
    }

    private static void deleteTree(Path dir) throws java.io.IOException {
        if (!Files.exists(dir)) {
            return;
        }
        try (var paths = Files.walk(dir)) {
            for (Path p : paths.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
