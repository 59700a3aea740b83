package org.inkgate.admin.cli;

import java.nio.file.Path;
import org.inkgate.admin.core.store.StoreLocation;

/**
 * {@code --store-password-file}: where the password of a PostgreSQL store is, never the password
 * itself (the command line is visible to the machine's other users and kept in shell histories).
 */
final class StorePasswordFile {

    /** The option's description, one wording for every command that takes it. */
    static final String DESCRIPTION = "for a PostgreSQL store: " + StoreLocation.PASSWORD_SOURCES;

    private StorePasswordFile() {
    }

    /** The location with the password file applied; a store file takes none. */
    static StoreLocation apply(StoreLocation location, Path passwordFile) {
        if (passwordFile == null) {
            return location;
        }
        return switch (location) {
            case StoreLocation.Server s -> s.withPasswordFile(passwordFile);
            case StoreLocation.File f -> throw new IllegalArgumentException("--store-password-file is for a PostgreSQL"
                    + " store (--store postgresql://host:port/database); the store " + f + " is a file and needs none");
        };
    }

    /** A store that must exist already: a file is checked here; a server store is checked when opened. */
    static StoreLocation existing(StoreLocation location) {
        if (location instanceof StoreLocation.File f) {
            ExistingStore.require(f.path());
        }
        return location;
    }
}
