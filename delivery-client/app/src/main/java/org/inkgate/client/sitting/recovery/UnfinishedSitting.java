package org.inkgate.client.sitting.recovery;

import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.Optional;
import org.inkgate.client.sitting.store.SittingScreen;

/**
 * A sitting found in the client data folder that was not completed: the client stopped (a
 * crash, a power cut, a kill) while the candidate was writing, or after the response was saved
 * locally but before it reached the invigilator's output folder.
 *
 * @param database        the sitting's database file
 * @param sittingId       the sitting's id
 * @param bundleSha256    SHA-256 of the manifest of the bundle it ran from
 * @param bundleFile      the bundle file it was opened from (ask for it again if it moved)
 * @param examId          the exam
 * @param candidateNumber the candidate
 * @param formId          the form
 * @param currentTask     the task on screen when it stopped, if any
 * @param screen          the screen shown when it stopped
 * @param stage           how far it got
 * @param lastActivity    wall-clock time of the last thing written (event or timer checkpoint)
 * @param paused          whether the invigilator had paused it
 * @param outputFolder    the output folder the invigilator chose at set-up (empty for a sitting of an
 *                        earlier client, which did not remember it)
 */
public record UnfinishedSitting(Path database, String sittingId, String bundleSha256, String bundleFile, String examId,
        String candidateNumber, String formId, Optional<String> currentTask, SittingScreen screen, Stage stage,
        Instant lastActivity, boolean paused, Optional<Path> outputFolder) {

    public UnfinishedSitting {
        outputFolder = java.util.Objects.requireNonNullElse(outputFolder, Optional.empty());
    }

    /** A sitting whose set-up output folder is not known. */
    public UnfinishedSitting(Path database, String sittingId, String bundleSha256, String bundleFile, String examId,
            String candidateNumber, String formId, Optional<String> currentTask, SittingScreen screen, Stage stage,
            Instant lastActivity, boolean paused) {
        this(database, sittingId, bundleSha256, bundleFile, examId, candidateNumber, formId, currentTask, screen, stage,
                lastActivity, paused, Optional.empty());
    }

    /** How far a sitting got. */
    public enum Stage {
        /** The candidate was still working. */
        IN_PROGRESS,
        /** The response package is saved locally but was not delivered to the output folder. */
        AWAITING_DELIVERY
    }

    /**
     * Time between the last thing written and {@code now}, on the wall clock (the monotonic
     * clock does not survive a restart). A changed system clock distorts it: the invigilator
     * sees it and decides what to credit.
     */
    public Duration downtime(Instant now) {
        Duration d = Duration.between(lastActivity, now);
        return d.isNegative() ? Duration.ZERO : d;
    }
}
