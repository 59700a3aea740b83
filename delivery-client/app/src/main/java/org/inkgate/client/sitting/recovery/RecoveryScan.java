package org.inkgate.client.sitting.recovery;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.store.SittingDatabase;
import org.inkgate.client.sitting.store.SittingStateStore;
import org.inkgate.client.sitting.store.SittingStateStore.SittingSummary;
import org.inkgate.client.sitting.store.SittingStatus;

/** Finds the sittings in a client data folder that were not completed, newest first. */
public final class RecoveryScan {

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
        Optional<SittingSummary> stored = SittingStateStore.readSummary(file);
        if (stored.isEmpty() || stored.get().status() == SittingStatus.DELIVERED) {
            return Optional.empty();
        }
        SittingSummary s = stored.get();
        Instant last = s.lastEventAt().filter(e -> e.isAfter(s.checkpointAt())).orElse(s.checkpointAt());
        return Optional.of(new UnfinishedSitting(file, s.sittingId(), s.bundleSha256(), s.bundleFile(), s.examId(),
                s.candidate(), s.formId(), s.currentTask(), s.screen(),
                s.status() == SittingStatus.AWAITING_DELIVERY ? UnfinishedSitting.Stage.AWAITING_DELIVERY
                        : UnfinishedSitting.Stage.IN_PROGRESS,
                last, s.paused(), s.outputFolder()));
    }
}
