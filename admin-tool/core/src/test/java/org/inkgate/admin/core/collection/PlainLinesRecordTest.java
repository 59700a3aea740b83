package org.inkgate.admin.core.collection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.SittingRecord;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.format.response.EventLines;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.ResponsePackageWriter;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Collect copies the bytes of plain lines ({@link EventLines}) into the stored log and the content digest instead of
 * writing each event's values out; the result must be the one the values give. The reference is the same package
 * recorded with no line taken as plain, which writes every event out from its values as collect did before
 * (that way is itself held to the stored values of earlier versions by {@code StoredEventsUnchangedTest} and to the
 * digest's definition by {@code ContentDigestTest}). The log has 6,000 random events whose texts, numbers, times
 * and tasks cover what makes a line plain or not: quotes, backslashes, control characters, characters outside
 * ASCII and the Basic Multilingual Plane, separators and punctuation the digest's text uses, whole numbers of every
 * size, booleans, decimals and lists (never plain), times before 1970 and with every number of decimals.
 */
class PlainLinesRecordTest {

    private static final List<String> TEXTS = List.of("", "a", "typing", "plain words", "say \"hi\"", "back\\slash",
            "tab\tnew\nline\r", "\u0000\u001f\u007f", "é ü ß – “curly”", "€ 中文 العربية", "\uD83D\uDE00 emoji",
            "comma, colon: equals= {braces} [list]", "|pipe|", "\u2028\u2029", "/slash/ <tag> &amp;", "null", "true");

    @TempDir
    Path dir;

    @Test
    void plainLinesCopied_giveTheStoredLogAndDigestTheValuesGive() throws Exception {
        Sitting sitting = Sitting.make(dir, 2);
        String candidate = sitting.roster().getFirst().candidateNumber();
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        ResponseDocument d = client.document(candidate, sitting.formOf(candidate), 3,
                java.util.UUID.nameUUIDFromBytes(candidate.getBytes(java.nio.charset.StandardCharsets.UTF_8)).toString());
        SplittableRandom random = new SplittableRandom(1604);
        List<ProcessEvent> events = new ArrayList<>();
        for (int seq = 1; seq <= 6_000; seq++) {
            events.add(event(random, seq));
        }
        Path file = dir.resolve(candidate + Collector.EXTENSION);
        new ResponsePackageWriter(TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic()).write(d, events, file);
        OpenedResponse opened = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TestKeys.installations())
                .open(file.getFileName().toString(), Files.readAllBytes(file));
        EventLines lines = opened.eventLines();
        int plain = 0;
        for (int i = 0; i < lines.events(); i++) {
            plain += lines.plain(i) ? 1 : 0;
        }
        assertTrue(plain > 1_500 && plain < 5_500, plain + " of 6,000 events plain: both ways must be exercised");

        OpenedResponse valuesOnly = new OpenedResponse(opened.fileName(), opened.envelope(), opened.response(),
                opened.events(), EventLines.nonePlain(lines.bytes(), lines.events()), opened.installationFingerprint(),
                opened.packageSha256());
        SittingRecord copied = Collector.record(opened, "f");
        SittingRecord written = Collector.record(valuesOnly, "f");
        assertEquals(written.eventLog(), copied.eventLog());
        assertEquals(written.contentSha256(), copied.contentSha256());
        assertEquals(ContentDigestTest.definition(opened), copied.contentSha256());
    }

    private static ProcessEvent event(SplittableRandom random, long seq) {
        Map<String, Object> data = new LinkedHashMap<>();
        int fields = random.nextInt(5);
        for (int f = 0; f < fields; f++) {
            String key = random.nextInt(3) == 0 ? pick(random) + f : "k" + f;
            data.put(key, switch (random.nextInt(12)) {
                case 0, 1, 2 -> random.nextInt(4) == 0 ? pick(random) : "word" + random.nextInt(100);
                case 3 -> random.nextInt();
                case 4 -> random.nextLong();
                case 5 -> random.nextBoolean();
                case 6 -> -random.nextInt(1000);
                case 7 -> (long) random.nextInt(1000);
                case 8 -> random.nextInt(40) == 0 ? 1.5 : 0;
                case 9 -> random.nextInt(40) == 0 ? List.of(1, "two") : 1;
                default -> random.nextInt(200);
            });
        }
        String task = random.nextInt(4) == 0 ? null : random.nextInt(5) == 0 ? pick(random) : "task-" + random.nextInt(3);
        long seconds = random.nextInt(20) == 0 ? -random.nextInt(1_000_000_000) : 1_700_000_000L + random.nextInt(100_000_000);
        int nano = switch (random.nextInt(4)) {
            case 0 -> 0;
            case 1 -> random.nextInt(1000) * 1_000_000;
            case 2 -> random.nextInt(1_000_000) * 1_000;
            default -> random.nextInt(1_000_000_000);
        };
        String type = random.nextInt(6) == 0 ? pick(random) : random.nextBoolean() ? "text.insert" : "tool.query";
        long mono = random.nextInt(10) == 0 ? -random.nextLong(Long.MAX_VALUE) : random.nextLong(Long.MAX_VALUE);
        return new ProcessEvent(seq, Instant.ofEpochSecond(seconds, nano), mono, type, task, data);
    }

    private static String pick(SplittableRandom random) {
        return TEXTS.get(random.nextInt(TEXTS.size()));
    }
}
