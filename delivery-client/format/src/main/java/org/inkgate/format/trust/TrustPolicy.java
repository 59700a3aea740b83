package org.inkgate.format.trust;

import java.util.Set;
import java.util.stream.Collectors;
import org.inkgate.format.crypto.Fingerprint;

/**
 * Which signing keys a reader accepts. Bundles and response packages carry the public key that
 * signed them, so a valid signature alone proves only that the file is unchanged since someone
 * signed it; trust comes from comparing the key's fingerprint with a list kept elsewhere: the
 * fingerprint the test owner published (bundles), the installations enrolled for a sitting
 * (response packages).
 *
 * @param fingerprints     accepted key fingerprints, normalised ({@link Fingerprint#normalise})
 * @param acceptsAnySigner accept any key whose signature verifies and report its fingerprint:
 *                         for practice bundles and inspection, never for a live sitting
 */
public record TrustPolicy(Set<String> fingerprints, boolean acceptsAnySigner) {

    public TrustPolicy {
        fingerprints = fingerprints.stream().map(Fingerprint::normalise).collect(Collectors.toUnmodifiableSet());
    }

    /** Accepts only these fingerprints; dashes, spaces and letter case in them do not matter. */
    public static TrustPolicy trusting(Set<String> fingerprints) {
        return new TrustPolicy(fingerprints, false);
    }

    public static TrustPolicy anySigner() {
        return new TrustPolicy(Set.of(), true);
    }

    public boolean trusts(String fingerprint) {
        return acceptsAnySigner || fingerprints.contains(Fingerprint.normalise(fingerprint));
    }
}
