package org.inkgate.admin.core.store;

import java.net.URI;
import java.net.URISyntaxException;
import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Where a results store is, as given to {@code --store} or chosen in the admin window: one SQLite
 * file on this machine (the embedded default), or a database on a PostgreSQL server, given as
 * {@code postgresql://host:port/database}. A server location never carries a password: that comes
 * from the environment or a password file when the store is opened ({@code store.postgresql}).
 */
public sealed interface StoreLocation {

    /** A store in one file on this machine (SQLite, the embedded default). */
    record File(Path path) implements StoreLocation {
        public File {
            Objects.requireNonNull(path, "path");
        }

        @Override
        public String toString() {
            return path.toString();
        }
    }

    /**
     * A database on a PostgreSQL server.
     *
     * @param user         the role to log in as, from the URL ({@code user@host} or {@code ?user=}); null: PGUSER,
     *                     else the operating-system user, as PostgreSQL's own programs do
     * @param parameters   connection parameters passed to the driver as given (TLS: {@code sslmode},
     *                     {@code sslrootcert} ...; see {@link #PASSED_THROUGH})
     * @param passwordFile a password file named on the command line or in the window; null: PGPASSWORD, then
     *                     PGPASSFILE, then {@code ~/.pgpass}
     */
    record Server(String host, int port, String database, String user, Map<String, String> parameters,
            Path passwordFile) implements StoreLocation {
        public Server {
            Objects.requireNonNull(host, "host");
            Objects.requireNonNull(database, "database");
            parameters = Map.copyOf(parameters);
        }

        /** The same server store, its password read from {@code file}. */
        public Server withPasswordFile(Path file) {
            return new Server(host, port, database, user, parameters, file);
        }

        /** {@code postgresql://host:port/database}, without user, parameters or password: safe to print. */
        @Override
        public String toString() {
            return "postgresql://" + (host.contains(":") ? "[" + host + "]" : host) + ":" + port + "/" + database;
        }
    }

    /**
     * Where the password of a server store comes from, in the words of {@code --store-password-file}
     * and of the admin window's password file field: one wording for both.
     */
    String PASSWORD_SOURCES = "a password file (lines host:port:database:user:password, as PostgreSQL's own"
            + " programs read them); without it PGPASSWORD, then PGPASSFILE, then ~/.pgpass";

    /** PostgreSQL's port when a URL names none. */
    int DEFAULT_PORT = 5432;

    /**
     * Connection parameters a server URL may carry, passed to the PostgreSQL JDBC driver unchanged
     * (its documentation, "Connection Parameters"): TLS and time-outs. A password
     * ({@code password}, {@code sslpassword}) is refused: the command line is visible to other users
     * of the machine and kept in shell histories.
     */
    Set<String> PASSED_THROUGH = Set.of("ssl", "sslmode", "sslrootcert", "sslcert", "sslkey", "sslfactory",
            "sslhostnameverifier", "sslnegotiation", "connectTimeout", "socketTimeout", "loginTimeout",
            "ApplicationName", "targetServerType");

    /** {@code scheme://...}: a URL, never a file name (a Windows drive letter has one letter and no "//"). */
    Pattern URL = Pattern.compile("^([A-Za-z][A-Za-z0-9+.-]+):(//.*)?$");

    /** The store in a file. */
    static StoreLocation file(Path path) {
        return new File(path);
    }

    /**
     * Reads a {@code --store} value: a file path, or a PostgreSQL URL.
     *
     * @throws StoreException for an empty value, another kind of URL or a URL carrying a password,
     *                        saying what to give instead; the value is never echoed (it may hold a secret)
     */
    static StoreLocation parse(String value) throws StoreException {
        if (value == null || value.isBlank()) {
            throw new StoreException("no store given; give the results store file, e.g. --store "
                    + ResultsStore.DEFAULT_FILE_NAME + ", or a PostgreSQL store, e.g. --store postgresql://host:5432/inkgate");
        }
        String given = value.strip();
        // a JDBC URL (jdbc:postgresql://...) is a URL too, though its "//" follows the second colon
        String bare = given.toLowerCase(Locale.ROOT).startsWith("jdbc:") ? given.substring(5) : given;
        var url = URL.matcher(bare);
        if (url.matches() && url.group(2) != null) {
            String scheme = url.group(1).toLowerCase(Locale.ROOT);
            if (scheme.equals("postgresql") || scheme.equals("postgres")) {
                return server(bare.substring(url.group(1).length()));
            }
            throw new StoreException("a store at a " + scheme + ":// address is not supported; give the results"
                    + " store file (e.g. --store " + ResultsStore.DEFAULT_FILE_NAME + ") or a PostgreSQL store"
                    + " (postgresql://host:port/database)");
        }
        return new File(Path.of(value));
    }

    /** {@code ://[user@]host[:port]/database[?name=value&...]}, the part after the scheme. */
    private static Server server(String rest) throws StoreException {
        String example = " Write it as postgresql://host:port/database, e.g. postgresql://db.example:5432/inkgate";
        URI uri;
        try {
            uri = new URI("postgresql" + rest);
        } catch (URISyntaxException e) {
            throw new StoreException("the PostgreSQL store address cannot be read (" + e.getReason() + ")." + example);
        }
        String user = null;
        if (uri.getRawUserInfo() != null) {
            if (uri.getRawUserInfo().contains(":")) {
                throw new StoreException("the PostgreSQL store address carries a password, which inkgate-admin does not"
                        + " take on the command line (other users of the machine can see it, shell histories keep it)."
                        + " Give the address without it, and the password in the environment (PGPASSWORD) or a"
                        + " password file (--store-password-file or PGPASSFILE). Change that password if the command"
                        + " was run");
            }
            user = decode(uri.getRawUserInfo());
        }
        String host = uri.getHost();
        String path = uri.getRawPath() == null ? "" : uri.getRawPath();
        if (host == null || host.isEmpty() || path.length() < 2 || path.indexOf('/', 1) >= 0) {
            throw new StoreException("the PostgreSQL store address needs a host and one database name." + example);
        }
        if (host.startsWith("[") && host.endsWith("]")) {
            host = host.substring(1, host.length() - 1);
        }
        Map<String, String> parameters = new LinkedHashMap<>();
        if (uri.getRawQuery() != null) {
            for (String pair : uri.getRawQuery().split("&")) {
                if (pair.isEmpty()) {
                    continue;
                }
                int eq = pair.indexOf('=');
                String name = decode(eq < 0 ? pair : pair.substring(0, eq));
                String v = eq < 0 ? "" : decode(pair.substring(eq + 1));
                if (name.equalsIgnoreCase("password") || name.equalsIgnoreCase("sslpassword")) {
                    throw new StoreException("the PostgreSQL store address carries a password (" + name + "=...), which"
                            + " inkgate-admin does not take on the command line. Give the password in the environment"
                            + " (PGPASSWORD) or a password file (--store-password-file or PGPASSFILE); give a key's"
                            + " passphrase to the key file instead. Change that password if the command was run");
                }
                if (name.equals("user")) {
                    user = v;
                } else if (PASSED_THROUGH.contains(name)) {
                    parameters.put(name, v);
                } else {
                    throw new StoreException("the PostgreSQL store address has the parameter \"" + name + "\", which"
                            + " inkgate-admin does not pass on; it passes on user and " + String.join(", ",
                                    new java.util.TreeSet<>(PASSED_THROUGH)));
                }
            }
        }
        return new Server(host, uri.getPort() < 0 ? DEFAULT_PORT : uri.getPort(), decode(path.substring(1)), user,
                parameters, null);
    }

    private static String decode(String s) {
        return URLDecoder.decode(s.replace("+", "%2B"), StandardCharsets.UTF_8);
    }
}
