package org.inkgate.packs.pack;

import java.time.Instant;
import java.util.List;

/**
 * What a pack builder knows before the files are hashed: everything in the manifest except the
 * digests and the file list, which {@link PackFiles#write} computes.
 */
public record PackDraft(
        String id,
        PackKind kind,
        String version,
        String title,
        List<String> languages,
        String licence,
        String attribution,
        long entryCount,
        Instant builtAt) {

    public PackDraft {
        languages = languages == null ? List.of() : List.copyOf(languages);
    }
}
