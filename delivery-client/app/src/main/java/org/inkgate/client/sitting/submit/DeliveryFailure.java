package org.inkgate.client.sitting.submit;

import java.nio.file.Path;

/**
 * Why a response package did not reach the invigilator's output folder. The package is safe in
 * the client data folder whatever the failure; {@link #message()} says so and what to do, for
 * the invigilator screen's retry.
 */
public sealed interface DeliveryFailure {

    /** The output folder. */
    Path folder();

    /** A plain sentence for the invigilator, with what to do. */
    String message();

    /** The folder is not there (a removed USB stick, an unmounted share, a typo). */
    record FolderMissing(Path folder) implements DeliveryFailure {
        @Override
        public String message() {
            return "The output folder " + folder + " is not there (is the USB stick or network share connected?). "
                    + "The response is saved on this computer. Connect the folder or choose another, then retry.";
        }
    }

    /** The folder cannot be written to (read-only medium or no permission). */
    record FolderReadOnly(Path folder, String detail) implements DeliveryFailure {
        @Override
        public String message() {
            return "The output folder " + folder + " cannot be written to (" + detail + "). "
                    + "The response is saved on this computer. Make the folder writable or choose another, then retry.";
        }
    }

    /** The folder's disk has no room for the package. */
    record FolderFull(Path folder, long needed, long available) implements DeliveryFailure {
        @Override
        public String message() {
            return "The output folder " + folder + " is full: the response needs " + needed + " bytes"
                    + (available >= 0 ? ", " + available + " are free" : "") + ". "
                    + "The response is saved on this computer. Free some space or choose another folder, then retry.";
        }
    }

    /** Any other write failure. */
    record WriteFailed(Path folder, String detail) implements DeliveryFailure {
        @Override
        public String message() {
            return "The response could not be written to " + folder + " (" + detail + "). "
                    + "The response is saved on this computer. Check the folder, then retry or choose another.";
        }
    }
}
