package org.inkgate.admin.hostile;

import static org.inkgate.admin.testutil.AdminCommand.admin;
import static org.inkgate.admin.testutil.AdminCommand.concat;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.KeyPair;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.CompletableFuture;
import java.util.stream.Stream;
import org.inkgate.admin.testutil.AdminCommand.Run;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.core.keys.OwnerKeyStore;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.testutil.StoppableServer;
import org.inkgate.admin.testutil.CommandLineSitting;
import org.inkgate.admin.testutil.DemoSource;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.trust.TrustPolicy;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The PostgreSQL server stops while {@code collect} (the real command) is importing into it (issue
 * 19, "Bad input and faults"): the command exits 1 with a plain message and no stack trace; after
 * the server is started again, every package in the store is there whole (as many responses,
 * events, tool-use and questionnaire rows as the same package has in a store collected without
 * interruption) or not at all; a rerun imports the rest, and the store then answers exactly as the
 * uninterrupted one (the same rows per package, byte-identical exports).
 */
class ServerLostMidCollectTest {

    private static final Path EXAM = DemoSource.DEMO.resolve("exam-source");
    private static final Path ROSTER = DemoSource.DEMO.resolve("roster.csv");
    /** Events per package: enough that importing the eleven packages takes seconds, so the stop lands among them. */
    private static final int EVENTS = 20_000;

    @TempDir
    Path dir;



    @Test
    void serverStopsMidCollect_noPackageHalfStored_andARerunFinishesTheJob() throws Exception {
        Path bundle = CommandLineSitting.prepare(EXAM, ROSTER, 20261206, dir);
        Path keys = dir.resolve("keys");
        Path packages = dir.resolve("packages");
        writePackages(keys, bundle, packages);
        try (StoppableServer server = StoppableServer.start()) {
            StoreLocation.Server lost = server.freshStore("lost");
            StoreLocation.Server whole = server.freshStore("whole");
            String[] collect = {"collect", packages.toString(), "--bundle", bundle.toString(), "--keys", keys.toString(),
                "--any-installation", "--passphrase-env", CommandLineSitting.SECRET_ENV, "--threads", "2", "--store"};

            Run reference = admin(concat(collect, url(whole)));
            assertTrue(reference.out().contains("Imported 11,"), reference.all());
            Map<String, List<Long>> expected = rowsPerPackage(server, "whole");

            CompletableFuture<Run> interrupted = CompletableFuture.supplyAsync(() -> admin(concat(collect, url(lost))));
            stopOnceStored(server, "lost", 2);
            Run cut = interrupted.get();
            assertEquals(InkgateAdmin.PROBLEMS, cut.code(), cut.all());
            assertTrue(cut.err().contains("the connection to the PostgreSQL server " + lost + " failed or was lost"),
                    cut.all());
            assertTrue(cut.err().contains("Run the same collect again once this is fixed"), cut.all());
            assertFalse(cut.all().contains("Exception") || cut.all().contains("\tat "), "no stack trace: " + cut.all());

            server.startAgain();
            Map<String, List<Long>> partial = rowsPerPackage(server, "lost");
            assertTrue(partial.size() < 11, "the stop came before the end: " + partial.keySet());
            partial.forEach((pkg, rows) -> assertEquals(expected.get(pkg), rows, "package " + pkg + " is stored whole"));

            Run rerun = admin(concat(collect, url(lost)));
            assertNotEquals(InkgateAdmin.PROBLEMS, rerun.code(), rerun.all());
            assertTrue(rerun.out().contains("Imported " + (11 - partial.size()) + ","), rerun.all());
            assertEquals(expected, rowsPerPackage(server, "lost"), "after the rerun every package is there, whole");

            Path a = dir.resolve("export-whole");
            Path b = dir.resolve("export-rerun");
            assertEquals(InkgateAdmin.OK, admin("export", "--store", url(whole), "--out", a.toString()).code());
            assertEquals(InkgateAdmin.OK, admin("export", "--store", url(lost), "--out", b.toString()).code());
            List<Path> csv = csvFiles(a);
            assertFalse(csv.isEmpty());
            for (Path p : csv) {
                assertArrayEquals(Files.readAllBytes(p), Files.readAllBytes(b.resolve(a.relativize(p))),
                        a.relativize(p) + " is the same after the interruption and rerun");
            }
        }
    }

    private static String url(StoreLocation.Server s) {
        return "postgresql://postgres@localhost:" + s.port() + "/" + s.database();
    }

    /** Polls the store and stops the server once {@code n} sittings are committed. */
    private static void stopOnceStored(StoppableServer server, String database, int n) throws Exception {
        long deadline = System.nanoTime() + 120_000_000_000L;
        while (System.nanoTime() < deadline) {
            try (Connection c = server.connect(database); Statement s = c.createStatement();
                    ResultSet rs = s.executeQuery("SELECT to_regclass('sittings') IS NOT NULL")) {
                rs.next();
                if (rs.getBoolean(1)) {
                    try (ResultSet count = s.executeQuery("SELECT COUNT(*) FROM sittings")) {
                        count.next();
                        if (count.getLong(1) >= n) {
                            break;
                        }
                    }
                }
            }
            Thread.sleep(20);
        }
        server.stop();
    }

    /** Per package id: its responses, tool-use rows, questionnaire answers and events in the store. */
    private static Map<String, List<Long>> rowsPerPackage(StoppableServer server, String database) throws Exception {
        Map<String, List<Long>> out = new TreeMap<>();
        try (Connection c = server.connect(database); Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT s.package_id,"
                        + " (SELECT COUNT(*) FROM responses r WHERE r.sitting_id = s.sitting_id),"
                        + " (SELECT COUNT(*) FROM tool_use u WHERE u.sitting_id = s.sitting_id),"
                        + " (SELECT COUNT(*) FROM questionnaire_answers q WHERE q.sitting_id = s.sitting_id),"
                        + " (SELECT COUNT(*) FROM process_events e WHERE e.sitting_id = s.sitting_id)"
                        + " FROM sittings s")) {
            while (rs.next()) {
                out.put(rs.getString(1), List.of(rs.getLong(2), rs.getLong(3), rs.getLong(4), rs.getLong(5)));
            }
        }
        return out;
    }

    /** One simulated package of {@value #EVENTS} events per candidate on the roster but H1012. */
    private static void writePackages(Path keys, Path bundle, Path out) throws Exception {
        OwnerKeyStore.PublicKeys owner = new OwnerKeyStore(keys).publicKeys();
        KeyPair installation = Ed25519.generate();
        Files.createDirectories(out);
        try (OpenedBundle b = new BundleReader(TrustPolicy.trusting(Set.of(owner.signingFingerprint()))).open(bundle)) {
            SimulatedSitting sitting = new SimulatedSitting(b.manifest(), b.manifestSha256(), installation.getPrivate(),
                    X25519.publicFromRaw(Base64.getDecoder().decode(owner.encryption())));
            long seed = 1;
            for (RosterEntry r : b.manifest().roster()) {
                if (!r.candidateNumber().equals("H1012")) {
                    sitting.write(r.candidateNumber(), r.formId(), seed++, EVENTS, out.resolve(r.candidateNumber()
                            + ".inkresp"));
                }
            }
        }
    }

    private static List<Path> csvFiles(Path root) throws Exception {
        try (Stream<Path> files = Files.walk(root)) {
            return files.filter(p -> p.toString().endsWith(".csv")).sorted().toList();
        }
    }

}
