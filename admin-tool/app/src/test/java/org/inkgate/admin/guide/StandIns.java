package org.inkgate.admin.guide;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.inkgate.admin.core.testutil.PostgresServer;

/**
 * The stand-ins the guides print for what only the reader has, and what {@link GuideExamplesTest}
 * puts in their place before it runs a command; each guide says what its stand-ins mean. Only the
 * stand-in text is replaced: the rest of the command runs as printed.
 * <ul>
 * <li>{@code /media/stick}: the stick of enrolment files handed over by the invigilators; the test
 *     writes one with the real client ({@code inkgate-client --installation}) into
 *     {@code media-stick/} of the guide's folder;</li>
 * <li>{@code 7KQ4-M2XD}: a blind id of rater R01's queue, read from the guide's {@code results.db}
 *     (blind ids are drawn at random);</li>
 * <li>{@code db.example:5432/inkgate}: the PostgreSQL server and database; the tests' embedded
 *     server and a new, empty database on it, where the role the address names logs in with the
 *     password the test puts in {@code PGPASSWORD}.</li>
 * </ul>
 */
final class StandIns {

    static final String STICK = "/media/stick";
    static final String BLIND_ID = "7KQ4-M2XD";
    static final String SERVER = "db.example:5432/inkgate";
    private static final String PASSWORD = "invented-guide-password";

    private final Path work;
    private final Map<String, String> environment = new LinkedHashMap<>();
    private String server;

    StandIns(Path work) {
        this.work = work;
    }

    /** The command with every stand-in replaced. */
    String apply(String command) throws Exception {
        String c = command;
        if (c.contains(STICK)) {
            c = c.replace(STICK, stick());
        }
        if (c.contains(BLIND_ID)) {
            c = c.replace(BLIND_ID, blindIdOf("R01"));
        }
        if (c.contains(SERVER)) {
            c = c.replace(SERVER, server(c));
        }
        return c;
    }

    /** Environment lines the commands need for the stand-ins (the stand-in server's password). */
    List<String> environment() {
        return environment.entrySet().stream().map(e -> "export " + e.getKey() + "='" + e.getValue() + "'").toList();
    }

    // one enrolment file, written by the real client as the invigilator's command in the guide does
    private String stick() throws Exception {
        Path stick = work.resolve("media-stick");
        if (!Files.isDirectory(stick)) {
            String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
            Process p = new ProcessBuilder(java, "--enable-native-access=ALL-UNNAMED", "-Djava.awt.headless=true", "-cp",
                    System.getProperty("java.class.path"), "org.inkgate.client.Launcher", "--installation",
                    "--data", work.resolve("seat-14-data").toString(), "--seat", "Room 2, seat 14",
                    "--out", stick.toString()).redirectErrorStream(true).start();
            String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            if (!p.waitFor(120, TimeUnit.SECONDS) || p.exitValue() != 0) {
                throw new IllegalStateException("the client did not write an enrolment file for " + STICK + ":\n" + out);
            }
        }
        return stick.toAbsolutePath().toString();
    }

    private String blindIdOf(String rater) throws Exception {
        Path store = work.resolve("results.db");
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + store.toAbsolutePath());
                Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT blind_id FROM rating_assignments WHERE rater_id = '" + rater
                        + "' AND blind_id IS NOT NULL ORDER BY assignment_id LIMIT 1")) {
            if (!rs.next()) {
                throw new IllegalStateException("no blind id of rater " + rater + " in " + store + " for " + BLIND_ID);
            }
            return rs.getString(1);
        }
    }

    // one empty database per guide run; the role named in the address may log in with a password
    private String server(String command) throws Exception {
        if (server == null) {
            java.util.regex.Matcher role = java.util.regex.Pattern.compile("postgresql://(\\w+)@" + java.util.regex.Pattern.quote(SERVER))
                    .matcher(command);
            if (!role.find()) {
                throw new IllegalStateException("no role before " + SERVER + " in: " + command);
            }
            String url = PostgresServer.freshDatabase("guide_" + work.getFileName().toString().replace('-', '_'));
            String database = url.substring(url.lastIndexOf('/') + 1).replaceAll("\\?.*", "");
            PostgresServer.passwordRole(role.group(1), PASSWORD, database);
            environment.put("PGPASSWORD", PASSWORD);
            server = "localhost:" + PostgresServer.shared().getPort() + "/" + database;
        }
        return server;
    }
}
