package org.inkgate.admin.core.store;

import java.nio.charset.StandardCharsets;
import java.util.List;
import org.inkgate.format.json.Json;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ProcessEvent;

/**
 * One opened package ready to store, with its events' text columns already rendered, so that
 * the rendering runs on the collector's reading threads and the single writer only binds values.
 *
 * @param opened         the checked package
 * @param contentSha256  what the package says, independent of its bytes
 * @param sourceFile     the file it came from
 * @param eventAt        each event's time as ISO 8601
 * @param eventData      each event's data as compact JSON
 */
public record SittingRecord(OpenedResponse opened, String contentSha256, String sourceFile, String[] eventAt,
        String[] eventData) {

    public static SittingRecord of(OpenedResponse opened, String contentSha256, String sourceFile) {
        List<ProcessEvent> events = opened.events();
        String[] at = new String[events.size()];
        String[] data = new String[events.size()];
        for (int i = 0; i < at.length; i++) {
            ProcessEvent e = events.get(i);
            at[i] = e.at().toString();
            data[i] = new String(Json.writeLine(e.data()), StandardCharsets.UTF_8);
        }
        return new SittingRecord(opened, contentSha256, sourceFile, at, data);
    }
}
