package org.inkgate.client.practice;

import java.util.List;
import java.util.Objects;

/**
 * A practice bundle that passed every check, read whole into memory.
 *
 * @param title             the exam title
 * @param fileName          the bundle's file name
 * @param signerFingerprint fingerprint of the key that signed the bundle
 * @param instructions      the general instructions, or an empty text
 * @param forms             the forms, in the bundle's order (never empty)
 */
public record PracticeExam(
        String title,
        String fileName,
        String signerFingerprint,
        PromptText instructions,
        List<PracticeForm> forms) {

    public PracticeExam {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(signerFingerprint, "signerFingerprint");
        Objects.requireNonNull(instructions, "instructions");
        forms = List.copyOf(forms);
        if (forms.isEmpty()) {
            throw new IllegalArgumentException("a practice exam needs at least one form");
        }
    }
}
