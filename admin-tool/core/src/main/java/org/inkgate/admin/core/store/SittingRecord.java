package org.inkgate.admin.core.store;

import java.util.List;
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

    /** The record of a package whose content digest is already known (the collector makes both at once). */
    public static SittingRecord of(OpenedResponse opened, String contentSha256, String sourceFile) {
        List<ProcessEvent> events = opened.events();
        String[] at = new String[events.size()];
        String[] data = new String[events.size()];
        StringBuilder json = new StringBuilder(128);
        StringBuilder ignored = new StringBuilder(128);
        for (int i = 0; i < at.length; i++) {
            ProcessEvent e = events.get(i);
            at[i] = e.at().toString();
            ignored.setLength(0);
            data[i] = EventText.json(e.data(), json, ignored);
        }
        return new SittingRecord(opened, contentSha256, sourceFile, at, data);
    }
}
