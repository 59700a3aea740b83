package org.inkgate.format.bundle;

import java.util.Set;

/**
 * Which signing keys a reader accepts. A bundle carries its owner's public key, so a valid
 * signature alone proves only that the manifest is unchanged since someone signed it; trust
 * comes from comparing the key's fingerprint with the one the test owner published.
 *
 * @param fingerprints accepted key fingerprints ({@link org.inkgate.format.crypto.Fingerprint})
 * @param acceptsAnySigner accept any key whose signature verifies and report its fingerprint; for
 *                     practice bundles and for inspection, never for a live sitting
 */
public record TrustPolicy(Set<String> fingerprints, boolean acceptsAnySigner) {

    public TrustPolicy {
        fingerprints = Set.copyOf(fingerprints);
    }

    public static TrustPolicy trusting(Set<String> fingerprints) {
        return new TrustPolicy(fingerprints, false);
    }

    public static TrustPolicy anySigner() {
        return new TrustPolicy(Set.of(), true);
    }

    public boolean trusts(String fingerprint) {
        return acceptsAnySigner || fingerprints.contains(fingerprint);
    }
}
