package org.inkgate.admin.study;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Set;
import java.util.stream.Collectors;
import org.inkgate.analysis.data.ProcessEvent;
import org.inkgate.format.response.EventType;
import org.junit.jupiter.api.Test;

/**
 * The analysis module stays free of the file formats, so it spells the process-log event names
 * it measures itself; here, where both modules are seen, every one of them must be a name of the
 * format's own vocabulary ({@link EventType}), so a renamed event cannot silently drop out of the
 * process measures.
 */
class ProcessEventVocabularyTest {

    @Test
    void everyEventTheAnalysisMeasures_isAnEventTheClientWrites() {
        Set<String> written = Arrays.stream(EventType.values()).map(EventType::wireName).collect(Collectors.toSet());
        for (ProcessEvent.Type t : ProcessEvent.Type.values()) {
            assertTrue(written.contains(t.logName()), t + " reads '" + t.logName() + "', which the format's"
                    + " vocabulary does not have: " + written);
        }
    }
}
