package org.inkgate.admin.testutil;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.KeyPair;
import java.util.Base64;
import java.util.Set;
import org.inkgate.admin.core.keys.OwnerKeyStore;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.trust.TrustPolicy;

/**
 * A sitting prepared the way a test owner does it on the command line (keys, forms, bundle through
 * the real {@code inkgate-admin} in this process), then simulated packages. The commands read
 * secrets only from environment variables, so the key passphrase and the PIN are the value of
 * {@code PATH}: always set, long enough, and never a real secret.
 */
public final class CommandLineSitting {

    /** The environment variable the commands read the passphrase and PIN from. */
    public static final String SECRET_ENV = "PATH";

    private CommandLineSitting() {
    }

    public static String passphrase() {
        return System.getenv(SECRET_ENV);
    }

    /** Runs one command; fails the test unless it exits with 0. */
    public static String admin(String... args) {
        AdminCommand.Run r = AdminCommand.admin(args);
        assertEquals(0, r.code(), String.join(" ", args) + "\n" + r.out() + "\n" + r.err());
        return r.out();
    }

    /** keys init, forms --out and bundle, each through the command line; returns the bundle. */
    public static Path prepare(Path exam, Path roster, long seed, Path dir) {
        Path keys = dir.resolve("keys");
        admin("keys", "init", "--keys", keys.toString(), "--passphrase-env", SECRET_ENV);
        Path assignment = dir.resolve("assignment.csv");
        admin("forms", exam.toString(), "--roster", roster.toString(), "--seed", Long.toString(seed), "--out",
                assignment.toString());
        Path bundle = dir.resolve("exam.inkexam");
        admin("bundle", exam.toString(), "--out", bundle.toString(), "--keys", keys.toString(), "--roster",
                roster.toString(), "--assignment", assignment.toString(), "--passphrase-env", SECRET_ENV, "--pin-env",
                SECRET_ENV);
        return bundle;
    }

    /** One simulated package per candidate on the bundle's roster except {@code leftOut}. */
    public static void packages(Path keys, Path bundle, Path out, String leftOut) throws Exception {
        OwnerKeyStore.PublicKeys owner = new OwnerKeyStore(keys).publicKeys();
        KeyPair installation = Ed25519.generate();
        Files.createDirectories(out);
        try (OpenedBundle b = new BundleReader(TrustPolicy.trusting(Set.of(owner.signingFingerprint()))).open(bundle)) {
            SimulatedSitting sitting = new SimulatedSitting(b.manifest(), b.manifestSha256(), installation.getPrivate(),
                    X25519.publicFromRaw(Base64.getDecoder().decode(owner.encryption())));
            long seed = 1;
            for (RosterEntry r : b.manifest().roster()) {
                if (!r.candidateNumber().equals(leftOut)) {
                    sitting.write(r.candidateNumber(), r.formId(), seed++, 40, out.resolve(r.candidateNumber() + ".inkresp"));
                }
            }
        }
    }
}
