package org.inkgate.client.sitting.submit;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

/**
 * Copies a response package, already saved in the client data folder, to the invigilator's
 * output folder, and turns every way that can fail into a {@link DeliveryFailure}. Nothing here
 * can lose the package: the local copy is written before delivery is tried and never removed.
 */
public final class PackageDelivery {

    private final FolderAccess folders;

    public PackageDelivery(FolderAccess folders) {
        this.folders = Objects.requireNonNull(folders, "folders");
    }

    /** Delivery to the real file system. */
    public static PackageDelivery local() {
        return new PackageDelivery(new LocalFolders());
    }

    /**
     * Writes {@code bytes} as {@code fileName} into {@code outputFolder}.
     *
     * @return the delivered file, or the failure
     */
    public Outcome deliver(byte[] bytes, Path outputFolder, String fileName) {
        Path folder = outputFolder.toAbsolutePath().normalize();
        if (!folders.isFolder(folder)) {
            return new Outcome(Optional.empty(), Optional.of(new DeliveryFailure.FolderMissing(folder)));
        }
        try {
            long free = folders.usableSpace(folder);
            // room for the temporary copy beside the final name
            if (free >= 0 && free < bytes.length) {
                return new Outcome(Optional.empty(), Optional.of(new DeliveryFailure.FolderFull(folder, bytes.length, free)));
            }
        } catch (IOException e) {
            // unknown free space: try the write, which reports a full disk itself
        }
        Path target = folder.resolve(fileName);
        try {
            folders.writeAtomically(target, bytes);
            return new Outcome(Optional.of(target), Optional.empty());
        } catch (IOException e) {
            return new Outcome(Optional.empty(), Optional.of(classify(folder, bytes.length, e)));
        }
    }

    /** Names the failure from the exception the file system gave. */
    static DeliveryFailure classify(Path folder, long needed, IOException e) {
        String reason = e instanceof FileSystemException fse && fse.getReason() != null ? fse.getReason()
                : Objects.requireNonNullElse(e.getMessage(), e.getClass().getSimpleName());
        String lower = reason.toLowerCase(Locale.ROOT);
        if (lower.contains("no space left") || lower.contains("disk full") || lower.contains("not enough space")
                || lower.contains("quota")) {
            return new DeliveryFailure.FolderFull(folder, needed, -1);
        }
        if (e instanceof AccessDeniedException || lower.contains("read-only file system") || lower.contains("permission denied")
                || lower.contains("access is denied")) {
            return new DeliveryFailure.FolderReadOnly(folder, reason);
        }
        if (e instanceof NoSuchFileException) {
            return new DeliveryFailure.FolderMissing(folder);
        }
        return new DeliveryFailure.WriteFailed(folder, reason);
    }

    /**
     * What happened.
     *
     * @param delivered the file in the output folder, when it worked
     * @param failure   why not, otherwise
     */
    public record Outcome(Optional<Path> delivered, Optional<DeliveryFailure> failure) {
    }
}
