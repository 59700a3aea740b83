package org.inkgate.admin.cli;

import static org.inkgate.admin.testutil.AdminCommand.admin;
import static org.inkgate.admin.testutil.AdminCommand.concat;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.inkgate.admin.testutil.AdminCommand.Run;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.testutil.PostgresServer;
import org.inkgate.admin.testutil.CommandLineSitting;
import org.inkgate.admin.testutil.DemoSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Rating through the real command line on a PostgreSQL store, logging in with a password file:
 * raters, a seeded assignment, sheets exported, filled and imported, a discrepancy rule, a flag
 * settled by a resolution entry and another by the adjudicator's sheet, progress, the rating
 * export and analyse --store. The same steps on the same packages collected into a SQLite file give
 * the same final scores and ratings (the times of rating aside, which are the clock's).
 */
class PostgresRatingCommandTest {

    private static final Path EXAM = DemoSource.DEMO.resolve("exam-source");
    private static final Path ROSTER = DemoSource.DEMO.resolve("roster.csv");
    /** An invented password; no output may show it. */
    private static final String PASSWORD = "Invented-Rating-Pass-19";
    /** Invented harshness: R01 harsh, R02 middling, R03 lenient, so R01-R03 pairs are flagged. */
    private static final Map<String, Integer> HARSHNESS = Map.of("R01", 3, "R02", 5, "R03", 8);

    @TempDir
    Path dir;



    @Test
    void assignRateResolveExportAnalyse_onAPostgresqlStore_giveTheFinalScoresOfTheSameStepsOnAStoreFile()
            throws Exception {
        Path bundle = CommandLineSitting.prepare(EXAM, ROSTER, 20261203, dir);
        Path keys = dir.resolve("keys");
        Path packages = dir.resolve("packages");
        CommandLineSitting.packages(keys, bundle, packages, "H1012");
        StoreLocation.Server database = PostgresServer.freshStore("clirating");
        PostgresServer.passwordRole("cli_rater", PASSWORD, database.database());
        String server = "postgresql://cli_rater@localhost:" + database.port() + "/" + database.database()
                + "?sslmode=disable";
        Path passwords = Files.writeString(dir.resolve("store.pgpass"), "localhost:" + database.port() + ":"
                + database.database() + ":cli_rater:" + PASSWORD + "\n");
        String[] onServer = {"--store", server, "--store-password-file", passwords.toString()};
        String[] onFile = {"--store", dir.resolve("results.db").toString()};
        String[] collect = {"collect", packages.toString(), "--bundle", bundle.toString(), "--keys", keys.toString(),
            "--any-installation", "--passphrase-env", CommandLineSitting.SECRET_ENV, "--exam", EXAM.toString()};
        for (String[] store : List.of(onServer, onFile)) {
            Run collected = admin(concat(collect, store));
            assertTrue(collected.out().contains("Imported 11,"), collected.all());
        }

        List<Run> said = new ArrayList<>();
        Path fromServer = rate("postgresql", onServer, said);
        Path fromFile = rate("sqlite", onFile, said);

        assertEquals(withoutTimes(fromFile.resolve("final-scores.csv")), withoutTimes(fromServer.resolve("final-scores.csv")));
        assertEquals(withoutTimes(fromFile.resolve("ratings.csv")), withoutTimes(fromServer.resolve("ratings.csv")));
        String finals = Files.readString(fromServer.resolve("final-scores.csv"));
        // R01 (3+3) and R03 (8+8) flagged; a flag settled by R02's adjudication (5+5): closest pair R01-R02, (3+5)/2 = 4
        assertTrue(finals.contains(",4,closest-pair-mean,"), finals);
        assertTrue(finals.contains(",resolution"), "one flag settled by a resolution entry: " + finals);
        for (Run r : said) {
            assertFalse(r.all().contains(PASSWORD), "the password is never shown");
            assertFalse(r.all().contains("is not yet in this version"), r.all());
        }
    }

    /** The rating steps on one store; returns the folder of its rating export. */
    private Path rate(String name, String[] store, List<Run> said) throws Exception {
        for (String r : HARSHNESS.keySet().stream().sorted().toList()) {
            said.add(ok(admin(concat(new String[] {"rate", "raters", "add", r, "--label", "Invented rater " + r}, store))));
        }
        Run assign = ok(admin(concat(new String[] {"rate", "assign", "--seed", "20261203"}, store)));
        assertTrue(assign.out().contains("Assigned 22 responses to 2 rater(s) each, seed 20261203"), assign.all());
        said.add(assign);
        Path sheets = Files.createDirectories(dir.resolve(name + "-sheets"));
        String[] criteria = null;
        for (String r : HARSHNESS.keySet().stream().sorted().toList()) {
            Path sheet = sheets.resolve(r + ".csv");
            said.add(ok(admin(concat(new String[] {"rate", "sheet", "export", "--rater", r, "--out", sheet.toString()},
                    store))));
            String text = Files.readString(sheet);
            criteria = Arrays.copyOfRange(text.split("\r\n")[0].split(","), 2, 4);
            Files.writeString(sheet, fill(text, HARSHNESS.get(r)));
            said.add(ok(admin(concat(new String[] {"rate", "sheet", "import", "--rater", r, sheet.toString()}, store))));
        }
        said.add(ok(admin(concat(new String[] {"rate", "rule", "--criterion-gap", "1"}, store))));
        Run flags = admin(concat(new String[] {"rate", "flags"}, store));
        assertEquals(InkgateAdmin.ATTENTION, flags.code(), flags.all());
        Matcher first = Pattern.compile("flag (\\d+) ").matcher(flags.out());
        assertTrue(first.find(), flags.out());
        said.add(ok(admin(concat(new String[] {"rate", "resolve", "--flag", first.group(1), "--by", "Invented panel lead",
            "--score", criteria[0] + "=6," + criteria[1] + "=6", "--comment", "agreed in discussion"}, store))));
        Path adjudication = sheets.resolve("R02-adjudication.csv");
        said.add(ok(admin(concat(new String[] {"rate", "sheet", "export", "--rater", "R02", "--out",
            adjudication.toString()}, store))));
        Files.writeString(adjudication, fill(Files.readString(adjudication), 5));
        said.add(ok(admin(concat(new String[] {"rate", "sheet", "import", "--rater", "R02", adjudication.toString()},
                store))));
        Run progress = ok(admin(concat(new String[] {"rate", "progress"}, store)));
        assertTrue(progress.out().contains("Every assigned response has a final score."), progress.all());
        said.add(progress);
        Path export = dir.resolve(name + "-rating-export");
        said.add(ok(admin(concat(new String[] {"rate", "export", "--out", export.toString()}, store))));
        Run analyse = ok(admin(concat(new String[] {"analyse", "--out", dir.resolve(name + "-report").toString()},
                store)));
        assertTrue(analyse.out().contains(" ratings;"), analyse.all());
        said.add(analyse);
        return export;
    }

    private static Run ok(Run r) {
        assertEquals(InkgateAdmin.OK, r.code(), r.all());
        return r;
    }

    /** The CSV without its last column when that is a time (rated_at, decided_at: the clock's, not the store's). */
    private static List<String> withoutTimes(Path csv) throws Exception {
        List<String> header = List.of(Files.readAllLines(csv).get(0).split(","));
        List<Integer> times = new ArrayList<>();
        for (int i = 0; i < header.size(); i++) {
            if (header.get(i).endsWith("_at")) {
                times.add(i);
            }
        }
        return Files.readAllLines(csv).stream().map(line -> {
            List<String> f = new ArrayList<>(List.of(line.split(",", -1)));
            for (int i = times.size() - 1; i >= 0; i--) {
                f.remove((int) times.get(i));
            }
            return String.join(",", f);
        }).toList();
    }

    /** Fills every criterion of every row of a sheet with one invented score, keeping rows already scored. */
    private static String fill(String sheet, int score) {
        StringBuilder out = new StringBuilder();
        String[] lines = sheet.split("\r\n");
        out.append(lines[0]).append("\r\n");
        for (String line : Arrays.asList(lines).subList(1, lines.length)) {
            String[] f = line.split(",", -1);
            if (f[2].isEmpty()) {
                f[2] = String.valueOf(score);
                f[3] = String.valueOf(score);
            }
            out.append(String.join(",", f)).append("\r\n");
        }
        return out.toString();
    }

}
