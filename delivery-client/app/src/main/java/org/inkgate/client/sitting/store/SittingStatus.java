package org.inkgate.client.sitting.store;

import java.util.Arrays;
import java.util.Optional;

/**
 * How far a sitting has got, as its database's {@code sitting.status} column records it. A closed
 * set: the client writes these names and no others, and recovery reads them back.
 */
public enum SittingStatus {
    /** The candidate is (or was, before a crash) still working. */
    IN_PROGRESS("in-progress"),
    /** The response package is written to the client data folder but not yet delivered. */
    AWAITING_DELIVERY("awaiting-delivery"),
    /** The response package reached an output folder: nothing left to recover. */
    DELIVERED("delivered");

    private final String wireName;

    SittingStatus(String wireName) {
        this.wireName = wireName;
    }

    /** The name in the database. */
    public String wireName() {
        return wireName;
    }

    /** The status a stored name stands for; empty for a name no client writes (the database is then not this client's to read). */
    public static Optional<SittingStatus> fromWire(String name) {
        return Arrays.stream(values()).filter(s -> s.wireName.equals(name)).findFirst();
    }
}
