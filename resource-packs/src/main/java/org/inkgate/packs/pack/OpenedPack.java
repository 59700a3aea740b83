package org.inkgate.packs.pack;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;

/**
 * A pack verified and extracted to a private folder; closing deletes the folder.
 *
 * @param manifest the checked manifest
 * @param folder   where the content files were extracted (read-only files)
 */
public record OpenedPack(PackManifest manifest, Path folder) implements AutoCloseable {

    /** Refuses the pack when it is not of the kind the caller needs. */
    public OpenedPack requireKind(PackKind kind) throws PackRefusal {
        if (manifest.kind() != kind) {
            close();
            throw new PackRefusal(PackRefusal.Reason.WRONG_PACK, "pack " + manifest.id() + " is a " + manifest.kind().name().toLowerCase(java.util.Locale.ROOT)
                    + " pack, but a " + kind.name().toLowerCase(java.util.Locale.ROOT) + " pack is needed here");
        }
        return this;
    }

    @Override
    public void close() {
        deleteTree(folder);
    }

    static void deleteTree(Path folder) {
        if (!Files.exists(folder)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(folder)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                p.toFile().setWritable(true);
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("could not delete the working folder " + folder, e);
        }
    }
}
