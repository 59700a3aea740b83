package org.inkgate.client.sitting.submit;

import java.nio.file.Path;
import java.util.Optional;

/**
 * The outcome of a final submission or a retried delivery.
 *
 * @param packageId  the response package's id (kept by every retry)
 * @param localCopy  the package in the client data folder, always written first
 * @param delivered  the package in the output folder, when delivery worked
 * @param failure    why delivery did not work; the UI offers a retry
 */
public record SubmissionResult(String packageId, Path localCopy, Optional<Path> delivered, Optional<DeliveryFailure> failure) {

    /** Whether the package reached the output folder. */
    public boolean complete() {
        return delivered.isPresent();
    }
}
