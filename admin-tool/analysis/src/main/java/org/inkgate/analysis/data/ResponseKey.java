package org.inkgate.analysis.data;

/** A response: one candidate's answer to one task (a cheap map key; no string concatenation). */
public record ResponseKey(String candidate, String task) {

    public static ResponseKey of(Rating r) {
        return new ResponseKey(r.candidate(), r.task());
    }
}
