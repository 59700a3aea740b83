package org.inkgate.admin.core.store;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Objects;
import java.util.regex.Pattern;

/**
 * Where a results store is, as given to {@code --store} or chosen in the admin window. Today a
 * store is one SQLite file; a server URL ({@code postgresql://host:port/db}) is recognised so that
 * it is refused with a plain message instead of being taken for a file name.
 */
public sealed interface StoreLocation {

    /** A store in one file on this machine (SQLite, the embedded default). */
    record File(Path path) implements StoreLocation {
        public File {
            Objects.requireNonNull(path, "path");
        }

        @Override
        public Path file() {
            return path;
        }

        @Override
        public String toString() {
            return path.toString();
        }
    }

    /**
     * The store's file, for the steps that still work on the file itself: collect's lock beside
     * the store, and the analysis and exports that reopen the store by its file. A server store
     * (next version) has none: those steps then take the location.
     */
    Path file();

    /** {@code scheme://...}: a URL, never a file name (a Windows drive letter has one letter and no "//"). */
    Pattern URL = Pattern.compile("^([A-Za-z][A-Za-z0-9+.-]+):(//.*)?$");

    /** The store in a file. */
    static StoreLocation file(Path path) {
        return new File(path);
    }

    /**
     * Reads a {@code --store} value: a file path, or a URL, which this version refuses.
     *
     * @throws StoreException for an empty value or a URL, saying what to give instead
     */
    static StoreLocation parse(String value) throws StoreException {
        if (value == null || value.isBlank()) {
            throw new StoreException("no store given; give the results store file, e.g. --store "
                    + ResultsStore.DEFAULT_FILE_NAME);
        }
        String given = value.strip();
        // a JDBC URL (jdbc:postgresql://...) is a URL too, though its "//" follows the second colon
        var url = URL.matcher(given.toLowerCase(Locale.ROOT).startsWith("jdbc:") ? given.substring(5) : given);
        if (url.matches() && url.group(2) != null) {
            String scheme = url.group(1).toLowerCase(Locale.ROOT);
            // the value is not echoed: a URL may carry a user name or password
            if (scheme.equals("postgresql") || scheme.equals("postgres")) {
                throw new StoreException("a PostgreSQL store (" + scheme + "://...) is not in this version of"
                        + " inkgate-admin; give the results store file instead, e.g. --store "
                        + ResultsStore.DEFAULT_FILE_NAME);
            }
            throw new StoreException("a store at a " + scheme + ":// address is not supported; give the results"
                    + " store file, e.g. --store " + ResultsStore.DEFAULT_FILE_NAME);
        }
        return new File(Path.of(value));
    }
}
