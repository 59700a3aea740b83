package org.inkgate.packs.pack;

/** A pack file was refused: it is not a pack, is damaged or altered, or breaks a rule. */
public final class PackRefusal extends Exception {
    private static final long serialVersionUID = 1L;

    /** Why a pack was refused; the message says where and how to fix it. */
    public enum Reason {
        /** The file is missing, unreadable or not a zip. */
        NOT_A_PACK,
        /** The manifest is missing, malformed or breaks a field rule. */
        BAD_MANIFEST,
        /** Written by a newer version of Inkgate. */
        NEWER_VERSION,
        /** A file's bytes do not match the digest in the manifest, or files are missing or extra. */
        CONTENT_MISMATCH,
        /** An entry name is unsafe (absolute, "..", backslash, duplicate). */
        UNSAFE_ENTRY,
        /** An entry or the whole pack exceeds the size limits. */
        TOO_LARGE,
        /** The pack is a different kind than the task asked for, or has another id. */
        WRONG_PACK
    }

    private final Reason reason;

    public PackRefusal(Reason reason, String message) {
        super(message);
        this.reason = reason;
    }

    public PackRefusal(Reason reason, String message, Throwable cause) {
        super(message, cause);
        this.reason = reason;
    }

    /** Why the pack was refused. */
    public Reason reason() {
        return reason;
    }
}
