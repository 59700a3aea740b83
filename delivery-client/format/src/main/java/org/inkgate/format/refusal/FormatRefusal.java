package org.inkgate.format.refusal;

/**
 * Why a bundle or response package was refused. Each subtype is one reason; its message says
 * what is wrong and what to do, in words an invigilator or test owner can act on. Nothing of a
 * refused file is handed to the caller.
 */
public abstract sealed class FormatRefusal extends Exception
        permits BadSignature, DigestMismatch, BrokenHashChain, UnsupportedSchema, WrongReleaseCode,
        UnsafeEntryName, DuplicateEntry, SizeLimitExceeded, CompressionRatioExceeded, MissingEntry,
        UnlistedEntry, MalformedJson, MalformedArchive, DecryptionFailed, UntrustedSigner, InvalidContent {

    private final String file;

    protected FormatRefusal(String file, String message, Throwable cause) {
        super(file + ": " + message, cause);
        this.file = file;
    }

    protected FormatRefusal(String file, String message) {
        this(file, message, null);
    }

    /** The file that was refused, as the caller named it. */
    public String file() {
        return file;
    }
}
