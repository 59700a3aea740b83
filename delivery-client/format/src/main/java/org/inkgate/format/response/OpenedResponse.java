package org.inkgate.format.response;

import java.util.List;

/**
 * A response package that passed every check.
 *
 * @param fileName                 the package's file name
 * @param envelope                 its readable outside
 * @param response                 the response document
 * @param events                   the process log, chain verified
 * @param installationFingerprint  fingerprint of the client key that signed it
 * @param packageSha256            SHA-256 of the whole package file, to tell copies from different packages
 */
public record OpenedResponse(String fileName, Envelope envelope, ResponseDocument response, List<ProcessEvent> events,
        String installationFingerprint, String packageSha256) {

    public OpenedResponse {
        events = List.copyOf(events);
    }
}
