package org.inkgate.admin.core.store;

import java.util.List;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ProcessEvent;

/**
 * One opened package ready to store, with its events already written out as the store keeps them, so that
 * the rendering runs on the collector's reading threads and the single writer only binds values.
 *
 * @param opened         the checked package
 * @param contentSha256  what the package says, independent of its bytes
 * @param sourceFile     the file it came from
 * @param eventLog       the events as the store keeps them ({@link EventLog})
 */
public record SittingRecord(OpenedResponse opened, String contentSha256, String sourceFile, String eventLog) {

    /** The record of a package whose content digest is already known (the collector makes both at once). */
    public static SittingRecord of(OpenedResponse opened, String contentSha256, String sourceFile) {
        List<ProcessEvent> events = opened.events();
        EventLog log = new EventLog(events.size());
        StringBuilder ignored = new StringBuilder(128);
        for (ProcessEvent e : events) {
            ignored.setLength(0);
            log.add(e.seq(), org.inkgate.format.json.InstantText.text(e.at()), e.mono(), e.type(), e.task(), e.data(), ignored);
        }
        return new SittingRecord(opened, contentSha256, sourceFile, log.text());
    }
}
