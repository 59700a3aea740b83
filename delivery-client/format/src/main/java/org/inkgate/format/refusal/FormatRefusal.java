package org.inkgate.format.refusal;

/**
 * Why a bundle or response package was refused. Each subtype is one reason; its message says
 * what is wrong and what to do, in words an invigilator or test owner can act on. Nothing of a
 * refused file is handed to the caller.
 */
public abstract sealed class FormatRefusal extends Exception
        permits BadSignature, DigestMismatch, BrokenHashChain, UnsupportedSchema, WrongReleaseCode,
        UnsafeEntryName, DuplicateEntry, SizeLimitExceeded, CompressionRatioExceeded, MissingEntry,
        UnlistedEntry, MalformedJson, MalformedArchive, DecryptionFailed, UntrustedSigner, InvalidContent,
        UnsupportedArchiveFeature {

    private final String file;

    protected FormatRefusal(String file, String message, Throwable cause) {
        super(printable(file + ": " + message), cause);
        this.file = file;
    }

    /**
     * Messages repeat names and values taken from the refused file, which an attacker chooses:
     * control, C1, bidirectional and line-separator characters are shown as \\uXXXX so that a
     * message can never forge console or log lines or reorder what an invigilator reads.
     */
    public static String printable(String text) {
        StringBuilder out = new StringBuilder(text.length());
        text.codePoints().forEach(c -> {
            boolean hidden = c < 0x20 || (c >= 0x7f && c <= 0x9f) || c == 0x061c || c == 0x200e || c == 0x200f
                    || (c >= 0x2028 && c <= 0x202e) || (c >= 0x2066 && c <= 0x2069);
            if (hidden) {
                out.append(String.format("\\u%04x", c));
            } else {
                out.appendCodePoint(c);
            }
        });
        return out.toString();
    }

    protected FormatRefusal(String file, String message) {
        this(file, message, null);
    }

    /** The file that was refused, as the caller named it. */
    public String file() {
        return file;
    }
}
