package org.inkgate.format.response;

import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import org.inkgate.format.bundle.EntryDigest;

/**
 * The signed table of contents inside a response package ({@code package.json}).
 *
 * @param format        always {@link #FORMAT}
 * @param schemaVersion schema version
 * @param packageId     same as the envelope's and the response document's
 * @param signingKey    the client installation's Ed25519 public key, raw, base64
 * @param eventCount    number of lines in events.jsonl
 * @param chainHead     SHA-256 of the last line of events.jsonl (64 zeros when empty)
 * @param entries       response.json and events.jsonl with their digests
 */
public record PackageManifest(String format, int schemaVersion, String packageId, String signingKey, long eventCount,
        String chainHead, Map<String, EntryDigest> entries) {

    public static final String FORMAT = "inkgate-response-content";
    public static final int SCHEMA_VERSION = 1;

    public PackageManifest {
        entries = java.util.Collections.unmodifiableMap(new TreeMap<>(Objects.requireNonNullElse(entries, Map.of())));
    }
}
