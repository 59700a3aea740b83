package org.inkgate.format.response;

import java.util.List;

/**
 * A response package that passed every check.
 *
 * @param fileName                 the package's file name
 * @param envelope                 its readable outside
 * @param response                 the response document
 * @param events                   the process log, chain verified
 * @param eventLines               the log's bytes and where the fields of its events lie in them
 * @param installationFingerprint  fingerprint of the client key that signed it
 * @param packageSha256            SHA-256 of the whole package file, to tell copies from different packages
 */
public record OpenedResponse(String fileName, Envelope envelope, ResponseDocument response, List<ProcessEvent> events,
        EventLines eventLines, String installationFingerprint, String packageSha256) {

    public OpenedResponse {
        events = List.copyOf(events);
        if (eventLines.events() != events.size()) {
            throw new IllegalArgumentException(eventLines.events() + " event lines for " + events.size() + " events");
        }
    }
}
