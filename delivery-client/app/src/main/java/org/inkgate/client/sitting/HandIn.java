package org.inkgate.client.sitting;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.PublicKey;
import java.time.Instant;
import java.util.Base64;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.UUID;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.store.SittingStateStore;
import org.inkgate.client.sitting.store.SqliteProcessLog;
import org.inkgate.client.sitting.submit.InstallationKey;
import org.inkgate.client.sitting.submit.PackageDelivery;
import org.inkgate.client.sitting.submit.SubmissionResult;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.io.AtomicFiles;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.response.ResponsePackageWriter;

/**
 * What a {@link Sitting} hands in: its response package, written first as the local copy in the client data folder
 * and then delivered to an output folder (again after a failure, or to a second folder), each step remembered in the
 * sitting's database. The package id is drawn once and kept there, so a retry after a failed local copy writes the
 * same package. Writes files: called off the UI thread, as {@link Sitting#submit} is.
 */
final class HandIn {

    private final SittingPlan plan;
    private final ClientDataFolder folder;
    private final SittingStateStore store;
    private final SqliteProcessLog log;
    private PackageDelivery delivery = PackageDelivery.local();
    private String packageId;
    private Path localCopy;

    HandIn(SittingPlan plan, ClientDataFolder folder, SittingStateStore store, SqliteProcessLog log) {
        this.plan = plan;
        this.folder = folder;
        this.store = store;
        this.log = log;
    }

    /** What a resumed sitting had stored of its package (each may be null). */
    void restore(String storedPackageId, Path storedLocalCopy) {
        this.packageId = storedPackageId;
        this.localCopy = storedLocalCopy;
    }

    /** The package id: drawn and saved the first time it is asked for, the same ever after. */
    String packageId() {
        if (packageId == null) {
            packageId = UUID.randomUUID().toString();
            store.savePackageId(packageId);
        }
        return packageId;
    }

    /**
     * Encodes the package (signed with the installation key, encrypted to the test owner) and writes the local copy,
     * whole or not at all, then marks the sitting submitted in its database; returns the package's bytes to deliver.
     */
    byte[] writeLocalCopy(ResponseDocument document, List<ProcessEvent> events, InstallationKey key, Instant submittedAt)
            throws IOException {
        PublicKey ownerKey = X25519.publicFromRaw(Base64.getDecoder().decode(plan.manifest().ownerKeys().encryption()));
        byte[] bytes = new ResponsePackageWriter(key.key(), ownerKey).encode(document, events);
        Path local = folder.responses().resolve(fileName());
        AtomicFiles.write(local, out -> out.write(bytes));
        localCopy = local;
        store.markSubmitted(submittedAt, local);
        log.flush();
        return bytes;
    }

    /** Delivers the saved package again (after a failure, or to a second folder). */
    SubmissionResult retry(Path outputFolder) throws IOException {
        if (localCopy == null) {
            throw new IllegalStateException("nothing has been submitted yet");
        }
        return deliver(Files.readAllBytes(localCopy), outputFolder);
    }

    /** Delivers {@code bytes} into {@code outputFolder}; a delivery that fails is in the result, the local copy kept. */
    SubmissionResult deliver(byte[] bytes, Path outputFolder) throws IOException {
        PackageDelivery.Outcome outcome = delivery.deliver(bytes, outputFolder, fileName());
        if (outcome.delivered().isPresent()) {
            store.markDelivered(outcome.delivered().get());
            log.flush();
        }
        return new SubmissionResult(packageId, localCopy, outcome.delivered(), outcome.failure());
    }

    Optional<Path> localCopy() {
        return Optional.ofNullable(localCopy);
    }

    void useDelivery(PackageDelivery replacement) {
        delivery = Objects.requireNonNull(replacement, "replacement");
    }

    private String fileName() {
        return Sitting.safe(plan.manifest().examId()) + "-" + Sitting.safe(plan.candidateNumber()) + "-" + packageId
                + ".inkresp";
    }
}
