package org.inkgate.admin.core.store.sql;

import java.sql.Connection;
import java.util.function.Function;

/**
 * One end of a store copy (or the store a digest is taken of): an open connection, its dialect,
 * the store's name for messages, failures in plain words, and what undoes the end's creation
 * when a copy into it is refused (a SQLite file created for it is removed).
 *
 * @param name  the store as it may be printed (never with a password)
 * @param plain a failure a person can act on in plain words, or null
 * @param undo  run after a refused copy into this end has been rolled back
 */
public record CopyEnd(String name, Connection connection, Dialect dialect, Function<Throwable, String> plain,
        Runnable undo) {
}
