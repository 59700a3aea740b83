package org.inkgate.format.response;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.testutil.SampleResponse;
import org.junit.jupiter.api.Test;

/**
 * The contract check remembers the data keys that kept it for each type and then checks only the task of an event
 * with the same keys. Over a log read from its bytes (the data the reader makes, where the memory applies) it must
 * find exactly what it finds over the same events with their data as plain sorted maps, checked in full: 20,000
 * random events of every type and unknown ones, with the required keys all or some, optional and undeclared keys,
 * and tasks present, absent or foreign, so that a remembered shape meets events that break the contract.
 */
class EventContractShapesTest {

    private static final ResponseDocument DOC = SampleResponse.document(); // tasks t1 and t2

    @Test
    void rememberedShapes_findWhatTheFullCheckFinds() throws FormatRefusal {
        SplittableRandom random = new SplittableRandom(1206);
        EventType[] types = EventType.values();
        List<ProcessEvent> written = new ArrayList<>();
        Instant at = Instant.parse("2026-03-14T09:00:00Z");
        for (int seq = 1; seq <= 20_000; seq++) {
            EventType type = types[random.nextInt(types.length)];
            Map<String, Object> data = new TreeMap<>();
            for (String key : type.requiredKeys()) {
                if (random.nextInt(50) > 0) {
                    data.put(key, 1);
                }
            }
            for (String key : type.optionalKeys()) {
                if (random.nextBoolean()) {
                    data.put(key, "x");
                }
            }
            if (random.nextInt(60) == 0) {
                data.put(random.nextBoolean() ? "undeclared" : "words", true);
            }
            String task = switch (random.nextInt(8)) {
                case 0 -> null;
                case 1 -> random.nextInt(10) == 0 ? "t9" : null;
                default -> random.nextBoolean() ? "t1" : "t2";
            };
            String wire = random.nextInt(200) == 0 ? "made.up" : type.wireName();
            written.add(new ProcessEvent(seq, at.plusMillis(seq), seq, wire, task, data));
        }
        List<ProcessEvent> read = EventChain.decode("f", "events.jsonl", EventChain.encode(written));
        assertTrue(read.stream().allMatch(e -> e.data() instanceof EventData), "the reader's data, where shapes are remembered");
        List<ProcessEvent> plain = read.stream().map(e -> new ProcessEvent(e.seq(), e.at(), e.mono(), e.type(), e.task(),
                new TreeMap<>(e.data()))).toList();
        assertTrue(plain.stream().noneMatch(e -> e.data() instanceof EventData));

        List<EventContract.Violation> remembered = EventContract.check(DOC, read);
        assertEquals(EventContract.check(DOC, plain), remembered);
        assertTrue(remembered.size() > 500, remembered.size() + " violations: the log must break the contract often");
    }
}
