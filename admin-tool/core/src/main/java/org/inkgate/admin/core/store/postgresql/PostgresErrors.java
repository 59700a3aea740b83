package org.inkgate.admin.core.store.postgresql;

import java.sql.SQLException;
import org.inkgate.admin.core.store.StoreLocation;

/**
 * The PostgreSQL failures a person can act on, in plain words, by SQLSTATE (PostgreSQL docs,
 * Appendix A "PostgreSQL Error Codes"). A refused login is worded here without the server's own
 * message, so no part of a secret can reach the screen or a log.
 */
final class PostgresErrors {

    private PostgresErrors() {
    }

    /** What the failure means for the store, or null when it is none of the known kinds. */
    static String plain(StoreLocation.Server server, Credentials login, Throwable failure) {
        if (tlsCheckFailed(failure)) {
            return "the TLS check of the PostgreSQL server " + server + " failed: its certificate is not signed by the"
                    + " certificate named in sslrootcert, has expired, or does not name this host (sslmode=verify-full"
                    + " checks the name too). Ask the database administrator for the server's root certificate and name"
                    + " it with ?sslrootcert=FILE in the store address";
        }
        if (onlyOverTls(failure)) {
            return "the PostgreSQL server " + server + " lets " + login.user() + " in only over TLS: add"
                    + " ?sslmode=verify-full&sslrootcert=FILE to the store address, FILE being the server's root"
                    + " certificate from the database administrator";
        }
        if (loginRefused(failure) || login.password() == null && hasState(failure, "08004")) {
            // 08004 without a password: the driver's "the server requested password-based authentication, but no
            // password was provided"
            // the driver may wrap the server's refusal in a connection failure of its own (08xxx): the refusal says more
            return byState(server, login, "28P01");
        }
        for (Throwable t = failure; t != null; t = t.getCause()) {
            if (t instanceof SQLException s && s.getSQLState() != null) {
                String found = byState(server, login, s.getSQLState());
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    /** Whether the TLS handshake failed on the server's certificate (the client's check, not the server's refusal). */
    private static boolean tlsCheckFailed(Throwable failure) {
        for (Throwable t = failure; t != null; t = t.getCause()) {
            if (t instanceof javax.net.ssl.SSLException || t instanceof java.security.cert.CertificateException) {
                return true;
            }
        }
        return false;
    }

    /**
     * Whether the server's host-based authentication refused a connection without TLS (PostgreSQL's
     * message for a {@code hostnossl ... reject} line or no line for plain connections ends "no
     * encryption"). The message is read here, never shown: it is the server's.
     */
    private static boolean onlyOverTls(Throwable failure) {
        for (Throwable t = failure; t != null; t = t.getCause()) {
            if (t instanceof SQLException s && "28000".equals(s.getSQLState()) && s.getMessage() != null
                    && s.getMessage().contains("no encryption")) {
                return true;
            }
        }
        return false;
    }

    /** Whether the server refused the login: the one failure whose driver message is never shown. */
    static boolean loginRefused(Throwable failure) {
        for (Throwable t = failure; t != null; t = t.getCause()) {
            if (t instanceof SQLException s && s.getSQLState() != null && s.getSQLState().startsWith("28")) {
                return true;
            }
        }
        return false;
    }

    private static boolean hasState(Throwable failure, String state) {
        for (Throwable t = failure; t != null; t = t.getCause()) {
            if (t instanceof SQLException s && state.equals(s.getSQLState())) {
                return true;
            }
        }
        return false;
    }

    private static String byState(StoreLocation.Server server, Credentials login, String state) {
        if (state.startsWith("28")) { // 28P01 invalid_password, 28000 invalid_authorization_specification
            return "the PostgreSQL server refused the login of " + login.user() + " to " + server + " ("
                    + (login.password() == null ? "no password was given: set PGPASSWORD or name a password file with"
                            + " --store-password-file or PGPASSFILE"
                            : "wrong password or no access for this role; the password came from " + login.source())
                    + "). Check the role and its password with the database administrator";
        }
        if (state.equals("3D000")) { // invalid_catalog_name
            return "the PostgreSQL server has no database " + server.database() + " (" + server + "); ask the database"
                    + " administrator to create it (an empty database; inkgate-admin creates its tables)";
        }
        if (state.equals("42501")) { // insufficient_privilege
            return "the role " + login.user() + " may not do this on " + server + "; it needs to create tables in the"
                    + " database the first time, and to read and write them afterwards (see the test-owner guide)";
        }
        if (state.startsWith("08") || state.equals("57P01") || state.equals("57P03")) {
            // connection exceptions; admin_shutdown; cannot_connect_now
            return "the connection to the PostgreSQL server " + server + " failed or was lost (is the server running"
                    + " and reachable from this machine? check the host, the port and the firewall)";
        }
        return null;
    }
}
