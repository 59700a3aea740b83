package org.inkgate.client.sitting.open;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.trust.TrustPolicy;

/**
 * Opens a bundle for a live sitting: every check of the format's reader, a signer among the
 * owner keys given at launch (never any signer), and a live bundle (practice bundles have no
 * invigilator PIN and are for practice mode).
 */
public final class SittingBundleOpener {

    private final BundleReader reader;

    public SittingBundleOpener(Set<String> ownerKeys) {
        if (ownerKeys.isEmpty()) {
            throw new IllegalArgumentException("a live sitting needs at least one trusted owner key fingerprint");
        }
        this.reader = new BundleReader(TrustPolicy.trusting(ownerKeys));
    }

    public SittingLoad open(Path file) {
        String name = String.valueOf(file.getFileName());
        if (!Files.isRegularFile(file)) {
            return new SittingLoad.Refused(name + ": there is no such file (" + file.toAbsolutePath()
                    + "). Check the path the sitting was started with.");
        }
        OpenedBundle bundle;
        try {
            bundle = reader.open(file);
        } catch (FormatRefusal e) {
            return new SittingLoad.Refused(e.getMessage());
        } catch (IOException e) {
            return new SittingLoad.Refused(name + ": the file could not be read (" + e.getMessage()
                    + "). Check that the disk is readable and start again.");
        }
        if (bundle.manifest().practice() || bundle.manifest().invigilatorPin() == null) {
            close(bundle);
            return new SittingLoad.Refused(name + ": this is a practice bundle, which has no invigilator PIN and is"
                    + " not for a live sitting. Open it with --practice, or ask the test owner for the sitting's bundle.");
        }
        return new SittingLoad.Opened(bundle);
    }

    private static void close(OpenedBundle bundle) {
        try {
            bundle.close();
        } catch (IOException ignored) {
            // only a temporary folder is left behind; the refusal message matters more
        }
    }
}
