package org.inkgate.admin.core.collection;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.ResponsePackageWriter;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.api.io.TempDir;

/**
 * What collect stores for each event (its time and its data as JSON) and the content digest's text
 * for it must stay byte for byte what they were before collect was made faster: every store written
 * so far holds these values, and the content digest tells a re-sent copy from a conflicting package
 * by them. The fixture {@code collect/stored-events.txt} was written by this test's own code run
 * against main at 62d187f (the code of 2026-12-03 before the faster rendering), with
 * {@code -Dinkgate.writeStoredEventsFixture=true}; the values are the project's own earlier output,
 * not an outside reference. The log is made of event data that a renderer could get wrong: quotes,
 * backslashes, control characters, characters outside ASCII and the Basic Multilingual Plane, line
 * and paragraph separators, whole numbers of every size, decimals, booleans, nulls, lists, nested
 * objects in the writer's order, and times with 0, 3, 6 and 9 decimals.
 */
class StoredEventsUnchangedTest {

    private static final String FIXTURE = "/collect/stored-events.txt";

    @TempDir
    Path dir;

    /**
     * On both kinds of store, read both ways: by the store's own reading of its event logs and by SQL
     * on the view {@code process_events} (schema 10); the fixture is the SQLite store's of 62d187f,
     * when each event was a row of a table.
     */
    @ParameterizedTest
    @MethodSource("org.inkgate.admin.core.testutil.StoreFixture#kinds")
    void storedEventColumnsAndDigestText_areTheSameAsBefore(StoreFixture.Kind kind) throws Exception {
        Sitting sitting = Sitting.make(dir, 2);
        String candidate = sitting.roster().getFirst().candidateNumber();
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        ResponseDocument d = client.document(candidate, sitting.formOf(candidate), 11,
                java.util.UUID.nameUUIDFromBytes(candidate.getBytes(StandardCharsets.UTF_8)).toString());
        List<ProcessEvent> events = awkwardLog(d.tasks().getFirst().taskId());
        Path packages = Files.createDirectories(dir.resolve("packages"));
        Path file = packages.resolve(candidate + Collector.EXTENSION);
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic()).write(d, events, file);

        StringBuilder actual = new StringBuilder();
        List<org.inkgate.admin.core.store.Rows.Event> stored = new ArrayList<>();
        StoreFixture fixture = StoreFixture.create(kind, dir);
        try (ResultsStore store = fixture.results()) {
            store.registerBundle(sitting.manifest(), sitting.manifestSha256(), TestKeys.ownerFingerprint());
            List<Outcome> outcomes = new Collector(store, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(),
                    Map.of(sitting.manifestSha256(), sitting.manifest()), 2).collect(List.of(file), o -> { });
            assertEquals(Outcome.Imported.class, outcomes.getFirst().getClass(), outcomes.toString());
            store.forEachEvent(d.examId(), e -> {
                actual.append("stored ").append(e.seq()).append(' ').append(e.at()).append(' ').append(e.dataJson())
                        .append('\n');
                stored.add(e);
            });
        }
        // SQL against the view process_events sees the same rows as the store's own reading of the logs
        List<List<Object>> viewed = new ArrayList<>();
        try (java.sql.Connection c = fixture.connect(); java.sql.Statement s = c.createStatement();
                java.sql.ResultSet rs = s.executeQuery("SELECT " + org.inkgate.admin.core.store.EventLog.COLUMNS + " FROM process_events"
                        + " ORDER BY seq")) {
            while (rs.next()) {
                viewed.add(Arrays.asList(rs.getLong(1), rs.getString(2), rs.getLong(3), rs.getString(4), rs.getString(5),
                        rs.getString(6)));
            }
        }
        assertEquals(stored.stream().map(e -> Arrays.<Object>asList(e.seq(), e.at(), e.mono(), e.type(), e.taskId(),
                e.dataJson())).toList(), viewed);
        OpenedResponse opened = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TestKeys.installations())
                .open(file.getFileName().toString(), Files.readAllBytes(file));
        // the columns the fixture does not show: as the package has them
        assertEquals(opened.events().size(), stored.size());
        for (int i = 0; i < stored.size(); i++) {
            ProcessEvent e = opened.events().get(i);
            org.inkgate.admin.core.store.Rows.Event row = stored.get(i);
            assertEquals(List.of(e.seq(), e.mono(), e.type(), String.valueOf(e.task())),
                    List.of(row.seq(), row.mono(), row.type(), String.valueOf(row.taskId())), "event " + e.seq());
        }
        for (ProcessEvent e : opened.events()) {
            // the content digest's text for an event, as ContentDigestTest defines it
            actual.append("digest ").append(e.seq() + "|" + e.at() + "|" + e.mono() + "|" + e.type() + "|" + e.task()
                    + "|" + e.data()).append('\n');
        }
        actual.append("content ").append(Collector.contentSha256(opened).equals(ContentDigestTest.definition(opened)))
                .append('\n');

        if (Boolean.getBoolean("inkgate.writeStoredEventsFixture")) {
            Path out = Path.of("src/test/resources" + FIXTURE);
            Files.writeString(out, ascii(actual), StandardCharsets.US_ASCII);
        }
        String expected;
        try (var in = StoredEventsUnchangedTest.class.getResourceAsStream(FIXTURE)) {
            expected = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        assertEquals(expected, ascii(actual));
    }

    /**
     * The text with every character outside printable ASCII (and the backslash) as a backslash-u
     * escape of its UTF-16 unit, so the fixture shows control characters and lone surrogates
     * unambiguously and is plain ASCII.
     */
    private static String ascii(CharSequence text) {
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            if (ch == '\\' || (ch < 0x20 && ch != '\n') || ch >= 0x7f) {
                out.append(String.format("\\u%04x", (int) ch));
            } else {
                out.append(ch);
            }
        }
        return out.toString();
    }

    /** Every value kind a package's event data can carry, in the declared keys of text.insert and others. */
    static List<ProcessEvent> awkwardLog(String task) {
        List<Object> texts = List.of("plain", "say \"hi\"", "back\\slash", "tab\there", "line\nbreak", "cr\rlf",
                "bell\u0007 and nul\u0000 and unit\u001f", "del\u007f", "é à ß ø", "\u4e2d\u6587", "\ud83d\ude00 emoji",
                "sep\u2028line\u2029para", "slash / and <tag> & 'quote'", "", " ", "comma, colon: equals= {braces}",
                "\ufeffbom", "lone \ud800 surrogate");
        List<Object> numbers = List.of(0, -1, 7, Integer.MAX_VALUE, Integer.MIN_VALUE, 2_147_483_648L,
                Long.MAX_VALUE, Long.MIN_VALUE, new BigInteger("123456789012345678901234567890"), 1.5, -0.0, 0.1,
                1e21, 1e-7, 123456.789, Double.MAX_VALUE, 3.0, 2.5f, new BigDecimal("1.10"));
        List<Object> others = new ArrayList<>(Arrays.asList(true, false, Arrays.asList(null, "after null"), List.of(), List.of(1, "two", false),
                Map.of(), nested(), List.of(List.of(1, 2), nested())));
        List<ProcessEvent> out = new ArrayList<>();
        Instant base = Instant.parse("2026-06-15T09:00:00Z");
        long[] nanos = {0, 100_000_000, 120_000_000, 123_000_000, 123_400_000, 123_456_000, 123_456_700, 123_456_789, 1};
        int i = 0;
        for (List<Object> kind : List.of(texts, numbers, others)) {
            for (Object v : kind) {
                Map<String, Object> data = new LinkedHashMap<>();
                // keys given out of order: the writer sorts them (ProcessEvent keeps a sorted map)
                data.put("text", kind == texts ? v : "x");
                data.put("source", kind == others ? v : "typed");
                data.put("pos", kind == numbers ? v : i);
                data.put("len", 1);
                long seq = out.size() + 1;
                Instant at = base.plusSeconds(seq * 37).plusNanos(nanos[i % nanos.length]);
                out.add(new ProcessEvent(seq, at, seq * 1_000_003L, "text.insert", task, data));
                i++;
            }
        }
        out.add(new ProcessEvent(out.size() + 1, Instant.parse("1969-12-31T23:59:59.999999999Z"), -5, "focus.lost",
                null, Map.of()));
        out.add(new ProcessEvent(out.size() + 1, Instant.parse("2099-01-01T00:00:00.000000001Z"), Long.MAX_VALUE,
                "time.added", task, Map.of("seconds", 600, "reason", "fire alarm \"drill\"")));
        return out;
    }

    private static Map<String, Object> nested() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("z", 1);
        m.put("a", List.of("q\"", Map.of("k", 2.25)));
        m.put("m", null);
        return m;
    }
}
