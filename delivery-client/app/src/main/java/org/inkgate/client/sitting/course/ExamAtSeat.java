package org.inkgate.client.sitting.course;

import java.util.Objects;
import org.inkgate.format.bundle.BundleManifest;

/**
 * The exam a seat runs, as the course needs it: the verified manifest, its digest (which names
 * the sitting's bundle in the log and recovery), the bundle file as recorded, and the client's version.
 */
public record ExamAtSeat(BundleManifest manifest, String manifestSha256, String bundleFile, String clientVersion) {
    public ExamAtSeat {
        Objects.requireNonNull(manifest, "manifest");
        Objects.requireNonNull(manifestSha256, "manifestSha256");
        Objects.requireNonNull(bundleFile, "bundleFile");
        Objects.requireNonNull(clientVersion, "clientVersion");
    }
}
