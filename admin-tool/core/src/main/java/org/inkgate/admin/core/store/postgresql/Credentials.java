package org.inkgate.admin.core.store.postgresql;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.store.StoreException;
import org.inkgate.admin.core.store.StoreLocation;

/**
 * The role and password a server store is opened with, never from the command line: the role from
 * the URL, else PGUSER, else the operating-system user; the password from the password file named
 * for the store, else PGPASSWORD, else the file PGPASSFILE names, else {@code ~/.pgpass}. Password
 * files are in the format PostgreSQL's own programs read (PostgreSQL docs, 34.16 "The Password
 * File"): lines {@code host:port:database:user:password}, {@code *} matching anything, {@code \:}
 * and {@code \\} for a colon and a backslash, the first matching line winning.
 *
 * @param source where the password came from, for messages (never the password)
 */
record Credentials(String user, String password, String source) {

    /** Never prints the password. */
    @Override
    public String toString() {
        return "user " + user + (password == null ? ", no password" : ", password from " + source);
    }

    static Credentials of(StoreLocation.Server server, Map<String, String> env) throws StoreException {
        String user = server.user() != null ? server.user()
                : env.getOrDefault("PGUSER", System.getProperty("user.name"));
        if (server.passwordFile() != null) {
            String p = fromFile(server.passwordFile(), server, user, true);
            return new Credentials(user, p, "the password file " + server.passwordFile());
        }
        if (env.get("PGPASSWORD") != null) {
            return new Credentials(user, env.get("PGPASSWORD"), "PGPASSWORD");
        }
        if (env.get("PGPASSFILE") != null) {
            Path file = Path.of(env.get("PGPASSFILE"));
            return new Credentials(user, fromFile(file, server, user, true), "the password file " + file + " (PGPASSFILE)");
        }
        Path home = Path.of(System.getProperty("user.home"), ".pgpass");
        if (Files.isRegularFile(home)) {
            return new Credentials(user, fromFile(home, server, user, false), "the password file " + home);
        }
        return new Credentials(user, null, "nowhere");
    }

    /** The password of the first line matching the server, database and user; null when none matches. */
    private static String fromFile(Path file, StoreLocation.Server server, String user, boolean named)
            throws StoreException {
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new StoreException("cannot read the password file " + file + " for the PostgreSQL store " + server
                    + (named ? "" : " (the default ~/.pgpass)") + ": " + e.getMessage()
                    + ". Check the path and that you may read it");
        }
        String[] wanted = {server.host(), Integer.toString(server.port()), server.database(), user};
        for (String line : lines) {
            if (line.isBlank() || line.startsWith("#")) {
                continue;
            }
            List<String> fields = fields(line);
            if (fields.size() != 5) {
                continue; // as PostgreSQL's programs do: a line they cannot read is passed over
            }
            boolean match = true;
            for (int i = 0; i < 4 && match; i++) {
                match = fields.get(i).equals("*") || fields.get(i).equals(wanted[i]);
            }
            if (match) {
                return fields.get(4);
            }
        }
        if (named) {
            throw new StoreException("the password file " + file + " has no line for the PostgreSQL store " + server
                    + " and user " + user + "; add a line host:port:database:user:password (* matches anything)");
        }
        return null;
    }

    /** The colon-separated fields of one line, {@code \:} and {@code \\} unescaped. */
    static List<String> fields(String line) {
        List<String> out = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        for (int i = 0; i < line.length(); i++) {
            char ch = line.charAt(i);
            if (ch == '\\' && i + 1 < line.length()) {
                field.append(line.charAt(++i));
            } else if (ch == ':') {
                out.add(field.toString());
                field.setLength(0);
            } else {
                field.append(ch);
            }
        }
        out.add(field.toString());
        return out;
    }
}
