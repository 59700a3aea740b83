package org.inkgate.admin.cli;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The commands that only read a results store refuse a path where none exists: opening it would
 * create an empty store, and an empty report would then read as "nothing missing" or "nothing
 * to export". Only {@code collect} creates a store.
 */
final class ExistingStore {

    private ExistingStore() {
    }

    /** The store file, checked to exist; otherwise an error saying what to run first. */
    static Path require(Path store) {
        if (!Files.isRegularFile(store)) {
            throw new IllegalArgumentException("no results store at " + store.toAbsolutePath() + " ("
                    + (Files.exists(store) ? "that is a folder, not a file" : "no such file")
                    + "). Name the store that collect wrote (--store), or run  inkgate-admin collect  first.");
        }
        return store;
    }
}
