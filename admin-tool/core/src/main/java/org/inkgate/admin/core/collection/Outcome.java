package org.inkgate.admin.core.collection;

/** What happened to one file offered to the collector: a closed set. */
public sealed interface Outcome {

    /** The file as named on the command line or found in a folder. */
    String file();

    /** Imported as a new sitting. */
    record Imported(String file, String candidateNumber, String formId, String packageId, String installation,
            boolean onRoster) implements Outcome {
    }

    /** These exact bytes were imported before: nothing changed. */
    record AlreadyImported(String file) implements Outcome {
    }

    /** A second copy of an imported package (same package id and content, other bytes): nothing changed. */
    record SameAsImported(String file, String packageId) implements Outcome {
    }

    /** Refused: the reason (a format refusal's name or a collection rule) and its message. Nothing was stored. */
    record Refused(String file, String reason, String message) implements Outcome {
    }
}
