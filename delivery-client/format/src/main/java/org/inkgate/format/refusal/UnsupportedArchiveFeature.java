package org.inkgate.format.refusal;

/**
 * A well-formed ZIP that uses something Inkgate does not read: encryption, a compression method
 * other than stored and deflated, ZIP64, several disks, links. Says how to re-pack it.
 */
public final class UnsupportedArchiveFeature extends FormatRefusal {

    public UnsupportedArchiveFeature(String file, String what, String howToFix) {
        super(file, what + ", which Inkgate does not read; " + howToFix + ".");
    }
}
