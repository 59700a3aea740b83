package org.inkgate.packs.pack;

import java.time.Instant;
import java.util.List;
import java.util.Objects;

/**
 * The manifest of an {@code .inkpack}: who the pack is, what it holds and the digests that
 * prove its contents. Stored as {@code manifest.json}, the first entry of the zip.
 *
 * @param format        always {@value #FORMAT}
 * @param formatVersion version of this layout; readers refuse newer ones
 * @param id            pack id a resource policy names, e.g. {@code wordnet-3.1-en}
 * @param kind          glossary or dictionary
 * @param version       the pack author's version of the data, e.g. {@code 3.1.0}
 * @param title         human-readable title
 * @param languages     BCP 47 language tags of the content, e.g. {@code [en, es]}
 * @param licence       licence of the data (SPDX id or the licence's own name)
 * @param attribution   attribution line the licence asks for (may be empty)
 * @param entryCount    number of entries (concepts or lemmas) in the index
 * @param builtAt       when the pack was built (UTC)
 * @param contentSha256 SHA-256 over the sorted file list (see {@link PackDigests#contentDigest})
 * @param files         every content file with size and SHA-256, sorted by path
 */
public record PackManifest(
        String format,
        int formatVersion,
        String id,
        PackKind kind,
        String version,
        String title,
        List<String> languages,
        String licence,
        String attribution,
        long entryCount,
        Instant builtAt,
        String contentSha256,
        List<PackFileEntry> files) {

    /** The value of {@code format} in every pack manifest. */
    public static final String FORMAT = "inkgate-pack";
    /** The layout version this code writes and the newest it reads. */
    public static final int CURRENT_VERSION = 1;

    public PackManifest {
        Objects.requireNonNull(kind, "kind");
        languages = languages == null ? List.of() : List.copyOf(languages);
        files = files == null ? List.of() : List.copyOf(files);
    }
}
