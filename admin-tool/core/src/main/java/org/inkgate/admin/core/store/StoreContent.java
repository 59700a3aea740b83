package org.inkgate.admin.core.store;

import java.util.List;

/**
 * What a results store holds, table by table: the row count and the content digest of every table
 * of the schema (docs/formats.md, "Store content digests"). Two stores with equal contents have
 * equal digests whatever database holds them, so a copy is verified by comparing these.
 *
 * @param schemaVersion the store's schema version
 * @param tables        every table of the schema, in the order the copy fills them
 */
public record StoreContent(int schemaVersion, List<Table> tables) {

    /** One table: its name, its rows and the SHA-256 of its rows (lower-case hex). */
    public record Table(String name, long rows, String sha256) {
    }

    public StoreContent {
        tables = List.copyOf(tables);
    }

    /** Rows in all tables. */
    public long rows() {
        return tables.stream().mapToLong(Table::rows).sum();
    }

    /** Told how far a long copy or digest has come. */
    @FunctionalInterface
    public interface Progress {
        /** {@code done} of {@code total} rows, now in {@code table}. */
        void rows(long done, long total, String table);

        Progress NONE = (done, total, table) -> { };
    }
}
