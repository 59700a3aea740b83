package org.inkgate.client.sitting.recovery;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.store.SittingScreen;
import org.inkgate.client.sitting.store.SittingDatabase;
import org.sqlite.SQLiteConfig;

/** Finds the sittings in a client data folder that were not completed, newest first. */
public final class RecoveryScan {

    /** Status values of the sitting table. */
    public static final String IN_PROGRESS = "in-progress";
    public static final String AWAITING_DELIVERY = "awaiting-delivery";
    public static final String DELIVERED = "delivered";

    private RecoveryScan() {
    }

    /**
     * Every unfinished sitting. A database that cannot be read is reported, not skipped: it may
     * hold a candidate's work.
     */
    public static List<UnfinishedSitting> find(ClientDataFolder folder) throws IOException {
        List<UnfinishedSitting> found = new ArrayList<>();
        Path sittings = folder.sittings();
        if (!Files.isDirectory(sittings)) {
            return found;
        }
        try (DirectoryStream<Path> files = Files.newDirectoryStream(sittings, "*" + SittingDatabase.SUFFIX)) {
            for (Path file : files) {
                read(file).ifPresent(found::add);
            }
        }
        found.sort(Comparator.comparing(UnfinishedSitting::lastActivity).reversed());
        return found;
    }

    /** The sitting in one database, if it is unfinished. */
    public static Optional<UnfinishedSitting> read(Path file) throws IOException {
        SQLiteConfig config = new SQLiteConfig();
        config.setBusyTimeout(5_000);
        // not read-only: opening replays the write-ahead log a killed client left behind
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath(), config.toProperties());
                Statement s = c.createStatement()) {
            Instant lastEvent = null;
            try (ResultSet rs = s.executeQuery("SELECT at FROM events ORDER BY seq DESC LIMIT 1")) {
                if (rs.next()) {
                    lastEvent = Instant.parse(rs.getString(1));
                }
            }
            Optional<Path> outputFolder = outputFolder(c);
            try (ResultSet rs = s.executeQuery("SELECT sitting_id, bundle_sha256, bundle_file, exam_id, candidate, form_id,"
                    + " current_task, screen, status, checkpoint_at, paused FROM sitting WHERE id = 1")) {
                if (!rs.next()) {
                    return Optional.empty();
                }
                String status = rs.getString(9);
                if (DELIVERED.equals(status)) {
                    return Optional.empty();
                }
                Instant checkpoint = Instant.parse(rs.getString(10));
                Instant last = lastEvent != null && lastEvent.isAfter(checkpoint) ? lastEvent : checkpoint;
                return Optional.of(new UnfinishedSitting(file, rs.getString(1), rs.getString(2), rs.getString(3),
                        rs.getString(4), rs.getString(5), rs.getString(6), Optional.ofNullable(rs.getString(7)),
                        SittingScreen.fromWire(Optional.ofNullable(rs.getString(8)).orElse("")),
                        AWAITING_DELIVERY.equals(status) ? UnfinishedSitting.Stage.AWAITING_DELIVERY
                                : UnfinishedSitting.Stage.IN_PROGRESS,
                        last, rs.getInt(11) != 0, outputFolder));
            }
        } catch (SQLException e) {
            throw new IOException(file + ": this sitting database cannot be read (" + e.getMessage() + "). Do not delete it:"
                    + " it may hold a candidate's work; give it to the test owner.", e);
        }
    }

    /** The output folder chosen at set-up, when the database remembers one (layout 2 on). */
    private static Optional<Path> outputFolder(Connection c) throws SQLException {
        if (!SittingDatabase.hasColumn(c, "sitting", "output_folder")) {
            return Optional.empty();
        }
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT output_folder FROM sitting WHERE id = 1")) {
            String folder = rs.next() ? rs.getString(1) : null;
            if (folder == null || folder.isBlank()) {
                return Optional.empty();
            }
            try {
                return Optional.of(Path.of(folder));
            } catch (java.nio.file.InvalidPathException e) {
                return Optional.empty(); // not a path on this machine: the invigilator types it again
            }
        }
    }
}
